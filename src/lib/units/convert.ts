import { UnitError, describeValue, requireFinite } from './errors';
import { atmosphereOf, type ConversionContext } from './pressure';
import {
	isQuantity,
	lookupUnit,
	quantities,
	type Quantity,
	type QuantityOf,
	type Unit,
	type UnitOf
} from './quantities';
import type { UnitDef } from './unit-def';

/** A quantity as words for messages: 'massFlow' → 'mass flow'. */
function words(quantity: Quantity): string {
	return quantity.replace(/[A-Z]/g, (c) => ` ${c.toLowerCase()}`);
}

/** The definition of `unit` within `quantity`, or a UnitError naming both. */
function defOf(quantity: Quantity, unit: string, value: number): UnitDef {
	if (!isQuantity(quantity)) {
		throw new UnitError(
			`Unknown quantity "${String(quantity)}" for ${describeValue(value)} ${unit}`,
			unit,
			value
		);
	}
	const table: Readonly<Record<string, UnitDef>> = quantities[quantity].units;
	if (typeof unit !== 'string' || !Object.hasOwn(table, unit)) {
		throw new UnitError(
			`Unknown ${words(quantity)} unit "${String(unit)}" for value ${describeValue(value)}; ` +
				`expected one of ${Object.keys(table).join(', ')}`,
			String(unit),
			value
		);
	}
	return table[unit];
}

/**
 * A sum or difference within rounding error of zero is zero: −1.01325 bar g at an atmosphere
 * of 1.01325 bar a is 0 MPa, not −1e-17 (which would be "below zero"), and 32 °F is 0 °C,
 * not 6e-14. `scale` is the size of the terms that cancelled.
 */
function snapToZero(result: number, scale: number): number {
	return Math.abs(result) <= 8 * Number.EPSILON * scale ? 0 : result;
}

function baseFromDef(
	quantity: Quantity,
	def: UnitDef,
	unit: string,
	value: number,
	ctx: ConversionContext | undefined
): number {
	requireFinite(value, def.label, words(quantity));
	let base: number;
	if (def.gauge) {
		const atmosphere = atmosphereOf(ctx);
		const scaled = value * def.factor;
		base = snapToZero(scaled + atmosphere, Math.abs(scaled) + atmosphere);
		if (base < 0) {
			throw new UnitError(
				`${words(quantity)} ${value} ${def.label} is below zero absolute ` +
					`(atmospheric pressure ${atmosphere} MPa)`,
				unit,
				value
			);
		}
		return base;
	}
	base = (value + (def.offset ?? 0)) * def.factor;
	if (quantities[quantity].absolute) {
		base = snapToZero(base, (Math.abs(value) + (def.offset ?? 0)) * def.factor);
		if (base < 0) {
			throw new UnitError(
				`${words(quantity)} ${value} ${def.label} is below absolute zero`,
				unit,
				value
			);
		}
	}
	return base;
}

function valueFromDef(
	quantity: Quantity,
	def: UnitDef,
	unit: string,
	base: number,
	ctx: ConversionContext | undefined
): number {
	const baseTable: Readonly<Record<string, UnitDef>> = quantities[quantity].units;
	const baseLabel = baseTable[quantities[quantity].base].label;
	requireFinite(base, baseLabel, words(quantity));
	if (quantities[quantity].absolute && base < 0) {
		throw new UnitError(
			`${words(quantity)} ${base} ${baseLabel} is below absolute zero; cannot express it in ${def.label}`,
			unit,
			base
		);
	}
	if (def.gauge) {
		const atmosphere = atmosphereOf(ctx);
		return snapToZero(base - atmosphere, base + atmosphere) / def.factor;
	}
	const offset = def.offset ?? 0;
	const value = base / def.factor;
	return offset === 0 ? value : snapToZero(value - offset, value + offset);
}

/**
 * Converts a value in `unit` to the quantity's base unit (pressure MPa absolute, temperature K,
 * mass flow kg/s, specific enthalpy kJ/kg, specific entropy kJ/(kg K), power W, energy J,
 * length m, area m², volume m³, mass kg, speed m/s, temperature difference K).
 *
 * @param ctx site conditions; gauge pressures use ctx.atmosphericPressure (MPa, default 0.101325)
 * @throws UnitError for an unknown unit, a non-finite value, or an absolute pressure or
 *   temperature below zero
 */
export function toBase<Q extends Quantity>(
	quantity: Q,
	value: number,
	unit: UnitOf<Q>,
	ctx?: ConversionContext
): number {
	return baseFromDef(quantity, defOf(quantity, unit, value), unit, value, ctx);
}

/**
 * Converts a value in the quantity's base unit (see toBase) to `unit`.
 *
 * @param ctx site conditions; gauge pressures use ctx.atmosphericPressure (MPa, default 0.101325)
 * @throws UnitError for an unknown unit, a non-finite value, or a base value below zero for
 *   pressure or temperature
 */
export function fromBase<Q extends Quantity>(
	quantity: Q,
	valueInBase: number,
	unit: UnitOf<Q>,
	ctx?: ConversionContext
): number {
	return valueFromDef(quantity, defOf(quantity, unit, valueInBase), unit, valueInBase, ctx);
}

/**
 * Converts between two units of the same quantity, through the base unit. The types only
 * accept a `to` unit of the same quantity as `from`: convert(1, 'bar_g', 'degC') does not
 * compile (and throws, if forced).
 *
 * @param ctx site conditions; gauge pressures use ctx.atmosphericPressure (MPa, default 0.101325)
 * @throws UnitError for unknown units, units of different quantities, a non-finite value, or
 *   an absolute pressure or temperature below zero
 */
export function convert<U extends Unit>(
	value: number,
	from: U,
	to: UnitOf<QuantityOf<U>>,
	ctx?: ConversionContext
): number {
	const source = lookupUnit(from);
	const target = lookupUnit(to);
	if (!source || !target) {
		const unknown = !source ? from : to;
		throw new UnitError(
			`Unknown unit "${String(unknown)}" converting ${describeValue(value)} ${String(from)} to ${String(to)}`,
			String(unknown),
			value
		);
	}
	if (source.table !== target.table) {
		throw new UnitError(
			`Cannot convert ${describeValue(value)} ${source.def.label} (${words(source.quantity)}) ` +
				`to ${target.def.label} (${words(target.quantity)}): different quantities`,
			from,
			value
		);
	}
	const base = baseFromDef(source.quantity, source.def, from, value, ctx);
	return valueFromDef(source.quantity, target.def, to, base, ctx);
}
