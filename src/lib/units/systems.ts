import { UnitError } from './errors';
import { lookupUnit, type Quantity, type Unit, type UnitOf } from './quantities';

/** The display unit of every quantity in one unit system. */
export type UnitSystem = { readonly [Q in Quantity]: UnitOf<Q> };

/**
 * Named unit systems, chosen per user: the units people read on the Walk, the Desk and the
 * Ladder. Gauge pressure is shown, as on plant gauges; the engine keeps absolute pressure.
 */
export const unitSystems = {
	SI: {
		pressure: 'bar_g',
		temperature: 'degC',
		temperatureDifference: 'delta_K',
		massFlow: 'kg/h',
		specificEnthalpy: 'kJ/kg',
		specificEntropy: 'kJ/(kg K)',
		power: 'kW',
		energy: 'GJ',
		length: 'm',
		shortLength: 'mm',
		area: 'm2',
		volume: 'm3',
		mass: 'kg',
		speed: 'm/s'
	},
	US: {
		pressure: 'psig',
		temperature: 'degF',
		temperatureDifference: 'delta_degF',
		massFlow: 'lb/h',
		specificEnthalpy: 'Btu/lb',
		specificEntropy: 'Btu/(lb degF)',
		power: 'Btu/h',
		energy: 'MMBtu',
		length: 'ft',
		shortLength: 'in',
		area: 'ft2',
		volume: 'gal_US',
		mass: 'lb',
		speed: 'mph'
	}
} as const satisfies Record<string, UnitSystem>;

/** A unit system name: 'SI' or 'US'. */
export type UnitSystemId = keyof typeof unitSystems;

/** The unit system names, for settings menus. */
export const UNIT_SYSTEMS = Object.keys(unitSystems) as UnitSystemId[];

/** True when `id` names a unit system. */
export function isUnitSystemId(id: unknown): id is UnitSystemId {
	return typeof id === 'string' && Object.hasOwn(unitSystems, id);
}

/** The unit a system shows a quantity in. */
export function displayUnit<Q extends Quantity>(quantity: Q, system: UnitSystemId): UnitOf<Q> {
	if (!isUnitSystemId(system)) {
		throw new UnitError(`Unknown unit system "${String(system)}"`, String(system), NaN);
	}
	return (unitSystems[system] as UnitSystem)[quantity];
}

function entryOf(unit: Unit) {
	const entry = lookupUnit(unit);
	if (!entry) throw new UnitError(`Unknown unit "${String(unit)}"`, String(unit), NaN);
	return entry;
}

/** Short UI label of a unit: 'bar_g' → "bar g", 'degC' → "°C", 'm3' → "m³". */
export function unitLabel(unit: Unit): string {
	return entryOf(unit).def.label;
}

/** Long name of a unit for menus and screen readers: 'psig' → "pounds per square inch (gauge)". */
export function unitName(unit: Unit): string {
	return entryOf(unit).def.name;
}
