/**
 * A finding on the round priced on the device by the same engine the server uses; shown with
 * the capture form's own figure words (src/lib/components/walk/form/display.ts).
 */
import type { DeviceSite } from '$lib/offline/db';
import type { FindingCapture } from '$lib/schemas/capture';
import { evaluateFinding, type FindingEvaluation } from '$lib/steam/index';
import { showFigure } from '$lib/components/walk/form/display';
import type { FigureKey } from '$lib/components/walk/form/estimate';

/** The engine's evaluation of a stored capture, or null when it cannot be priced yet. */
export function priced(capture: FindingCapture, site: DeviceSite): FindingEvaluation | null {
	if (site.costBasis === null) return null;
	try {
		return evaluateFinding(capture, site);
	} catch {
		return null;
	}
}

/** A figure in the engine's base unit (steam kg/h, heat kW, fuel GJ/yr, cost, CO2 kg/yr …) as words. */
export function figureText(
	key: FigureKey,
	value: number,
	site: DeviceSite,
	currency: string | null = null
) {
	return showFigure({ key, value }, site.unitSystem, currency);
}
