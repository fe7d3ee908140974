/**
 * Grey-body radiation from a small surface to large surroundings at the ambient temperature,
 * as ASTM C680 assumes for pipes and equipment in a room or outdoors (no view factor, no sky).
 */
import { STEFAN_BOLTZMANN } from './constants';

/** Radiant heat flux q = ε·σ·(Ts⁴ − Tsur⁴) [W/m²] for temperatures in K. */
export function greyBodyFlux(emissivity: number, surface: number, surroundings: number): number {
	return emissivity * STEFAN_BOLTZMANN * (surface ** 4 - surroundings ** 4);
}

/**
 * Linearised radiation coefficient h_r = ε·σ·(Ts² + Tsur²)·(Ts + Tsur) [W/(m² K)], such that
 * h_r·(Ts − Tsur) is the grey-body flux exactly.
 */
export function radiationCoefficient(
	emissivity: number,
	surface: number,
	surroundings: number
): number {
	return (
		emissivity * STEFAN_BOLTZMANN * (surface ** 2 + surroundings ** 2) * (surface + surroundings)
	);
}
