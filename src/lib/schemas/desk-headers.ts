/**
 * The Desk's header form: gauge pressure in the person's units (bar g or psig) read against the
 * site's own atmosphere, and the steam either saturated, a superheat above saturation or a
 * temperature. Stored in the engine's units (MPa absolute, K) and checked with the shared
 * headerSchema and the steam tables: a temperature below saturation is refused, naming it.
 */
import { z } from 'zod';
import { saturationTemperature } from '../steam/region4';
import { fromBase, toBase, type UnitSystemId } from '../units/index';
import { measuredField, shown } from './desk-sites';
import { headerSchema } from './site';

export const HEADER_STEAM = ['saturated', 'superheat', 'temperature'] as const;
export type HeaderSteamChoice = (typeof HEADER_STEAM)[number];
export const HEADER_STEAM_LABELS: Record<HeaderSteamChoice, string> = {
	saturated: 'Saturated',
	superheat: 'Superheated by',
	temperature: 'At a temperature of'
};

/** Highest header pressure, MPa absolute (headerSchema's limit, just below the critical point). */
const MAX_HEADER_MPA = 22;

export function headerUnits(units: UnitSystemId) {
	return units === 'US'
		? ({ pressure: 'psig', temperature: 'degF', difference: 'delta_degF' } as const)
		: ({ pressure: 'bar_g', temperature: 'degC', difference: 'delta_K' } as const);
}

export function headerUnitLabels(units: UnitSystemId) {
	return units === 'US'
		? { pressure: 'psig', temperature: '°F', difference: '°F' }
		: { pressure: 'bar g', temperature: '°C', difference: 'K' };
}

/** What a header form gives, in base units. */
export interface HeaderInput {
	name: string;
	pressure: number;
	designTemperature: number | null;
	operatingHours: number | null;
}

/**
 * The header form for a site whose atmosphere is `atmosphere` MPa absolute. Field names: name,
 * pressure, steam, superheat, temperature, operatingHours (and headerId, `withId`, to update one).
 */
export function headerFormSchema(units: UnitSystemId, atmosphere: number, withId = false) {
	const u = headerUnits(units);
	const l = headerUnitLabels(units);
	const ctx = { atmosphericPressure: atmosphere };
	const maxGauge = fromBase('pressure', MAX_HEADER_MPA, u.pressure, ctx);
	const tempRange = (k: number) => fromBase('temperature', k, u.temperature);
	return z
		.object({
			name: z
				.string({ error: 'Give the header a name' })
				.trim()
				.min(1, { error: 'Give the header a name' })
				.max(80, { error: 'Header name must be at most 80 characters' }),
			pressure: measuredField({
				label: 'Gauge pressure',
				unit: l.pressure,
				min: 0,
				max: Math.floor(maxGauge * 10) / 10,
				required: true,
				toBaseUnit: (v) => toBase('pressure', v, u.pressure, ctx)
			}),
			steam: z.enum(HEADER_STEAM, { error: 'Say whether the steam is saturated or superheated' }),
			superheat: measuredField({
				label: 'Superheat',
				unit: l.difference,
				min: 0,
				max: fromBase('temperatureDifference', 500, u.difference),
				aboveMin: true,
				toBaseUnit: (v) => toBase('temperatureDifference', v, u.difference)
			}),
			temperature: measuredField({
				label: 'Steam temperature',
				unit: l.temperature,
				min: tempRange(273.16),
				max: tempRange(1073.15),
				toBaseUnit: (v) => toBase('temperature', v, u.temperature)
			}),
			operatingHours: measuredField({
				label: 'Operating hours',
				unit: 'h per year',
				min: 0,
				max: 8784,
				aboveMin: true
			}),
			headerId: withId
				? z.uuid({ error: 'Choose a header' })
				: z
						.string()
						.optional()
						.transform(() => undefined)
		})
		.transform((form, zctx): HeaderInput & { headerId?: string } => {
			const tsat = saturationTemperature(form.pressure ?? atmosphere);
			let designTemperature: number | null = null;
			if (form.steam === 'superheat') {
				if (form.superheat === undefined) {
					zctx.addIssue({
						code: 'custom',
						path: ['superheat'],
						message: `Enter how far above saturation the steam is, in ${l.difference}`
					});
				} else designTemperature = tsat + form.superheat;
			}
			if (form.steam === 'temperature') {
				if (form.temperature === undefined) {
					zctx.addIssue({
						code: 'custom',
						path: ['temperature'],
						message: `Enter the steam temperature in ${l.temperature}`
					});
				} else if (form.temperature < tsat - 1e-6) {
					const sat = shown(fromBase('temperature', tsat, u.temperature), 1);
					zctx.addIssue({
						code: 'custom',
						path: ['temperature'],
						message: `At this pressure steam cannot be colder than its saturation temperature, ${sat} ${l.temperature}: enter ${sat} ${l.temperature} or more, or choose “Saturated”`
					});
				} else designTemperature = form.temperature > tsat + 1e-6 ? form.temperature : null;
			}
			return {
				...(form.headerId ? { headerId: form.headerId } : {}),
				name: form.name,
				pressure: form.pressure ?? atmosphere,
				designTemperature,
				operatingHours: form.operatingHours ?? null
			};
		})
		.superRefine((header, zctx) => {
			// The shared contract (the same the Walk's snapshot and the engine read) has the last word.
			const checked = headerSchema.safeParse({
				id: '00000000-0000-4000-8000-000000000000',
				name: header.name,
				pressure: header.pressure,
				...(header.designTemperature === null
					? {}
					: { designTemperature: header.designTemperature }),
				...(header.operatingHours === null ? {} : { operatingHours: header.operatingHours })
			});
			if (checked.success) return;
			for (const issue of checked.error.issues) {
				const field = String(issue.path[0]);
				zctx.addIssue({
					code: 'custom',
					path: [field === 'designTemperature' ? 'temperature' : field],
					message: issue.message
				});
			}
		});
}

/** A stored header as the form's text, in the person's units. */
export function headerFormValues(
	header: {
		name: string;
		pressure: number;
		designTemperature: number | null;
		operatingHours: number | null;
	},
	units: UnitSystemId,
	atmosphere: number
): Record<string, string> {
	const u = headerUnits(units);
	const ctx = { atmosphericPressure: atmosphere };
	return {
		name: header.name,
		pressure: shown(fromBase('pressure', header.pressure, u.pressure, ctx), 2),
		steam: header.designTemperature === null ? 'saturated' : 'temperature',
		superheat: '',
		temperature:
			header.designTemperature === null
				? ''
				: shown(fromBase('temperature', header.designTemperature, u.temperature), 1),
		operatingHours: header.operatingHours === null ? '' : shown(header.operatingHours, 0)
	};
}
