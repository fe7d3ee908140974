/**
 * The live estimate under a form: the capture as typed → evaluateFinding (the same engine the
 * server prices with) when the site has a cost basis, else the physics alone, turned into the
 * figures and words the panel shows. Never throws: incomplete or impossible inputs come back
 * as words saying what is missing.
 */
import type { FindingKind } from '$lib/schemas/finding-vocabulary';
import type { CostBasis } from '$lib/schemas/site';
import { type Assumption, type Caution, evaluateFinding, type HeaderReading } from '$lib/steam';
import { fieldsFor } from './fields';
import { physicsEstimate } from './physics';
import { toCapture } from './to-capture';
import type { FormContext, FormValues } from './types';

export type FigureKey = 'steam' | 'heat' | 'fuel' | 'cost' | 'co2' | 'water';

/** One figure in the engine's base unit: steam kg/h, heat kW, fuel GJ/yr, cost major units, CO2 kg/yr, water m³/yr. */
export interface Figure {
	key: FigureKey;
	value: number;
}

export type Estimate =
	| { state: 'incomplete'; missing: string[] }
	| { state: 'unavailable'; reason: string }
	| {
			state: 'ready';
			/** false when the site has no cost basis yet: no money, fuel, CO2 or water. */
			priced: boolean;
			currency: string | null;
			figures: Figure[];
			/** Why a figure is absent, e.g. heat waiting for the cost basis. */
			gaps: string[];
			cautions: Caution[];
			assumptions: Assumption[];
			notes: string[];
			riskNote: string | null;
			header: HeaderReading | null;
	  };

/** Engine refusals in the person's words (the engine's own text names base units). */
function reasonFor(error: unknown, kind: FindingKind): string {
	const message = error instanceof Error ? error.message : '';
	if (/discharge orifice/.test(message)) {
		return 'Enter the discharge orifice: there is no usual seat size for this trap type and size.';
	}
	if (/above atmospheric/.test(message)) {
		return 'The header is listed at or below the air’s pressure, so no steam escapes: ask the consultant to check the header list.';
	}
	if (/back pressure/.test(message)) {
		return 'The return’s back pressure must be below the header’s pressure.';
	}
	if (/below saturation/.test(message)) {
		return 'The header list gives this header a design temperature below saturation: ask the consultant to check it.';
	}
	return kind === 'insulation'
		? 'No estimate for these readings: check the sizes and temperatures.'
		: 'No estimate for these readings: check them against the gauge and the header list.';
}

export function estimateFinding(
	kind: FindingKind,
	values: FormValues,
	ctx: FormContext,
	costBasis: CostBasis | null
): Estimate {
	const built = toCapture(kind, values, ctx);
	if ('problems' in built) {
		const fields = fieldsFor(kind, ctx.system);
		// Tag, location, area and notes do not change the numbers.
		const matters = new Set(['tag', 'location', 'areaId', 'notes', 'form']);
		const missing = Object.keys(built.problems)
			.filter((key) => !matters.has(key))
			.map((key) => fields.find((f) => f.key === key)?.label ?? key);
		if (missing.length > 0) return { state: 'incomplete', missing };
		return { state: 'incomplete', missing: [] };
	}
	const capture = built.capture;
	try {
		if (costBasis !== null) {
			const e = evaluateFinding(capture, { costBasis, headers: ctx.headers });
			const figures: Figure[] = [];
			if (e.steamLoss !== null) figures.push({ key: 'steam', value: e.steamLoss });
			if (kind !== 'header') {
				figures.push(
					{ key: 'heat', value: e.heatLoss },
					{ key: 'fuel', value: e.fuelEnergy },
					{ key: 'cost', value: e.cost.amount },
					{ key: 'co2', value: e.co2 }
				);
				if (e.water > 0) figures.push({ key: 'water', value: e.water });
			}
			return {
				state: 'ready',
				priced: true,
				currency: e.cost.currency,
				figures,
				gaps: [],
				cautions: e.cautions,
				assumptions: e.assumptions,
				notes: e.notes,
				riskNote: e.riskNote,
				header: e.header
			};
		}
		const p = physicsEstimate(capture, ctx.headers, ctx.atmosphericPressure);
		const figures: Figure[] = [];
		if (p.steamLoss !== null) figures.push({ key: 'steam', value: p.steamLoss });
		if (p.heatLoss !== null && kind !== 'header') figures.push({ key: 'heat', value: p.heatLoss });
		const gaps =
			p.heatLoss === null
				? [
						'Heat follows once the consultant sets the site’s cost basis (it needs the feedwater temperature).'
					]
				: [];
		return {
			state: 'ready',
			priced: false,
			currency: null,
			figures,
			gaps,
			cautions: p.cautions,
			assumptions: p.assumptions,
			notes: p.notes,
			riskNote: p.riskNote,
			header: p.header
		};
	} catch (error) {
		return { state: 'unavailable', reason: reasonFor(error, kind) };
	}
}
