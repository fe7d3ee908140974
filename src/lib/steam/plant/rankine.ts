/**
 * The simple Rankine cycle with a turbine and a pump efficiency: saturated liquid leaves the
 * condenser (1), the pump raises it to boiler pressure (2), the boiler makes superheated or
 * saturated steam (3), the turbine expands it to condenser pressure (4). Each component is a
 * steady-flow device with no heat loss, no pressure drop in the boiler or condenser and no
 * subcooling, as in the textbook cycle (Çengel & Boles, "Thermodynamics: An Engineering
 * Approach", ch. 10; Moran & Shapiro, "Fundamentals of Engineering Thermodynamics", ch. 8):
 *   w_t = h3 − h4, w_p = h2 − h1, q_in = h3 − h2, q_out = h4 − h1,
 *   η = (w_t − w_p) / q_in, work ratio = (w_t − w_p) / w_t (Rogers & Mayhew, "Engineering
 *   Thermodynamics: Work and Heat Transfer"), back-work ratio = w_p / w_t,
 *   specific steam consumption = 3600 / w_net kg/kWh, heat rate = 3600 / η kJ/kWh.
 * The pump work is the exact isentropic rise from IF97 over its efficiency (./pump.ts gives the
 * v Δp approximation beside it). Units: p MPa absolute, T K, h, w and q kJ/kg.
 */
import { SteamRangeError } from '../errors';
import { requireEfficiency } from '../losses/energy-chain';
import type { SteamState } from '../types';
import { expandSteam, type ExpansionResult } from './expansion';
import { checkPressureNamed, onSaturationLine } from './inlet';
import { pumpWork, type PumpResult } from './pump';

/** kJ in a kWh. */
export const KJ_PER_KWH = 3600;

export type TurbineInlet = { temperature: number } | { dryness: number };

export interface RankineInput {
	/** MPa absolute. */
	boilerPressure: number;
	/** MPa absolute; on the saturation line and below the boiler's. */
	condenserPressure: number;
	/** Superheated steam at a temperature (K) or saturated steam with a dryness fraction. */
	turbineInlet: TurbineInlet;
	/** (0, 1] */
	turbineEfficiency: number;
	/** (0, 1] */
	pumpEfficiency: number;
}

export interface RankineResult {
	states: {
		/** 1: saturated liquid leaving the condenser. */
		pumpInlet: SteamState;
		/** 2: compressed liquid entering the boiler. */
		boilerInlet: SteamState;
		/** 3: steam leaving the boiler. */
		turbineInlet: SteamState;
		/** 4: steam leaving the turbine. */
		turbineExhaust: SteamState;
	};
	turbine: ExpansionResult;
	pump: PumpResult;
	/** kJ/kg of steam. */
	turbineWork: number;
	pumpWork: number;
	netWork: number;
	heatSupplied: number;
	heatRejected: number;
	thermalEfficiency: number;
	/** Net work ÷ turbine work. */
	workRatio: number;
	/** Pump work ÷ turbine work. */
	backWorkRatio: number;
	/** kg of steam per kWh of net work. */
	specificSteamConsumption: number;
	/** kJ of heat supplied per kWh of net work. */
	heatRate: number;
	/** Exhaust dryness fraction; null when the exhaust is superheated. */
	exhaustDryness: number | null;
	wetExhaust: boolean;
}

function turbineInletOf(inlet: TurbineInlet): { T1?: number; x1?: number } {
	if ('temperature' in inlet) return { T1: inlet.temperature };
	if ('dryness' in inlet) return { x1: inlet.dryness };
	throw new Error('The turbine inlet needs a temperature (K) or a dryness fraction');
}

/**
 * The simple Rankine cycle's states and figures.
 * @throws SteamRangeError for states outside IAPWS-IF97; Error for a condenser pressure at or
 *   above the boiler's, efficiencies outside (0, 1], or an inlet that is not steam
 */
export function rankineCycle({
	boilerPressure,
	condenserPressure,
	turbineInlet,
	turbineEfficiency,
	pumpEfficiency
}: RankineInput): RankineResult {
	requireEfficiency(turbineEfficiency, 'Turbine isentropic efficiency');
	checkPressureNamed('boiler pressure', boilerPressure);
	checkPressureNamed('condenser pressure', condenserPressure);
	if (!onSaturationLine(condenserPressure)) {
		throw new SteamRangeError(
			'condenser pressure',
			condenserPressure,
			'0.000611213 to 22.064 MPa (the saturation line: the condenser holds boiling water)'
		);
	}
	if (condenserPressure >= boilerPressure) {
		throw new Error(
			`The condenser pressure (${condenserPressure} MPa abs) must be below the boiler pressure (${boilerPressure} MPa abs)`
		);
	}
	const turbine = expandSteam({
		p1: boilerPressure,
		...turbineInletOf(turbineInlet),
		p2: condenserPressure,
		isentropicEfficiency: turbineEfficiency
	});
	const pump = pumpWork({ p1: condenserPressure, p2: boilerPressure, efficiency: pumpEfficiency });
	const turbineWork = turbine.work;
	const netWork = turbineWork - pump.work;
	const heatSupplied = turbine.h1 - pump.h2;
	if (!(netWork > 0)) {
		throw new Error(
			`This cycle makes no net work (turbine ${turbineWork.toFixed(2)} kJ/kg, pump ${pump.work.toFixed(2)} kJ/kg): check the efficiencies and pressures`
		);
	}
	const thermalEfficiency = netWork / heatSupplied;
	return {
		states: {
			pumpInlet: pump.inlet,
			boilerInlet: pump.outlet,
			turbineInlet: turbine.inlet,
			turbineExhaust: turbine.outlet
		},
		turbine,
		pump,
		turbineWork,
		pumpWork: pump.work,
		netWork,
		heatSupplied,
		heatRejected: turbine.h2 - pump.h1,
		thermalEfficiency,
		workRatio: netWork / turbineWork,
		backWorkRatio: pump.work / turbineWork,
		specificSteamConsumption: KJ_PER_KWH / netWork,
		heatRate: KJ_PER_KWH / thermalEfficiency,
		exhaustDryness: turbine.x2,
		wetExhaust: turbine.wetExhaust
	};
}
