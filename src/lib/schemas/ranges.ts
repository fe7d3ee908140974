/**
 * The numeric limits of every finding input, in the engine's base units, as data: the zod
 * schemas (./finding-inputs.ts) are built from this table, and the Walk's forms read it to say
 * "Enter an orifice above 0 and up to 50 mm" in the person's own units without repeating a
 * number. Limits are plausibility bounds for field readings, not the engine's validity range.
 */
import { z } from 'zod';
import type {
	HeaderInputs,
	InsulationInputs,
	InsulationLayerInput,
	LeakInputs,
	TrapInputs
} from '../steam/losses/inputs';
import type { Quantity } from '../units/quantities';

/**
 * One field's limits.
 * - `min`, `max`: the bounds, in the base unit `unit`.
 * - `exclusiveMin`: true when `min` itself is refused (the value must be greater than it).
 * - `integer`: true for whole numbers (counts).
 * - `quantity`: the src/lib/units quantity a form converts the bounds with ('pressure' is
 *   absolute: forms showing gauge subtract the site's atmosphere), or null for a value shown
 *   as it is stored (hours per year, emissivity, counts, wind speed, area, conductivity).
 * - `unit`: the base unit words used in the schemas' own messages.
 */
export interface InputLimit {
	min: number;
	max: number;
	exclusiveMin?: boolean;
	integer?: boolean;
	quantity: Quantity | null;
	unit: string;
}

type NumericKeys<T> = {
	// Plain numbers only: a nominal size (a union of number literals) is a choice, not a range.
	[K in keyof T]-?: number extends NonNullable<T[K]> ? K : never;
}[keyof T];
type LimitsOf<T> = Record<NumericKeys<T>, InputLimit>;

const hours: InputLimit = {
	min: 0,
	max: 8784,
	exclusiveMin: true,
	quantity: null,
	unit: 'h per year'
};
const readingTemperature: InputLimit = {
	min: 233.15,
	max: 1073.15,
	quantity: 'temperature',
	unit: 'K'
};
const emissivity: InputLimit = { min: 0, max: 1, exclusiveMin: true, quantity: null, unit: '' };

/** Limits per finding kind and input field, base units (see InputLimit). */
export const INPUT_LIMITS = {
	trap: {
		orificeDiameter: { min: 0, max: 0.05, exclusiveMin: true, quantity: 'shortLength', unit: 'm' },
		backPressure: {
			min: 0,
			max: 22,
			exclusiveMin: true,
			quantity: 'pressure',
			unit: 'MPa absolute'
		},
		operatingHours: hours,
		condensateLoad: { min: 0, max: 50, quantity: 'massFlow', unit: 'kg/s' },
		inletTemperature: readingTemperature,
		outletTemperature: readingTemperature
	},
	leak: {
		holeDiameter: { min: 0, max: 0.1, exclusiveMin: true, quantity: 'shortLength', unit: 'm' },
		operatingHours: hours
	},
	insulation: {
		outerDiameter: { min: 0, max: 3, exclusiveMin: true, quantity: 'shortLength', unit: 'm' },
		length: { min: 0, max: 10_000, exclusiveMin: true, quantity: 'length', unit: 'm' },
		count: { min: 1, max: 10_000, integer: true, quantity: null, unit: '' },
		height: { min: 0, max: 50, exclusiveMin: true, quantity: 'length', unit: 'm' },
		area: { min: 0, max: 100_000, exclusiveMin: true, quantity: null, unit: 'm²' },
		processTemperature: { min: 273.15, max: 923.15, quantity: 'temperature', unit: 'K' },
		ambientTemperature: { min: 223.15, max: 333.15, quantity: 'temperature', unit: 'K' },
		windSpeed: { min: 0, max: 35, quantity: null, unit: 'm/s' },
		jacketEmissivity: emissivity,
		bareEmissivity: emissivity,
		operatingHours: hours
	},
	layer: {
		thickness: { min: 0, max: 0.5, exclusiveMin: true, quantity: 'shortLength', unit: 'm' },
		/** A custom material's conductivity (not a field of the layer itself). */
		conductivity: { min: 0, max: 1, exclusiveMin: true, quantity: null, unit: 'W/(m K)' }
	},
	header: {
		measuredPressure: {
			min: 0,
			max: 22,
			exclusiveMin: true,
			quantity: 'pressure',
			unit: 'MPa absolute'
		},
		measuredTemperature: { min: 273.16, max: 1073.15, quantity: 'temperature', unit: 'K' }
	}
} as const satisfies {
	trap: LimitsOf<TrapInputs>;
	leak: LimitsOf<LeakInputs>;
	insulation: LimitsOf<InsulationInputs>;
	layer: LimitsOf<InsulationLayerInput> & { conductivity: InputLimit };
	header: LimitsOf<HeaderInputs>;
};

/** "between 0.1 and 50", "greater than 0 and at most 50", in base units with `unit`. */
function amount(value: number, limit: InputLimit): string {
	const text = `${value}${limit.unit === '' ? '' : ` ${limit.unit}`}`;
	if (limit.quantity !== 'temperature') return text;
	const celsius = String(Math.round((value - 273.15) * 100) / 100).replace('-', '−');
	return `${text} (${celsius} °C)`;
}

/** A number schema for one field, from its limits, with messages in base units. */
export function limitedNumber(label: string, limit: InputLimit) {
	const unit = limit.unit === '' ? '' : ` (${limit.unit})`;
	let schema = z.number({
		error: `${label} must be a ${limit.integer ? 'whole number' : 'number'}${unit}`
	});
	if (limit.integer) schema = schema.int({ error: `${label} must be a whole number` });
	const range = `between ${amount(limit.min, limit)} and ${amount(limit.max, limit)}`;
	const temperature = limit.quantity === 'temperature';
	schema = limit.exclusiveMin
		? schema.gt(limit.min, { error: `${label} must be greater than ${amount(limit.min, limit)}` })
		: schema.min(limit.min, {
				error: temperature
					? `${label} must be ${range}`
					: limit.min === 0
						? `${label} cannot be negative`
						: `${label} must be at least ${amount(limit.min, limit)}`
			});
	return schema.max(limit.max, {
		error: temperature
			? `${label} must be ${range}`
			: `${label} must be at most ${amount(limit.max, limit)}`
	});
}
