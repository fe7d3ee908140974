import { areaUnits, lengthUnits, volumeUnits } from './geometry';
import { massFlowUnits, massUnits } from './mass';
import { speedUnits } from './motion';
import { energyUnits, powerUnits } from './power';
import { pressureUnits } from './pressure';
import { temperatureDifferenceUnits, temperatureUnits } from './temperature';
import { specificEnthalpyUnits, specificEntropyUnits } from './thermal';
import type { UnitDef } from './unit-def';

/**
 * Every quantity Steamwisp converts, with its base (hub) unit and its units. Values inside
 * the app are always in base units; conversion happens only at the edges (input, display).
 * `absolute` quantities cannot go below zero in base units.
 *
 * `shortLength` is the same physical quantity as `length` (base m, same units) but is shown
 * in mm or in rather than m or ft: pipe and orifice diameters, insulation thickness.
 */
export const quantities = {
	pressure: { base: 'MPa', units: pressureUnits, absolute: true },
	temperature: { base: 'K', units: temperatureUnits, absolute: true },
	temperatureDifference: { base: 'delta_K', units: temperatureDifferenceUnits, absolute: false },
	massFlow: { base: 'kg/s', units: massFlowUnits, absolute: false },
	specificEnthalpy: { base: 'kJ/kg', units: specificEnthalpyUnits, absolute: false },
	specificEntropy: { base: 'kJ/(kg K)', units: specificEntropyUnits, absolute: false },
	power: { base: 'W', units: powerUnits, absolute: false },
	energy: { base: 'J', units: energyUnits, absolute: false },
	length: { base: 'm', units: lengthUnits, absolute: false },
	shortLength: { base: 'm', units: lengthUnits, absolute: false },
	area: { base: 'm2', units: areaUnits, absolute: false },
	volume: { base: 'm3', units: volumeUnits, absolute: false },
	mass: { base: 'kg', units: massUnits, absolute: false },
	speed: { base: 'm/s', units: speedUnits, absolute: false }
} as const;

/** A quantity name: 'pressure', 'temperature', 'massFlow', … */
export type Quantity = keyof typeof quantities;

/** The unit ids of quantity Q (of each member, when Q is a union). */
export type UnitOf<Q extends Quantity> = Q extends Quantity
	? keyof (typeof quantities)[Q]['units'] & string
	: never;

/** Any unit id Steamwisp knows. Ids are unique across quantities. */
export type Unit = UnitOf<Quantity>;

/** The quantities a unit belongs to ('mm' belongs to length and shortLength). */
export type QuantityOf<U extends Unit> = {
	[Q in Quantity]: U extends UnitOf<Q> ? Q : never;
}[Quantity];

/** Every quantity name, in a stable order. */
export const QUANTITIES = Object.keys(quantities) as Quantity[];

/** True when `quantity` is a known quantity name. */
export function isQuantity(quantity: unknown): quantity is Quantity {
	return typeof quantity === 'string' && Object.hasOwn(quantities, quantity);
}

/** The unit ids of a quantity, in display order (for menus). */
export function unitsOf<Q extends Quantity>(quantity: Q): UnitOf<Q>[] {
	return Object.keys(quantities[quantity].units) as UnitOf<Q>[];
}

/** True when `unit` is a unit id of `quantity`: use it to check ids read from storage or forms. */
export function isUnitOf<Q extends Quantity>(quantity: Q, unit: unknown): unit is UnitOf<Q> {
	return (
		isQuantity(quantity) &&
		typeof unit === 'string' &&
		Object.hasOwn(quantities[quantity].units, unit)
	);
}

/** Unit id → its definition and the table it belongs to, for lookups by unit alone. */
const unitIndex = new Map<string, { def: UnitDef; table: object; quantity: Quantity }>();
for (const quantity of QUANTITIES) {
	const table = quantities[quantity].units;
	for (const [id, def] of Object.entries(table)) {
		// shortLength shares length's table: keep the first (physical) quantity for each id.
		if (!unitIndex.has(id)) unitIndex.set(id, { def, table, quantity });
	}
}

/** True when `unit` is any known unit id. */
export function isUnit(unit: unknown): unit is Unit {
	return typeof unit === 'string' && unitIndex.has(unit);
}

/** The entry of a known unit id, or undefined. */
export function lookupUnit(unit: string) {
	return unitIndex.get(unit);
}
