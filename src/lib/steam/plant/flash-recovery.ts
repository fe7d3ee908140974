/**
 * Flash steam recovery: hot condensate let down into a flash vessel at a low-pressure header
 * boils off x = (h_c − h_f,low) / h_fg,low of itself (../losses/flash.ts), and that steam
 * takes the place of low-pressure steam the boiler would otherwise raise. Its value is the heat
 * to raise it from feedwater, at the boiler's efficiency (US DOE Steam Tip Sheet #12, "Flash
 * High-Pressure Condensate to Regenerate Low-Pressure Steam", values flash steam as steam the
 * boiler need not make). Flash steam that is vented today is also water no longer made up.
 * Units: flows kg/s, p MPa absolute, T K, h kJ/kg, heat kW.
 */
import { makeupHeating } from '../losses/pricing';
import { steamHeatRate } from '../losses/energy-chain';
import { flashSteamFraction } from '../losses/flash';
import type { Caution } from '../losses/cautions';
import type { CostBasis } from '../losses/inputs';
import { requireNonNegative } from '../losses/sourced';
import type { Assumption } from '../losses/sourced';
import { saturatedLiquid, saturatedVapour } from '../saturation';
import { basisAssumptions, perYear, plantBasis, plantYear, type PlantYear } from './annual';
import { plantCautions } from './cautions';

export interface FlashRecoveryInput {
	/** Condensate reaching the flash vessel, kg/s. */
	condensateFlow: number;
	/** Pressure the condensate comes from, MPa absolute. */
	pHigh: number;
	/** Flash vessel (low-pressure header) pressure, MPa absolute; below pHigh. */
	pLow: number;
	/** Condensate temperature, K, when subcooled; saturated at pHigh when absent. */
	condensateTemperature?: number;
	/** The flash steam escapes to atmosphere today: recovering it also saves its water. */
	ventedToday?: boolean;
	basis: CostBasis;
	operatingHours?: number;
}

export interface FlashRecoveryResult {
	/** kg steam per kg condensate. */
	fraction: number;
	/** kg/s */
	flashSteamFlow: number;
	/** Liquid leaving the vessel, kg/s. */
	residualFlow: number;
	/** kJ/kg: condensate in, flash steam (h_g at pLow), residual liquid (h_f at pLow). */
	condensateEnthalpy: number;
	flashSteamEnthalpy: number;
	residualEnthalpy: number;
	/** Heat the boiler no longer supplies, kW (makeup heating included when vented today). */
	heatRecovered: number;
	/** Flash steam recovered, kg per year. */
	steamPerYear: number;
	/** The year saved: fuel, CO2, water and money. */
	saving: PlantYear;
	assumptions: Assumption[];
	cautions: Caution[];
}

/**
 * Flash steam recovered from hot condensate at a low-pressure header, on the site's cost basis.
 * @throws SteamRangeError for states outside IAPWS-IF97; Error for bad inputs or cost basis
 */
export function flashRecovery(input: FlashRecoveryInput): FlashRecoveryResult {
	const flow = requireNonNegative('Condensate flow', input.condensateFlow, 'kg/s');
	const flash = flashSteamFraction(input);
	const site = plantBasis(input.basis, input.operatingHours);
	const hfw = site.basis.feedwaterEnthalpy;
	const hg = saturatedVapour(input.pLow).h;
	const flashFlow = flow * flash.fraction;
	const vented = input.ventedToday === true;
	const makeup = vented ? makeupHeating(flashFlow, site.costBasis, hfw) : null;
	const heatW = steamHeatRate(flashFlow, hg, hfw) + (makeup?.heatRate ?? 0);
	const saving = plantYear(heatW / 1000, vented ? flashFlow : 0, site);
	const assumptions: Assumption[] = [
		{
			key: 'flashDisplacesSteam',
			label: 'Flash steam replaces the same mass of boiler steam at the low-pressure header',
			value: flashFlow,
			unit: 'kg/s',
			source:
				'US DOE Steam Tip Sheet #12, "Flash High-Pressure Condensate to Regenerate Low-Pressure Steam"'
		},
		{
			key: 'flashVentedToday',
			label: vented
				? 'The flash steam is vented today: its water is saved too'
				: 'The flash steam is not vented today: no water saving is counted',
			value: vented ? 1 : 0,
			unit: '',
			source: 'entered for this opportunity'
		},
		...basisAssumptions(site)
	];
	return {
		fraction: flash.fraction,
		flashSteamFlow: flashFlow,
		residualFlow: flow - flashFlow,
		condensateEnthalpy: flash.condensateEnthalpy,
		flashSteamEnthalpy: hg,
		// Condensate too cool to flash leaves as it came.
		residualEnthalpy: flash.fraction > 0 ? saturatedLiquid(input.pLow).h : flash.condensateEnthalpy,
		heatRecovered: heatW / 1000,
		steamPerYear: perYear(flashFlow, saving.hours),
		saving,
		assumptions,
		cautions: plantCautions({ hotDischarge: true })
	};
}
