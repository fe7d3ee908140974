/**
 * Live hints beside the fields: a header's gauge pressure by its name, the orifice a trap
 * takes by default, and a cold inlet that points to a blocked trap.
 */
import type { SiteHeader } from '$lib/schemas/snapshot';
import { COLD_INLET_MARGIN, defaultTrapOrifice, saturationTemperature } from '$lib/steam';
import type { TrapType } from '$lib/schemas/finding-vocabulary';
import { parseNumber } from './parse-number';
import { readable, toBaseValue } from './quantity';
import type { FormContext, FormValues } from './types';

/** "Process steam · 10 bar g" */
export function headerLabel(header: SiteHeader, ctx: FormContext): string {
	return `${header.name} · ${readable('pressure', header.pressure, ctx)}`;
}

/** Headers in the site's order, labelled with their gauge pressure. */
export function headerOptions(ctx: FormContext) {
	return [...ctx.headers]
		.sort((a, b) => a.sortOrder - b.sortOrder)
		.map((h) => ({ value: h.id, label: headerLabel(h, ctx) }));
}

/**
 * The orifice the engine will assume when none is entered, in words, or why there is none.
 * Null until the type and size are chosen.
 */
export function orificeDefaultText(values: FormValues, ctx: FormContext): string | null {
	const type = values.trapType as TrapType | undefined;
	const dn = Number(values.size);
	if (!type || !values.size || !Number.isFinite(dn)) return null;
	const header = ctx.headers.find((h) => h.id === values.headerId);
	const gauge = header ? header.pressure - ctx.atmosphericPressure : 0;
	try {
		const orifice = defaultTrapOrifice(type, dn, gauge);
		return `Leave empty to use ${readable('shortLength', orifice.value, ctx, 2)}, the usual seat for this type and size (common practice); enter the maker’s where known`;
	} catch {
		return 'No usual seat size for this type and size: enter the orifice to price a failed trap';
	}
}

/**
 * A hint when the inlet reads more than the engine's COLD_INLET_MARGIN (common practice)
 * below the header's saturation temperature, else null: the same rule as the result's note.
 */
export function coldInletHint(values: FormValues, ctx: FormContext): string | null {
	const header = ctx.headers.find((h) => h.id === values.headerId);
	const typed = parseNumber(values.inletTemperature ?? '');
	if (!header || typed === null || Number.isNaN(typed)) return null;
	let inlet: number;
	try {
		inlet = toBaseValue('temperature', typed, ctx);
	} catch {
		return null;
	}
	const saturation = saturationTemperature(header.pressure);
	if (inlet >= saturation - COLD_INLET_MARGIN.value) return null;
	return `The inlet reads ${readable('temperature', inlet, ctx)}, well below the ${readable('temperature', saturation, ctx)} of steam at this header: condensate is backing up — the trap may be blocked or failed closed.`;
}
