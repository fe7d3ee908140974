/**
 * The Walk's figures: a finding priced on the device by the same engine the server uses, and
 * the words and units it is shown in. Pure: no Svelte, no Dexie.
 */
import type { DeviceSite } from '$lib/offline/db';
import type { FindingCapture } from '$lib/schemas/capture';
import { evaluateFinding, type FindingEvaluation } from '$lib/steam/index';
import { formatQuantity, formatSignificant } from '$lib/units/index';

/** The engine's estimate for a capture, or the reason there is none (in plain words). */
export function estimate(
	capture: FindingCapture,
	site: DeviceSite
): { evaluation: FindingEvaluation } | { problem: string } {
	if (site.costBasis === null) {
		return { problem: 'No cost basis for this site yet: the consultant sets it at the desk.' };
	}
	try {
		return { evaluation: evaluateFinding(capture, site) };
	} catch (e) {
		return { problem: (e as Error).message };
	}
}

/** kg/h from the engine, shown in the person's units. */
export const steamText = (kgPerHour: number | null, site: DeviceSite) =>
	formatQuantity(kgPerHour === null ? null : kgPerHour / 3600, 'massFlow', site.unitSystem);

export const heatText = (kW: number, site: DeviceSite) =>
	formatQuantity(kW * 1000, 'power', site.unitSystem);

export const fuelText = (gjPerYear: number, site: DeviceSite) =>
	`${formatQuantity(gjPerYear * 1e9, 'energy', site.unitSystem)}/yr`;

/** CO2 in metric tonnes per year, as emission reports give it in either unit system. */
export const co2Text = (kgPerYear: number) => `${formatSignificant(kgPerYear / 1000)} t CO₂/yr`;

export function moneyText(amount: number, currency: string): string {
	return new Intl.NumberFormat(undefined, {
		style: 'currency',
		currency,
		maximumFractionDigits: amount >= 100 ? 0 : 2
	}).format(amount);
}
