import { fromBase } from './convert';
import { UnitError } from './errors';
import { formatSignificant, type NumberFormatOptions } from './number-format';
import type { ConversionContext } from './pressure';
import { isUnitOf, type Quantity, type UnitOf } from './quantities';
import { displayUnit, isUnitSystemId, unitLabel, type UnitSystemId } from './systems';

/** Options for formatting a quantity. */
export interface QuantityFormatOptions extends NumberFormatOptions, ConversionContext {
	/** Text shown for a missing value (null or undefined). Default "—". */
	nullText?: string;
	/** Between number and unit label. Default a normal space ("12.3 kg/h"). */
	separator?: string;
}

/** A formatted quantity in parts, for layouts that style the number and unit apart. */
export interface FormattedQuantity<Q extends Quantity = Quantity> {
	/** The number as text, e.g. "12.3"; nullText for a missing value. */
	number: string;
	/** The unit shown. */
	unit: UnitOf<Q>;
	/** Its UI label, e.g. "kg/h". */
	label: string;
	/** The value in `unit`, unrounded; null for a missing value. */
	value: number | null;
}

/** Default text for a missing value. */
export const MISSING_VALUE = '—';

function resolveUnit<Q extends Quantity>(quantity: Q, target: UnitSystemId | UnitOf<Q>): UnitOf<Q> {
	if (isUnitSystemId(target)) return displayUnit(quantity, target);
	if (isUnitOf(quantity, target)) return target;
	throw new UnitError(
		`"${String(target)}" is neither a unit system nor a ${String(quantity)} unit`,
		String(target),
		NaN
	);
}

/**
 * Converts a base-unit value for display and formats its number, keeping the parts apart.
 *
 * @param valueInBase value in the quantity's base unit (see toBase); null or undefined for missing
 * @param target a unit system ('SI', 'US') or a unit of the quantity
 * @throws UnitError for an unknown unit or system, or a non-finite value
 */
export function formatQuantityParts<Q extends Quantity>(
	valueInBase: number | null | undefined,
	quantity: Q,
	target: UnitSystemId | UnitOf<Q>,
	options: QuantityFormatOptions = {}
): FormattedQuantity<Q> {
	const unit = resolveUnit(quantity, target);
	const label = unitLabel(unit);
	if (valueInBase === null || valueInBase === undefined) {
		return { number: options.nullText ?? MISSING_VALUE, unit, label, value: null };
	}
	const value = fromBase(quantity, valueInBase, unit, options);
	return { number: formatSignificant(value, options), unit, label, value };
}

/**
 * Formats a base-unit value for people: formatQuantity(0.00342, 'massFlow', 'SI') =
 * "12.3 kg/h"; formatQuantity(null, 'massFlow', 'SI') = "—". Three significant figures by
 * default, thousands grouped, no trailing zeros; a missing value shows nullText alone.
 *
 * @param valueInBase value in the quantity's base unit (see toBase); null or undefined for missing
 * @param target a unit system ('SI', 'US') or a unit of the quantity
 * @param options sigFigs, locale, atmosphericPressure (MPa, for gauge units), nullText, separator
 * @throws UnitError for an unknown unit or system, or a non-finite value
 */
export function formatQuantity<Q extends Quantity>(
	valueInBase: number | null | undefined,
	quantity: Q,
	target: UnitSystemId | UnitOf<Q>,
	options: QuantityFormatOptions = {}
): string {
	const parts = formatQuantityParts(valueInBase, quantity, target, options);
	if (parts.value === null) return parts.number;
	return `${parts.number}${options.separator ?? ' '}${parts.label}`;
}
