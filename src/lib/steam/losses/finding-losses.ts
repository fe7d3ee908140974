/**
 * Each kind of finding turned into its physics: the steam and condensate it loses (with their
 * enthalpies) or the heat it loses at the surface, plus notes, risk and the assumptions behind
 * them. Nothing here reads the money side of the cost basis (fuel, efficiency, feedwater,
 * return, hours): ./pricing.ts turns these flows into fuel, cost, CO2 and water, so a change of
 * cost basis re-prices a stored physics result without recomputing it.
 */
import { saturationTemperature } from '../region4';
import { saturatedLiquid } from '../saturation';
import { coldInletNote, surfaceStateNote } from './field-readings';
import { type HeaderReading, readHeader, SATURATION_TOLERANCE } from './header';
import type {
	Header,
	HeaderFindingInput,
	InsulationFindingInput,
	LeakFindingInput,
	TrapFactors,
	TrapFindingInput
} from './inputs';
import { type InsulationGap, insulationGap } from './insulation';
import { leakSteamLoss } from './leaks';
import type { OrificeFlow } from './orifice';
import { findHeader, headerSteam } from './site-basis';
import type { Assumption } from './sourced';
import { trapSteamLoss } from './traps';

export interface LossCore {
	/** Steam lost, kg/s; null when the finding is not a loss of steam (heat, readings). */
	steamFlow: number | null;
	/** Specific enthalpy of the lost steam (at its header), kJ/kg; null with no steam lost. */
	steamEnthalpy: number | null;
	/**
	 * Whether lost steam passes into the condensate return (a trap discharging to a return
	 * line), so the site's condensate return share of it comes back as water.
	 */
	returnable: boolean;
	/** Hot condensate discharged to drain, kg/s. */
	condensateFlow: number;
	/** Saturated-liquid enthalpy of that condensate, kJ/kg; null with none. */
	condensateEnthalpy: number | null;
	/** Heat lost from a surface (or saved by insulating it), W. */
	surfaceHeat: number;
	/** Hours per year this loss runs when the finding or its header says so; null: the site's. */
	hours: number | null;
	/** Where `hours` came from; null with no override. */
	hoursSource: string | null;
	riskNote: string | null;
	notes: string[];
	assumptions: Assumption[];
	ventsSteam: boolean;
	hotSurface: boolean;
	orifice: OrificeFlow | null;
	insulation: InsulationGap | null;
	reading: HeaderReading | null;
}

export interface PhysicsContext {
	/** Site atmospheric pressure, MPa absolute. */
	atmosphere: number;
	trapFactors: TrapFactors | undefined;
	headers: readonly Header[];
}

/** The finding's own hours, else its header's, else none (the site's hours then apply). */
function hoursOf(own: number | undefined, header: Header | null) {
	if (own !== undefined) return { hours: own, hoursSource: 'finding (override)' };
	if (header?.operatingHours !== undefined) {
		return { hours: header.operatingHours, hoursSource: `header list (${header.name})` };
	}
	return { hours: null, hoursSource: null };
}

function headerAssumptions(header: Header, enthalpy: number): Assumption[] {
	return [
		{
			key: 'headerPressure',
			label: `Header pressure (${header.name})`,
			value: header.pressure,
			unit: 'MPa abs',
			source: 'site header list'
		},
		{
			key: 'steamEnthalpy',
			label: 'Steam enthalpy at the header',
			value: enthalpy,
			unit: 'kJ/kg',
			source: 'IAPWS-IF97'
		}
	];
}

export function trapLoss(
	finding: TrapFindingInput,
	{ atmosphere, trapFactors, headers }: PhysicsContext
): LossCore {
	const inputs = finding.inputs;
	const header = findHeader(headers, finding.headerId);
	const steam = headerSteam(header);
	const loss = trapSteamLoss({
		inputs,
		inletPressure: steam.pressure,
		inletTemperature: steam.temperature,
		atmosphere,
		factors: trapFactors
	});
	const toDrain = inputs.discharge === 'atmosphere';
	const passing = ['working', 'leaking', 'failed-open'].includes(inputs.condition);
	const condensateFlow = toDrain && passing ? (inputs.condensateLoad ?? 0) : 0;
	const hf = saturatedLiquid(steam.pressure).h;
	const notes = [loss.note].filter((n): n is string => n !== null);
	const assumptions = [...headerAssumptions(header, steam.enthalpy), ...loss.assumptions];
	const cold = coldInletNote(inputs, steam.saturationTemperature);
	if (cold !== null) {
		notes.push(cold.note);
		assumptions.push(cold.assumption);
	}
	if (condensateFlow > 0) {
		notes.push('Condensate discharged to drain is lost as water and as heat above feedwater.');
		assumptions.push({
			key: 'condensateLoad',
			label: 'Condensate to drain',
			value: condensateFlow,
			unit: 'kg/s',
			source: 'finding'
		});
	}
	return {
		steamFlow: loss.steamFlow,
		steamEnthalpy: steam.enthalpy,
		returnable: !toDrain,
		condensateFlow,
		condensateEnthalpy: condensateFlow > 0 ? hf : null,
		surfaceHeat: 0,
		...hoursOf(inputs.operatingHours, header),
		riskNote: loss.riskNote,
		notes,
		assumptions,
		ventsSteam: toDrain && loss.steamFlow > 0,
		hotSurface: false,
		orifice: loss.orifice,
		insulation: null,
		reading: null
	};
}

export function leakLoss(
	finding: LeakFindingInput,
	{ atmosphere, headers }: PhysicsContext
): LossCore {
	const header = findHeader(headers, finding.headerId);
	const steam = headerSteam(header);
	const loss = leakSteamLoss(finding.inputs, steam.pressure, atmosphere, steam.temperature);
	return {
		steamFlow: loss.steamFlow,
		steamEnthalpy: steam.enthalpy,
		returnable: false,
		condensateFlow: 0,
		condensateEnthalpy: null,
		surfaceHeat: 0,
		...hoursOf(finding.inputs.operatingHours, header),
		riskNote: null,
		notes: [loss.note],
		assumptions: [...headerAssumptions(header, steam.enthalpy), ...loss.assumptions],
		ventsSteam: true,
		hotSurface: false,
		orifice: loss.orifice,
		insulation: null,
		reading: null
	};
}

export function insulationLoss(
	finding: InsulationFindingInput,
	{ headers }: PhysicsContext
): LossCore {
	const inputs = finding.inputs;
	const assumptions: Assumption[] = [];
	let process = inputs.processTemperature;
	const listed = headers.find((h) => h.id === finding.headerId) ?? null;
	if (process === undefined) {
		const header = findHeader(headers, finding.headerId);
		const steam = headerSteam(header);
		process = steam.temperature ?? steam.saturationTemperature;
		assumptions.push({
			key: 'processTemperature',
			label: `Line temperature (header ${header.name})`,
			value: process,
			unit: 'K',
			source: 'IAPWS-IF97 from the site header list'
		});
	} else {
		assumptions.push({
			key: 'processTemperature',
			label: 'Process temperature',
			value: process,
			unit: 'K',
			source: 'finding'
		});
	}
	const gap = insulationGap(inputs, process);
	const notes = [
		`Insulating saves ${(gap.saving / 1000).toFixed(2)} kW of ${(gap.bare / 1000).toFixed(2)} kW lost bare; priced as heat ÷ boiler efficiency.`
	];
	const state = surfaceStateNote(inputs.surfaceState, gap.bare);
	if (state !== null) {
		notes.push(state.note);
		assumptions.push(state.assumption);
	}
	if (gap.after.burnRisk) {
		notes.push(
			'The proposed insulation still leaves the surface above the burn-risk threshold: add thickness.'
		);
	}
	return {
		steamFlow: null,
		steamEnthalpy: null,
		returnable: false,
		condensateFlow: 0,
		condensateEnthalpy: null,
		surfaceHeat: gap.saving,
		...hoursOf(inputs.operatingHours, listed),
		riskNote: gap.before.burnRisk
			? 'Bare surface above the contact burn threshold: a burn hazard until insulated.'
			: null,
		notes,
		assumptions: [...assumptions, ...gap.assumptions],
		ventsSteam: false,
		hotSurface: gap.before.burnRisk || gap.after.burnRisk,
		orifice: null,
		insulation: gap,
		reading: null
	};
}

/** Relative departure from the listed header pressure worth reporting (common practice). */
const PRESSURE_DEVIATION = 0.1;

export function headerLoss(
	finding: HeaderFindingInput,
	{ atmosphere, headers }: PhysicsContext
): LossCore {
	const header = findHeader(headers, finding.headerId);
	const { measuredPressure, measuredTemperature } = finding.inputs;
	const reading = readHeader(measuredPressure, measuredTemperature);
	const notes = [
		reading.note,
		'A header reading records conditions: it carries no loss of its own.'
	];
	const listedGauge = header.pressure - atmosphere;
	const measuredGauge = measuredPressure - atmosphere;
	if (listedGauge > 0 && Math.abs(measuredGauge - listedGauge) > PRESSURE_DEVIATION * listedGauge) {
		notes.push(
			`Running at ${measuredGauge.toFixed(3)} MPa gauge against the listed ${listedGauge.toFixed(3)} MPa gauge for "${header.name}".`
		);
	}
	let riskNote: string | null = null;
	if (header.designTemperature !== undefined && reading.condition === 'at-saturation') {
		riskNote = `"${header.name}" is listed as superheated but reads at saturation: the steam may be wet, which erodes valves and fittings and carries water to the users.`;
	} else if (reading.condition === 'below-saturation') {
		riskNote =
			'The reading is below saturation: check the instruments, and for condensate lying in the line (water hammer risk).';
	}
	return {
		steamFlow: null,
		steamEnthalpy: null,
		returnable: false,
		condensateFlow: 0,
		condensateEnthalpy: null,
		surfaceHeat: 0,
		hours: null,
		hoursSource: null,
		riskNote,
		notes,
		assumptions: [
			{
				key: 'saturationTolerance',
				label: 'Band counted as at saturation',
				...SATURATION_TOLERANCE
			},
			{
				key: 'saturationTemperature',
				label: 'Saturation temperature at the measured pressure',
				value: saturationTemperature(measuredPressure),
				unit: 'K',
				source: 'IAPWS-IF97'
			},
			{
				key: 'steamEnthalpy',
				label: 'Steam enthalpy at the reading',
				value: reading.enthalpy,
				unit: 'kJ/kg',
				source: 'IAPWS-IF97'
			}
		],
		ventsSteam: false,
		hotSurface: false,
		orifice: null,
		insulation: null,
		reading
	};
}
