import { describe, expect, it } from 'vitest';
import { lossCostBasis } from '../../../../tests/fixtures/loss-site';
import { plantCostBasis } from '../../../../tests/fixtures/plant-site';
import { stateFromPT } from '../forward';
import { saturatedLiquid } from '../saturation';
import { blowdownRate, blowdownRecovery, type BlowdownInput } from './blowdown';

const boiler: BlowdownInput = {
	steamFlow: 5,
	feedwaterTds: 200,
	boilerTds: 3000,
	boilerPressure: 1.1,
	basis: plantCostBasis
};

function closes(r: ReturnType<typeof blowdownRecovery>): void {
	const out = r.flashHeat + r.exchangerHeat + r.drainHeat;
	expect(Math.abs(r.heatAvailable - out) / r.heatAvailable).toBeLessThan(1e-9);
}

describe('blowdownRate', () => {
	it('holds the dissolved solids: TDS_f × feedwater = TDS_b × blowdown', () => {
		const r = blowdownRate(boiler);
		expect(200 * r.feedwaterFlow).toBeCloseTo(3000 * r.blowdownFlow, 9);
		expect(r.fractionOfFeedwater).toBeCloseTo(200 / 3000, 15);
		expect(r.fractionOfSteam).toBeCloseTo(200 / 2800, 15);
		expect(r.blowdownFlow).toBeCloseTo(5 * (200 / 2800), 15);
		expect(r.cycles).toBeCloseTo(15, 12);
	});

	it('needs no blowdown for solids-free feedwater, and refuses a limit at or below the feed', () => {
		expect(blowdownRate({ ...boiler, feedwaterTds: 0 }).blowdownFlow).toBe(0);
		expect(blowdownRate({ ...boiler, feedwaterTds: 0 }).cycles).toBeNull();
		expect(() => blowdownRate({ ...boiler, boilerTds: 200 })).toThrow(
			"The boiler water's dissolved-solids limit (200) must be above the feedwater's (200)"
		);
		expect(() => blowdownRate({ ...boiler, feedwaterTds: -5 })).toThrow(
			'Feedwater dissolved solids cannot be negative'
		);
	});
});

describe('blowdownRecovery', () => {
	it('without equipment recovers nothing and loses all its heat above makeup', () => {
		const r = blowdownRecovery(boiler);
		expect(r.heatRecovered).toBe(0);
		expect(r.drainHeat).toBeCloseTo(r.heatAvailable, 9);
		expect(r.drainTemperature).toBeCloseTo(saturatedLiquid(1.1).T, 9);
		closes(r);
	});

	it('sends the flash to the deaerator: heat above makeup and its water saved', () => {
		const r = blowdownRecovery({ ...boiler, flashPressure: 0.13 });
		expect(r.flashFraction).toBeGreaterThan(0.1);
		expect(r.flashSteamFlow).toBeCloseTo(r.rate.blowdownFlow * r.flashFraction, 15);
		expect(r.saving.waterFlow).toBe(r.flashSteamFlow);
		expect(r.steamPerYear).toBeCloseTo(r.flashSteamFlow * 8000 * 3600, 6);
		expect(r.exchangerHeat).toBe(0);
		closes(r);
	});

	it('cools the drain in a heat exchanger to a temperature or by a share of its heat', () => {
		const byT = blowdownRecovery({
			...boiler,
			flashPressure: 0.13,
			heatExchanger: { drainTemperature: 308.15 }
		});
		expect(byT.drainTemperature).toBeCloseTo(308.15, 9);
		expect(byT.drainEnthalpy).toBeCloseTo(stateFromPT(0.13, 308.15).h, 12);
		closes(byT);
		const byShare = blowdownRecovery({ ...boiler, heatExchanger: { recoveredFraction: 0.9 } });
		expect(byShare.exchangerHeat).toBeCloseTo(0.9 * byShare.heatAvailable, 9);
		expect(byShare.saving.fuelPower).toBeCloseTo(byShare.heatRecovered / 0.8, 9);
		closes(byShare);
	});

	it('refuses drain temperatures outside the streams, shares outside [0, 1], no makeup temperature', () => {
		expect(() => blowdownRecovery({ ...boiler, heatExchanger: { drainTemperature: 280 } })).toThrow(
			/The drain temperature \(280 K\) must lie between the makeup water's \(288\.15 K\)/
		);
		expect(() =>
			blowdownRecovery({ ...boiler, heatExchanger: { recoveredFraction: 1.2 } })
		).toThrow('must be between 0 and 1, got 1.2');
		expect(() => blowdownRecovery({ ...boiler, basis: lossCostBasis })).toThrow(
			"set the makeup water temperature in the site's cost basis"
		);
	});

	it('carries the hot-discharge and pressure-equipment cautions', () => {
		const keys = blowdownRecovery(boiler).cautions.map((c) => c.key);
		expect(keys.slice(0, 2)).toEqual(['pressure-systems', 'hot-discharge']);
	});
});
