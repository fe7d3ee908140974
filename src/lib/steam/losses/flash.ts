/**
 * Flash steam: hot condensate let down to a lower pressure boils off part of itself. The
 * let-down is isenthalpic, so the flashed fraction is x = (h₁ − h_f,low) / h_fg,low, with h₁
 * the condensate's enthalpy (saturated liquid at the high pressure unless a temperature is given).
 */
import { stateFromPT } from '../forward';
import { saturationTemperature } from '../region4';
import { saturatedLiquid, saturatedVapour } from '../saturation';
import { requirePositive } from './sourced';

export interface FlashInput {
	/** Pressure the condensate comes from, MPa absolute. */
	pHigh: number;
	/** Pressure it is let down to, MPa absolute; below pHigh. */
	pLow: number;
	/** Condensate temperature, K, when subcooled; saturated at pHigh when absent. */
	condensateTemperature?: number;
}

export interface FlashResult {
	/** Mass fraction that flashes to steam, [0, 1): kg steam per kg condensate. */
	fraction: number;
	/** Enthalpy of the incoming condensate, kJ/kg. */
	condensateEnthalpy: number;
	/** Saturation temperature at the low pressure, K. */
	lowSaturationTemperature: number;
}

/** Flash steam fraction of condensate let down from pHigh to pLow. */
export function flashSteamFraction({
	pHigh,
	pLow,
	condensateTemperature
}: FlashInput): FlashResult {
	requirePositive('High pressure', pHigh, 'MPa');
	requirePositive('Low pressure', pLow, 'MPa');
	if (pLow >= pHigh) {
		throw new Error(
			`The flash pressure (${pLow} MPa abs) must be below the condensate pressure (${pHigh} MPa abs)`
		);
	}
	let h1 = saturatedLiquid(pHigh).h;
	if (condensateTemperature !== undefined) {
		const Tsat = saturationTemperature(pHigh);
		if (condensateTemperature > Tsat + 1e-6) {
			throw new Error(
				`Condensate at ${condensateTemperature.toFixed(2)} K would be steam at ${pHigh} MPa (saturation ${Tsat.toFixed(2)} K)`
			);
		}
		if (condensateTemperature < Tsat - 1e-6) h1 = stateFromPT(pHigh, condensateTemperature).h;
	}
	const hf = saturatedLiquid(pLow).h;
	const hg = saturatedVapour(pLow).h;
	// Condensate already below the low side's boiling point does not flash at all.
	const fraction = Math.max(0, (h1 - hf) / (hg - hf));
	return {
		fraction,
		condensateEnthalpy: h1,
		lowSaturationTemperature: saturationTemperature(pLow)
	};
}
