import { describe, expect, it } from 'vitest';
import { lossCostBasis } from '../../../../tests/fixtures/loss-site';
import { plantCostBasis } from '../../../../tests/fixtures/plant-site';
import { SteamRangeError } from '../errors';
import { stateFromTX } from '../saturation';
import { condensateReturn } from './condensate-return';

const hfw = stateFromTX(plantCostBasis.feedwaterTemperature, 0).h;
const hmu = stateFromTX(288.15, 0).h;

describe('condensateReturn', () => {
	it('saves the heat above makeup water and the water itself', () => {
		const r = condensateReturn({
			condensateFlow: 1.5,
			returnTemperature: 363.15,
			basis: plantCostBasis
		});
		const hc = stateFromTX(363.15, 0).h;
		// 90 °C condensate is below the 105 °C feedwater: only the makeup heating it spares counts.
		expect(r.heatAboveFeedwater).toBe(0);
		expect(r.heatRecovered).toBeCloseTo(1.5 * (hc - hmu), 9);
		expect(r.saving.waterFlow).toBe(1.5);
		// 1.5 kg/s over 8000 h is 43 200 m³, at 1.50 + 0.70 EUR/m³.
		expect(r.saving.year.water).toBeCloseTo(43200, 6);
		expect(r.saving.waterCost.amount).toBeCloseTo(43200 * 2.2, 4);
	});

	it('splits hot condensate into heat above feedwater and the makeup heating spared', () => {
		const r = condensateReturn({
			condensateFlow: 1,
			returnTemperature: 400,
			basis: plantCostBasis
		});
		const hc = stateFromTX(400, 0).h;
		expect(r.heatAboveFeedwater).toBeCloseTo(hc - hfw, 9);
		expect(r.makeupHeatSaved).toBeCloseTo(hfw - hmu, 9);
		expect(r.heatRecovered).toBeCloseTo(hc - hmu, 9);
		expect(r.makeupEnthalpy).toBeCloseTo(hmu, 12);
	});

	it('counts only the heat above feedwater when the basis has no makeup temperature, and says so', () => {
		const r = condensateReturn({ condensateFlow: 1, returnTemperature: 400, basis: lossCostBasis });
		expect(r.makeupEnthalpy).toBeNull();
		expect(r.heatRecovered).toBeCloseTo(stateFromTX(400, 0).h - hfw, 9);
		expect(r.assumptions.find((a) => a.key === 'makeupHeating')?.label).toMatch(
			/No makeup water temperature/
		);
	});

	it('refuses a negative flow and a temperature off the saturation line', () => {
		expect(() =>
			condensateReturn({ condensateFlow: -1, returnTemperature: 360, basis: plantCostBasis })
		).toThrow('Condensate flow cannot be negative');
		expect(() =>
			condensateReturn({ condensateFlow: 1, returnTemperature: 700, basis: plantCostBasis })
		).toThrow(SteamRangeError);
	});
});
