/**
 * One field's raw text checked and turned into what the capture stores (base units for
 * numbers), or a plain message in the person's units.
 */
import { UnitError } from '$lib/units';
import { parseNumber } from './parse-number';
import { notANumberMessage, rangeMessage, toBaseValue, withinLimit } from './quantity';
import type { FieldSpec, FormContext } from './types';

export type FieldReading =
	| { value: string | number | undefined; problem?: undefined }
	| { problem: string; value?: undefined };

function allowed(field: FieldSpec, text: string, ctx: FormContext): boolean {
	if (field.key === 'headerId') return ctx.headers.some((h) => h.id === text);
	if (field.key === 'areaId') return (ctx.areas ?? []).some((a) => a.id === text);
	return field.options === undefined || field.options.some((o) => o.value === text);
}

/** Reads a field; an empty optional field gives `value: undefined`. */
export function readField(field: FieldSpec, raw: string, ctx: FormContext): FieldReading {
	const text = field.input === 'textarea' ? raw : raw.trim();
	if (text === '') return { value: undefined };
	switch (field.input) {
		case 'text':
		case 'textarea':
		case 'tag':
			return { value: text };
		case 'select':
		case 'choice':
			if (!allowed(field, text, ctx)) return { problem: field.missing };
			return { value: field.numeric ? Number(text) : text };
		case 'number': {
			const typed = parseNumber(text);
			if (typed === null) return { value: undefined };
			if (Number.isNaN(typed)) return { problem: notANumberMessage(field, ctx) };
			let base: number;
			try {
				base = toBaseValue(field.quantity, typed, ctx);
			} catch (error) {
				// Below absolute zero (or absolute pressure): out of range in the person's words.
				if (error instanceof UnitError) return { problem: rangeMessage(field, ctx) };
				throw error;
			}
			if (!withinLimit(field, base)) return { problem: rangeMessage(field, ctx) };
			return { value: base };
		}
	}
}
