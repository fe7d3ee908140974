/**
 * States from pressure and temperature, the formulation's own variables.
 */
import { checkPressureTemperature } from './limits';
import { propertiesBuffer } from './properties-buffer';
import { regionFromPT } from './region-select';
import { gibbsInto } from './temperature-solver';
import { region3FromPT } from './region3-solve';
import { region3State, singlePhaseState } from './state';
import type { SteamState } from './types';

const buffer = propertiesBuffer();

/**
 * State of water or steam at pressure p [MPa abs] and temperature T [K]: compressed liquid,
 * vapour, near-critical or supercritical fluid. A point exactly on the saturation line is
 * taken as liquid; use stateFromPX or stateFromTX for the dome.
 * @throws SteamRangeError unless 1e-6 MPa ≤ p ≤ 100 MPa and 273.15 K ≤ T ≤ 1073.15 K, or
 *   1073.15 K < T ≤ 2273.15 K with p ≤ 50 MPa, all finite
 */
export function stateFromPT(p: number, T: number): SteamState {
	checkPressureTemperature(p, T);
	const region = regionFromPT(p, T);
	if (region === 3) return region3State(region3FromPT(p, T));
	gibbsInto(region, p, T, buffer);
	return singlePhaseState(p, T, buffer, region);
}
