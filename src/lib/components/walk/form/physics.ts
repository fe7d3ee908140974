/**
 * The steam and heat of a finding when the site has no cost basis yet: the same engine pieces
 * evaluateFinding uses (orifice flow, insulation gap, header reading), with nothing invented.
 * Heat the boiler must replace for steam needs the feedwater temperature, which belongs to
 * the cost basis, so a trap or leak shows its steam alone until then.
 */
import type { FindingCapture } from '$lib/schemas/capture';
import {
	type Assumption,
	type Caution,
	cautionsFor,
	findHeader,
	headerSteam,
	type HeaderReading,
	insulationGap,
	leakSteamLoss,
	readHeader,
	trapSteamLoss
} from '$lib/steam';
import type { SiteHeader } from '$lib/schemas/snapshot';

export interface PhysicsEstimate {
	/** kg/h, or null when the finding loses no steam as such. */
	steamLoss: number | null;
	/** kW, or null when it needs the cost basis (steam to heat above feedwater). */
	heatLoss: number | null;
	cautions: Caution[];
	assumptions: Assumption[];
	notes: string[];
	riskNote: string | null;
	header: HeaderReading | null;
}

/** @param atmosphere site atmospheric pressure, MPa absolute */
export function physicsEstimate(
	capture: FindingCapture,
	headers: readonly SiteHeader[],
	atmosphere: number
): PhysicsEstimate {
	const cautions = (ventsSteam: boolean, hotSurface: boolean) =>
		cautionsFor({
			kind: capture.kind,
			condition: capture.kind === 'trap' ? capture.inputs.condition : undefined,
			ventsSteam,
			hotSurface
		});
	const none = { riskNote: null, header: null, notes: [] as string[] };
	switch (capture.kind) {
		case 'trap': {
			const steam = headerSteam(findHeader(headers, capture.headerId));
			const loss = trapSteamLoss({
				inputs: capture.inputs,
				inletPressure: steam.pressure,
				inletTemperature: steam.temperature,
				atmosphere
			});
			const vents = capture.inputs.discharge === 'atmosphere' && loss.steamFlow > 0;
			return {
				...none,
				steamLoss: loss.steamFlow * 3600,
				heatLoss: loss.steamFlow > 0 ? null : 0,
				cautions: cautions(vents, false),
				assumptions: loss.assumptions,
				notes: loss.note ? [loss.note] : [],
				riskNote: loss.riskNote
			};
		}
		case 'leak': {
			const steam = headerSteam(findHeader(headers, capture.headerId));
			const loss = leakSteamLoss(capture.inputs, steam.pressure, atmosphere, steam.temperature);
			return {
				...none,
				steamLoss: loss.steamFlow * 3600,
				heatLoss: null,
				cautions: cautions(true, false),
				assumptions: loss.assumptions,
				notes: [loss.note]
			};
		}
		case 'insulation': {
			let process = capture.inputs.processTemperature;
			if (process === undefined) {
				const steam = headerSteam(findHeader(headers, capture.headerId));
				process = steam.temperature ?? steam.saturationTemperature;
			}
			const gap = insulationGap(capture.inputs, process);
			const hot = gap.before.burnRisk || gap.after.burnRisk;
			return {
				...none,
				steamLoss: null,
				heatLoss: gap.saving / 1000,
				cautions: cautions(false, hot),
				assumptions: gap.assumptions,
				riskNote: gap.before.burnRisk
					? 'Bare surface above the contact burn threshold: a burn hazard until insulated.'
					: null
			};
		}
		case 'header': {
			const reading = readHeader(
				capture.inputs.measuredPressure,
				capture.inputs.measuredTemperature
			);
			return {
				...none,
				steamLoss: null,
				heatLoss: 0,
				cautions: cautions(false, false),
				assumptions: [],
				notes: [reading.note],
				header: reading
			};
		}
	}
}
