/**
 * Each kind of finding turned into the flows the energy chain prices: steam and condensate
 * lost, heat lost, makeup water, plus notes, risk and the assumptions behind them.
 */
import { saturationTemperature } from '../region4';
import { saturatedLiquid } from '../saturation';
import { condensateHeatRate, steamHeatRate } from './energy-chain';
import { coldInletNote, surfaceStateNote } from './field-readings';
import { type HeaderReading, readHeader, SATURATION_TOLERANCE } from './header';
import type {
	CostBasis,
	Header,
	HeaderFindingInput,
	InsulationFindingInput,
	LeakFindingInput,
	TrapFindingInput
} from './inputs';
import { type InsulationGap, insulationGap } from './insulation';
import { leakSteamLoss } from './leaks';
import type { OrificeFlow } from './orifice';
import { findHeader, headerSteam, type ResolvedBasis } from './site-basis';
import type { Assumption } from './sourced';
import { trapSteamLoss } from './traps';

export interface LossCore {
	/** Steam lost, kg/s; null when the finding is not a loss of steam (heat, readings). */
	steamFlow: number | null;
	/** Heat the boiler must replace, W. */
	heatRate: number;
	/** Water to make up, kg/s. */
	makeupFlow: number;
	/** Hours per year this loss runs. */
	hours: number;
	riskNote: string | null;
	notes: string[];
	assumptions: Assumption[];
	ventsSteam: boolean;
	hotSurface: boolean;
	orifice: OrificeFlow | null;
	insulation: InsulationGap | null;
	reading: HeaderReading | null;
}

interface Context {
	basis: ResolvedBasis;
	costBasis: CostBasis;
	headers: readonly Header[];
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
	{ basis, costBasis, headers }: Context
): LossCore {
	const inputs = finding.inputs;
	const header = findHeader(headers, finding.headerId);
	const steam = headerSteam(header);
	const loss = trapSteamLoss({
		inputs,
		inletPressure: steam.pressure,
		inletTemperature: steam.temperature,
		atmosphere: basis.atmosphere,
		factors: costBasis.trapFactors
	});
	const toDrain = inputs.discharge === 'atmosphere';
	const passing = ['working', 'leaking', 'failed-open'].includes(inputs.condition);
	const condensateFlow = toDrain && passing ? (inputs.condensateLoad ?? 0) : 0;
	const hf = saturatedLiquid(steam.pressure).h;
	const heatRate =
		steamHeatRate(loss.steamFlow, steam.enthalpy, basis.feedwaterEnthalpy) +
		condensateHeatRate(condensateFlow, hf, basis.feedwaterEnthalpy);
	const returned = toDrain ? 0 : basis.condensateReturnFraction;
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
	if (!toDrain && loss.steamFlow > 0) {
		assumptions.push({
			key: 'condensateReturnFraction',
			label: 'Share of blown-through steam recovered in the return',
			value: returned,
			unit: '',
			source: 'site cost basis (condensate return fraction)'
		});
	}
	return {
		steamFlow: loss.steamFlow,
		heatRate,
		makeupFlow: loss.steamFlow * (1 - returned) + condensateFlow,
		hours: inputs.operatingHours ?? basis.hours,
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

export function leakLoss(finding: LeakFindingInput, { basis, headers }: Context): LossCore {
	const header = findHeader(headers, finding.headerId);
	const steam = headerSteam(header);
	const loss = leakSteamLoss(finding.inputs, steam.pressure, basis.atmosphere, steam.temperature);
	return {
		steamFlow: loss.steamFlow,
		heatRate: steamHeatRate(loss.steamFlow, steam.enthalpy, basis.feedwaterEnthalpy),
		makeupFlow: loss.steamFlow,
		hours: finding.inputs.operatingHours ?? basis.hours,
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
	{ basis, headers }: Context
): LossCore {
	const inputs = finding.inputs;
	const assumptions: Assumption[] = [];
	let process = inputs.processTemperature;
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
		heatRate: gap.saving,
		makeupFlow: 0,
		hours: inputs.operatingHours ?? basis.hours,
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

export function headerLoss(finding: HeaderFindingInput, { basis, headers }: Context): LossCore {
	const header = findHeader(headers, finding.headerId);
	const { measuredPressure, measuredTemperature } = finding.inputs;
	const reading = readHeader(measuredPressure, measuredTemperature);
	const notes = [
		reading.note,
		'A header reading records conditions: it carries no loss of its own.'
	];
	const listedGauge = header.pressure - basis.atmosphere;
	const measuredGauge = measuredPressure - basis.atmosphere;
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
		heatRate: 0,
		makeupFlow: 0,
		hours: basis.hours,
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
