/**
 * A field's number between the person's units and the engine's base units, and the messages
 * that name its limits in the person's units ("Enter an orifice diameter above 0 and up to
 * 50 mm"). Conversion only through src/lib/units; gauge pressure against the site's atmosphere.
 */
import {
	displayUnit,
	formatSignificant,
	fromBase,
	roundToSignificant,
	toBase,
	unitLabel
} from '$lib/units';
import type { FieldQuantity, FieldSpec, FormContext } from './types';

/** The unit label a field is typed in ('' for plain numbers). */
export function fieldUnit(field: Pick<FieldSpec, 'quantity'>, ctx: Pick<FormContext, 'system'>) {
	return field.quantity === undefined ? '' : unitLabel(displayUnit(field.quantity, ctx.system));
}

/** A typed number to base units. @throws UnitError below absolute zero. */
export function toBaseValue(
	quantity: FieldQuantity | undefined,
	value: number,
	ctx: FormContext
): number {
	if (quantity === undefined) return value;
	return toBase(quantity, value, displayUnit(quantity, ctx.system), {
		atmosphericPressure: ctx.atmosphericPressure
	});
}

/** A base value in the person's units, unrounded. */
export function fromBaseValue(
	quantity: FieldQuantity | undefined,
	base: number,
	ctx: FormContext
): number {
	if (quantity === undefined) return base;
	return fromBase(quantity, base, displayUnit(quantity, ctx.system), {
		atmosphericPressure: ctx.atmosphericPressure
	});
}

/** A base value as the text an input shows: six significant figures hide float noise. */
export function inputText(quantity: FieldQuantity | undefined, base: number, ctx: FormContext) {
	return String(roundToSignificant(fromBaseValue(quantity, base, ctx), 6));
}

/** A base value as people read it, with its unit: "10 bar g", "184 °C". */
export function readable(
	quantity: FieldQuantity,
	base: number,
	ctx: FormContext,
	sigFigs = 3
): string {
	const text = formatSignificant(fromBaseValue(quantity, base, ctx), { sigFigs });
	return `${text.replace(/^-/, '−')} ${fieldUnit({ quantity }, ctx)}`;
}

/** Inside the field's limits (a hair of slack for float error at the edges)? */
export function withinLimit(field: FieldSpec, base: number): boolean {
	const limit = field.limit;
	if (limit === undefined) return true;
	const slack = 1e-9 * Math.max(Math.abs(limit.max), Math.abs(limit.min), 1e-9);
	if (limit.integer && !Number.isInteger(base)) return false;
	const aboveMin = limit.exclusiveMin ? base > limit.min : base >= limit.min - slack;
	return aboveMin && base <= limit.max + slack;
}

function shown(field: FieldSpec, base: number, ctx: FormContext): string {
	const value = fromBaseValue(field.quantity, base, ctx);
	return formatSignificant(value, { sigFigs: 3 }).replace(/^-/, '−');
}

/** "Enter an orifice diameter above 0 and up to 50 mm". */
export function rangeMessage(field: FieldSpec, ctx: FormContext): string {
	const limit = field.limit;
	const unit = fieldUnit(field, ctx);
	const tail = unit === '' ? '' : ` ${unit}`;
	if (limit === undefined) return `Enter ${field.noun} as a number${unit ? ` in ${unit}` : ''}`;
	const min = shown(field, limit.min, ctx);
	const max = shown(field, limit.max, ctx);
	if (limit.exclusiveMin) return `Enter ${field.noun} above ${min} and up to ${max}${tail}`;
	const whole = limit.integer ? ' as a whole number' : '';
	return `Enter ${field.noun}${whole} between ${min} and ${max}${tail}`;
}

/** "Enter the orifice diameter as a number in mm". */
export function notANumberMessage(field: FieldSpec, ctx: FormContext): string {
	const unit = fieldUnit(field, ctx);
	const example = field.limit?.integer ? '4' : '3.5';
	return `${field.missing} as a number${unit === '' ? '' : ` in ${unit}`}, e.g. ${example}`;
}
