/**
 * Returning condensate that now goes to drain. Each kilogram returned is a kilogram of makeup
 * water (and its treatment) not bought, and arrives hot: the boiler no longer heats makeup
 * from its own temperature to the condensate's. Priced by the energy chain of a lost
 * finding's condensate (../losses/energy-chain.ts, ../losses/pricing.ts): heat above
 * feedwater, plus the heat that raises makeup to feedwater temperature when the cost basis
 * gives a makeup temperature, condensate counted as saturated liquid at its temperature (the
 * DOE fact sheet's convention for feedwater, ../losses/site-basis.ts).
 * Units: flow kg/s, T K, h kJ/kg, heat kW.
 */
import { T_CRIT, T_MIN } from '../constants';
import { inRange } from '../errors';
import type { Caution } from '../losses/cautions';
import { condensateHeatRate } from '../losses/energy-chain';
import type { CostBasis } from '../losses/inputs';
import { makeupHeating } from '../losses/pricing';
import { requireNonNegative } from '../losses/sourced';
import type { Assumption } from '../losses/sourced';
import { stateFromTX } from '../saturation';
import { basisAssumptions, makeupEnthalpy, plantBasis, plantYear, type PlantYear } from './annual';
import { plantCautions } from './cautions';

export interface CondensateReturnInput {
	/** Condensate now sent to drain that would be returned, kg/s. */
	condensateFlow: number;
	/** Temperature it would reach the feed tank at, K. */
	returnTemperature: number;
	basis: CostBasis;
	operatingHours?: number;
}

export interface CondensateReturnResult {
	/** Saturated-liquid enthalpy at the return temperature, kJ/kg. */
	condensateEnthalpy: number;
	feedwaterEnthalpy: number;
	/** Makeup water's enthalpy, kJ/kg; null when the basis gives no makeup temperature. */
	makeupEnthalpy: number | null;
	/** kW the condensate brings above feedwater. */
	heatAboveFeedwater: number;
	/** kW no longer spent raising makeup water towards feedwater temperature. */
	makeupHeatSaved: number;
	/** The two together, kW. */
	heatRecovered: number;
	/** The year saved: fuel, CO2, makeup water and money. */
	saving: PlantYear;
	assumptions: Assumption[];
	cautions: Caution[];
}

/**
 * Condensate returned to the feed tank instead of drain, on the site's cost basis.
 * @throws SteamRangeError for a temperature outside the saturation line; Error for bad inputs
 */
export function condensateReturn(input: CondensateReturnInput): CondensateReturnResult {
	const flow = requireNonNegative('Condensate flow', input.condensateFlow, 'kg/s');
	const T = inRange('return temperature', input.returnTemperature, T_MIN, T_CRIT, 'K');
	const site = plantBasis(input.basis, input.operatingHours);
	const hfw = site.basis.feedwaterEnthalpy;
	const hc = stateFromTX(T, 0).h;
	const above = condensateHeatRate(flow, hc, hfw);
	// Condensate cooler than feedwater saves the makeup heating only up to its own temperature.
	const makeup = makeupHeating(flow, site.costBasis, Math.min(hc, hfw));
	const makeupW = makeup?.heatRate ?? 0;
	const saving = plantYear((above + makeupW) / 1000, flow, site);
	const assumptions: Assumption[] = [
		{
			key: 'returnTemperature',
			label: 'Condensate temperature at the feed tank',
			value: T,
			unit: 'K',
			source: 'entered for this opportunity'
		},
		...basisAssumptions(site)
	];
	if (site.costBasis.makeupWaterTemperature === undefined) {
		assumptions.push({
			key: 'makeupHeating',
			label:
				'No makeup water temperature in the cost basis: only the heat above feedwater is counted',
			value: 0,
			unit: 'kW',
			source: 'site cost basis'
		});
	}
	return {
		condensateEnthalpy: hc,
		feedwaterEnthalpy: hfw,
		makeupEnthalpy: makeupEnthalpy(site),
		heatAboveFeedwater: above / 1000,
		makeupHeatSaved: makeupW / 1000,
		heatRecovered: (above + makeupW) / 1000,
		saving,
		assumptions,
		cautions: plantCautions({ hotDischarge: true })
	};
}
