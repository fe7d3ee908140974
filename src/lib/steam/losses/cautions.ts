/**
 * Safety cautions carried with every result that involves live steam, pressure or hot
 * surfaces (DEVELOPERS.md, "Safety"). Wording is ours; the substance is the trade's usual care.
 */
import type { FindingKind, TrapCondition } from '../vocabulary';

export type CautionKey =
	| 'steam-plume'
	| 'ppe'
	| 'isolation'
	| 'hot-surface'
	| 'water-hammer'
	| 'old-insulation'
	| 'local-codes'
	| 'estimate'
	| 'pressure-systems'
	| 'wet-exhaust'
	| 'hot-discharge';

export interface Caution {
	key: CautionKey;
	text: string;
}

export const CAUTION_TEXT: Record<CautionKey, string> = {
	'steam-plume':
		'Keep clear of steam plumes: high-pressure steam is invisible for a distance from the opening and can scald or cut. Never probe for a leak with a hand.',
	ppe: "Wear the site's PPE: gloves, eye and face protection, and hearing protection near loud leaks.",
	isolation:
		"Never repair under pressure: isolate, depressurise, drain and lock out under the site's permit-to-work first.",
	'hot-surface': 'Hot surface above the burn-risk threshold: do not touch; guard or insulate it.',
	'water-hammer':
		'Condensate backing up can cause water hammer: drain before restoring steam and open valves slowly.',
	'old-insulation':
		'Old insulation may contain asbestos: have it identified before it is disturbed.',
	'local-codes': 'Defer to local codes, the site’s rules and licensed practice.',
	estimate: 'These figures are engineering estimates, not guarantees.',
	'pressure-systems':
		"Turbines, flash vessels and heat exchangers on steam are pressure equipment: their choice, installation and inspection defer to the manufacturer, the site's pressure-systems rules and a licensed engineer. These figures size an opportunity, not the equipment.",
	'wet-exhaust':
		"The expansion ends wet: water droplets erode turbine blades and the exhaust line needs draining. The turbine's maker must confirm the exhaust dryness it accepts.",
	'hot-discharge':
		'Blowdown and hot condensate scald and flash to steam when released: route them through equipment rated for the pressure, and cool what goes to drain to the temperature local rules allow.'
};

export interface CautionContext {
	kind: FindingKind;
	condition?: TrapCondition;
	/** Steam escapes to the open air (leaks, traps to atmosphere that pass steam). */
	ventsSteam?: boolean;
	/** A surface hotter than the burn-risk threshold is involved. */
	hotSurface?: boolean;
}

/** The cautions that apply to a finding, most urgent first. */
export function cautionsFor({
	kind,
	condition,
	ventsSteam,
	hotSurface
}: CautionContext): Caution[] {
	const keys: CautionKey[] = [];
	if (ventsSteam) keys.push('steam-plume');
	if (hotSurface) keys.push('hot-surface');
	if (condition === 'failed-closed' || condition === 'flooded') keys.push('water-hammer');
	keys.push('ppe');
	if (kind !== 'header') keys.push('isolation');
	if (kind === 'insulation') keys.push('old-insulation');
	keys.push('local-codes', 'estimate');
	return keys.map((key) => ({ key, text: CAUTION_TEXT[key] }));
}
