import { describe, expect, it } from 'vitest';
import { plantCostBasis } from '../../../../tests/fixtures/plant-site';
import { stateFromTX } from '../saturation';
import { flashRecovery, type FlashRecoveryInput } from './flash-recovery';

const vessel: FlashRecoveryInput = {
	condensateFlow: 2,
	pHigh: 1.1,
	pLow: 0.25,
	basis: plantCostBasis
};

describe('flashRecovery', () => {
	it('closes the flash vessel balance: ṁ h_c = ṁ_f h_g + ṁ_l h_f', () => {
		const r = flashRecovery(vessel);
		const into = 2 * r.condensateEnthalpy;
		const out = r.flashSteamFlow * r.flashSteamEnthalpy + r.residualFlow * r.residualEnthalpy;
		expect(Math.abs(into - out) / into).toBeLessThan(1e-9);
		expect(r.flashSteamFlow + r.residualFlow).toBeCloseTo(2, 14);
	});

	it('values flash steam as boiler steam not raised from feedwater', () => {
		const r = flashRecovery(vessel);
		const hfw = stateFromTX(plantCostBasis.feedwaterTemperature, 0).h;
		expect(r.heatRecovered).toBeCloseTo(r.flashSteamFlow * (r.flashSteamEnthalpy - hfw), 9);
		expect(r.saving.fuelPower).toBeCloseTo(r.heatRecovered / 0.8, 9);
		expect(r.saving.year.water).toBe(0);
		expect(r.steamPerYear).toBeCloseTo(r.flashSteamFlow * 8000 * 3600, 6);
	});

	it('saves the water and its makeup heating too when the flash is vented today', () => {
		const kept = flashRecovery(vessel);
		const vented = flashRecovery({ ...vessel, ventedToday: true });
		const hfw = stateFromTX(plantCostBasis.feedwaterTemperature, 0).h;
		const hmu = stateFromTX(288.15, 0).h;
		expect(vented.saving.waterFlow).toBe(vented.flashSteamFlow);
		expect(vented.heatRecovered - kept.heatRecovered).toBeCloseTo(
			vented.flashSteamFlow * (hfw - hmu),
			9
		);
		expect(vented.saving.waterCost.amount).toBeGreaterThan(0);
	});

	it('recovers nothing from condensate too cool to flash', () => {
		const r = flashRecovery({ ...vessel, condensateTemperature: 380 });
		expect(r.fraction).toBe(0);
		expect(r.saving.total.amount).toBe(0);
		expect(r.residualEnthalpy).toBe(r.condensateEnthalpy);
	});

	it('refuses a negative flow and a flash pressure above the condensate’s', () => {
		expect(() => flashRecovery({ ...vessel, condensateFlow: -1 })).toThrow(
			'Condensate flow cannot be negative'
		);
		expect(() => flashRecovery({ ...vessel, pLow: 1.2 })).toThrow(
			'The flash pressure (1.2 MPa abs) must be below the condensate pressure (1.1 MPa abs)'
		);
	});
});
