/**
 * Boiler blowdown: how much, and the heat a flash vessel and a heat exchanger recover from it.
 *
 * Rate, from a steady mass balance of dissolved solids (steam carries none away, so all that
 * the feedwater brings in leaves with the blowdown): TDS_f × feedwater = TDS_b × blowdown, and
 * feedwater = steam + blowdown, so
 *   blowdown ÷ feedwater = TDS_f / TDS_b,   blowdown ÷ steam = TDS_f / (TDS_b − TDS_f),
 * TDS_b being the most the boiler water may hold. The first is the "blowdown ratio" of US DOE
 * Steam Tip Sheet #10, "Recover Heat from Boiler Blowdown" (blowdown ÷ (blowdown + steam));
 * this module works from the steam flow, the figure a site knows, and reports both.
 *
 * Heat, counted above makeup water (what blowdown is replaced with), by energy balances on the
 * flash vessel and heat exchanger: blowdown leaves the boiler as saturated liquid at boiler
 * pressure; a flash vessel at p_f sends x = (h_bd − h_f,pf) / h_fg,pf of it to the deaerator
 * as steam, which also saves that much makeup water; a heat exchanger cools the rest, heating
 * makeup, to a drain temperature or by a share of its heat above makeup (the tip sheet's "90 %
 * of the blowdown energy"). Units: flows kg/s, p MPa absolute, T K, h kJ/kg, heat kW, TDS in
 * any one unit (mg/kg, ppm, µS/cm) for both.
 */
import type { Caution } from '../losses/cautions';
import { flashSteamFraction } from '../losses/flash';
import type { CostBasis } from '../losses/inputs';
import { requireFinite, requireNonNegative, requirePositive } from '../losses/sourced';
import type { Assumption } from '../losses/sourced';
import { stateFromPH } from '../inverse';
import { stateFromPT } from '../forward';
import { saturatedLiquid, saturatedVapour } from '../saturation';
import {
	basisAssumptions,
	makeupEnthalpy,
	perYear,
	plantBasis,
	plantYear,
	type PlantBasis,
	type PlantYear
} from './annual';
import { plantCautions } from './cautions';

export interface BlowdownRateInput {
	/** Steam raised, kg/s. */
	steamFlow: number;
	/** Dissolved solids in the feedwater (≥ 0). */
	feedwaterTds: number;
	/** The most dissolved solids the boiler water may hold, same unit, above feedwaterTds. */
	boilerTds: number;
}

export interface BlowdownRate {
	/** kg/s */
	blowdownFlow: number;
	feedwaterFlow: number;
	/** Blowdown ÷ feedwater = TDS_f / TDS_b. */
	fractionOfFeedwater: number;
	/** Blowdown ÷ steam = TDS_f / (TDS_b − TDS_f). */
	fractionOfSteam: number;
	/** Cycles of concentration, TDS_b / TDS_f (null for solids-free feedwater). */
	cycles: number | null;
}

/** Blowdown needed to hold the boiler water at its dissolved-solids limit. */
export function blowdownRate({
	steamFlow,
	feedwaterTds,
	boilerTds
}: BlowdownRateInput): BlowdownRate {
	requireNonNegative('Steam flow', steamFlow, 'kg/s');
	const F = requireNonNegative('Feedwater dissolved solids', feedwaterTds, '(TDS)');
	const B = requirePositive('Boiler water dissolved-solids limit', boilerTds, '(TDS)');
	if (F >= B) {
		throw new Error(
			`The boiler water's dissolved-solids limit (${B}) must be above the feedwater's (${F}): otherwise no blowdown can hold it`
		);
	}
	const fractionOfSteam = F / (B - F);
	const blowdownFlow = steamFlow * fractionOfSteam;
	return {
		blowdownFlow,
		feedwaterFlow: steamFlow + blowdownFlow,
		fractionOfFeedwater: F / B,
		fractionOfSteam,
		cycles: F > 0 ? B / F : null
	};
}

export type BlowdownHeatExchanger = { drainTemperature: number } | { recoveredFraction: number };

export interface BlowdownInput extends BlowdownRateInput {
	/** Boiler pressure, MPa absolute. */
	boilerPressure: number;
	/** Flash vessel pressure, MPa absolute (its steam goes to the deaerator); none when absent. */
	flashPressure?: number;
	/** A heat exchanger on the (flash vessel's) drain, heating makeup water; none when absent. */
	heatExchanger?: BlowdownHeatExchanger;
	/** The site's cost basis; it must give the makeup water temperature. */
	basis: CostBasis;
	operatingHours?: number;
}

export interface BlowdownResult {
	rate: BlowdownRate;
	/** Saturated liquid at boiler pressure, kJ/kg. */
	blowdownEnthalpy: number;
	makeupEnthalpy: number;
	/** kW the blowdown carries above makeup water. */
	heatAvailable: number;
	/** Flash vessel: kg steam per kg blowdown (0 without a vessel), flow kg/s, heat kW. */
	flashFraction: number;
	flashSteamFlow: number;
	flashHeat: number;
	/** Heat exchanger: heat to makeup, kW; the liquid's enthalpy before and after it. */
	exchangerHeat: number;
	exchangerInletEnthalpy: number;
	drainEnthalpy: number;
	/** Temperature the blowdown goes to drain at, K. */
	drainTemperature: number;
	/** kW still lost to drain above makeup water. */
	drainHeat: number;
	/** flashHeat + exchangerHeat, kW. */
	heatRecovered: number;
	/** Flash steam recovered, kg per year. */
	steamPerYear: number;
	/** The year saved: fuel, CO2, the flash steam's water, money. */
	saving: PlantYear;
	assumptions: Assumption[];
	cautions: Caution[];
}

function requireMakeup(site: PlantBasis): number {
	const h = makeupEnthalpy(site);
	if (h === null) {
		throw new Error(
			"Blowdown heat is counted above the makeup water's temperature: set the makeup water temperature in the site's cost basis"
		);
	}
	return h;
}

/** Drain enthalpy after the exchanger, kJ/kg, from its specification. */
function drainEnthalpyOf(
	exchanger: BlowdownHeatExchanger | undefined,
	liquidP: number,
	hIn: number,
	hMakeup: number,
	makeupT: number,
	inletT: number
): number {
	if (exchanger === undefined) return hIn;
	if ('recoveredFraction' in exchanger) {
		const f = requireFinite('Recovered share of the drain heat', exchanger.recoveredFraction, '');
		if (f < 0 || f > 1) {
			throw new Error(`The recovered share of the drain's heat must be between 0 and 1, got ${f}`);
		}
		return hIn - f * (hIn - hMakeup);
	}
	const Td = requireFinite('Drain temperature', exchanger.drainTemperature, 'K');
	if (Td < makeupT || Td > inletT) {
		throw new Error(
			`The drain temperature (${Td} K) must lie between the makeup water's (${makeupT} K) and the blowdown's entering the exchanger (${inletT.toFixed(2)} K)`
		);
	}
	// The liquid is still at the vessel's (or boiler's) pressure inside the exchanger.
	return stateFromPT(liquidP, Td).h;
}

/**
 * Blowdown from the dissolved-solids limits and the heat recovered from it, on the site's
 * cost basis.
 * @throws SteamRangeError for states outside IAPWS-IF97; Error for bad inputs or cost basis
 */
export function blowdownRecovery(input: BlowdownInput): BlowdownResult {
	const rate = blowdownRate(input);
	const site = plantBasis(input.basis, input.operatingHours);
	const hMakeup = requireMakeup(site);
	const makeupT = site.costBasis.makeupWaterTemperature!;
	const m = rate.blowdownFlow;
	const hBd = saturatedLiquid(input.boilerPressure).h;
	const flashed =
		input.flashPressure === undefined
			? null
			: flashSteamFraction({ pHigh: input.boilerPressure, pLow: input.flashPressure });
	const x = flashed?.fraction ?? 0;
	const liquidP = input.flashPressure ?? input.boilerPressure;
	const hIn = x > 0 ? saturatedLiquid(liquidP).h : hBd;
	const inletT = stateFromPH(liquidP, hIn).T;
	const hDrain = drainEnthalpyOf(input.heatExchanger, liquidP, hIn, hMakeup, makeupT, inletT);
	const flashFlow = m * x;
	const liquidFlow = m - flashFlow;
	const flashHeat = x > 0 ? flashFlow * (saturatedVapour(liquidP).h - hMakeup) : 0;
	const exchangerHeat = liquidFlow * (hIn - hDrain);
	const heatRecovered = flashHeat + exchangerHeat;
	const saving = plantYear(heatRecovered, flashFlow, site);
	return {
		rate,
		blowdownEnthalpy: hBd,
		makeupEnthalpy: hMakeup,
		heatAvailable: m * (hBd - hMakeup),
		flashFraction: x,
		flashSteamFlow: flashFlow,
		flashHeat,
		exchangerHeat,
		exchangerInletEnthalpy: hIn,
		drainEnthalpy: hDrain,
		drainTemperature: stateFromPH(liquidP, hDrain).T,
		drainHeat: liquidFlow * (hDrain - hMakeup),
		heatRecovered,
		steamPerYear: perYear(flashFlow, saving.hours),
		saving,
		assumptions: blowdownAssumptions(input, rate, site),
		cautions: plantCautions({ hotDischarge: true })
	};
}

function blowdownAssumptions(
	input: BlowdownInput,
	rate: BlowdownRate,
	site: PlantBasis
): Assumption[] {
	const entered = 'entered for this opportunity';
	const out: Assumption[] = [
		{
			key: 'blowdownFraction',
			label: 'Blowdown as a share of feedwater, TDS_feed ÷ TDS_boiler',
			value: rate.fractionOfFeedwater,
			unit: '',
			source: 'mass balance of dissolved solids (steam carries none); US DOE Steam Tip Sheet #10'
		},
		{
			key: 'boilerTds',
			label: 'Boiler water dissolved-solids limit',
			value: input.boilerTds,
			unit: '(TDS)',
			source: entered
		},
		{
			key: 'feedwaterTds',
			label: 'Feedwater dissolved solids',
			value: input.feedwaterTds,
			unit: '(TDS)',
			source: entered
		}
	];
	if (input.flashPressure !== undefined) {
		out.push({
			key: 'flashToDeaerator',
			label: 'Flash steam condensed in the deaerator replaces makeup water and its heating',
			value: input.flashPressure,
			unit: 'MPa abs',
			source: entered
		});
	}
	return [...out, ...basisAssumptions(site)];
}
