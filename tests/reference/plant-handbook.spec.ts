/**
 * The plant module against a government handbook table and US DOE steam tip sheets:
 *  - MIL-HDBK-1003/7, "Steam Power Plants – Fossil Fueled", Table 8 "Theoretical Steam Rates"
 *    (lb/kWh), read from its reproduction in UFC 3-540-02N: TSR = 3413 / (h1 − h2s), h in
 *    Btu/lb, the isentropic expansion from the throttle to the exhaust pressure.
 *  - US DOE Steam Tip Sheet #12, "Flash High-Pressure Condensate to Regenerate Low-Pressure
 *    Steam": its flash table entry and worked example.
 *  - US DOE Steam Tip Sheet #10, "Recover Heat from Boiler Blowdown": its blowdown ratio, a
 *    table entry and its worked example.
 * The tip sheets were read from reproductions of the sheets; the values are quoted (pub).
 */
import { describe, expect, it } from 'vitest';
import type { CostBasis } from '../../src/lib/steam/losses/inputs';
import { MMBTU_GJ } from '../../src/lib/steam/losses/index';
import {
	blowdownRecovery,
	expandSteam,
	flashRecovery,
	letdownTurbine
} from '../../src/lib/steam/plant/index';

const PSI_MPA = (0.45359237 * 9.80665) / 0.0254 ** 2 / 1e6; // NIST SP 811, exact
const psig = (p: number) => (p + 14.696) * PSI_MPA;
/** Inch of mercury (conventional, 13 595.1 kg/m³ under g_n), MPa: NIST SP 811 B.8. */
const INHG_MPA = (13595.1 * 9.80665 * 0.0254) / 1e6;
const fahrenheit = (f: number) => ((f - 32) * 5) / 9 + 273.15;
const BTU_PER_LB = 2.326; // kJ/kg per Btu/lb, exact (International Table)
const LB_PER_H = 0.45359237 / 3600; // kg/s

describe('MIL-HDBK-1003/7 Table 8, theoretical steam rates (pub)', () => {
	// Throttle conditions, psig and °F (null: dry saturated), as the table's columns.
	const throttles: [number, number | null][] = [
		[100, null],
		[200, null],
		[250, 550],
		[400, 750],
		[600, 825],
		[850, 900],
		[1250, 950],
		[1450, 1000],
		[1600, 1000]
	];
	// Exhaust rows: pressure in MPa abs, then lb/kWh per throttle column (null: blank cell).
	const rows: [string, number, (number | null)[]][] = [
		['1 inHg abs', INHG_MPA, [10.2, 9.17, 8.09, 6.85, 6.34, 5.92, 5.62, 5.43, 5.4]],
		['2 inHg abs', 2 * INHG_MPA, [11.31, 10.02, 8.78, 7.36, 6.76, 6.28, 5.94, 5.73, 5.69]],
		['3 inHg abs', 3 * INHG_MPA, [12.12, 10.62, 9.27, 7.71, 7.05, 6.53, 6.16, 5.93, 5.89]],
		['0 psig', psig(0), [22.73, 17.52, 14.57, 11.19, 9.82, 8.81, 8.1, 7.72, 7.62]],
		['5 psig', psig(5), [26.07, 19.35, 15.9, 11.99, 10.42, 9.29, 8.49, 8.07, 7.96]],
		['10 psig', psig(10), [29.52, 21.1, 17.15, 12.71, 10.96, 9.71, 8.83, 8.38, 8.26]],
		['15 psig', psig(15), [33.2, 22.83, 18.35, 13.38, 11.44, 10.08, 9.14, 8.66, 8.52]],
		['20 psig', psig(20), [37.17, 24.56, 19.53, 14.02, 11.9, 10.43, 9.42, 8.91, 8.76]],
		['25 psig', psig(25), [41.56, 26.31, 20.7, 14.63, 12.34, 10.76, 9.68, 9.14, 8.98]],
		['50 psig', psig(50), [74.8, 35.99, 26.75, 17.56, 14.31, 12.22, 10.8, 10.15, 9.94]],
		['100 psig', psig(100), [null, 66.6, 42.4, 23.86, 18.07, 14.77, 12.65, 11.78, 11.46]],
		['150 psig', psig(150), [null, null, 71.8, 31.93, 22.15, 17.33, 14.35, 13.26, 12.79]],
		['200 psig', psig(200), [null, null, null, 43.51, 26.96, 20.05, 16.05, 14.72, 14.08]],
		['300 psig', psig(300), [null, null, null, null, 40.65, 26.53, 19.66, 17.74, 16.7]],
		['400 psig', psig(400), [null, null, null, null, 78.3, 35.43, 23.82, 21.1, 19.52]],
		['500 psig', psig(500), [null, null, null, null, null, 49.03, 28.87, 25.03, 22.69]],
		['600 psig', psig(600), [null, null, null, null, null, 73.1, 35.3, 29.79, 26.35]]
	];

	/**
	 * Left out, with reasons. The 1450 psig column runs 0.2 % low at condensing exhausts to
	 * 3.6 % low at 600 psig, growing with the exhaust pressure: its values fit a throttle near
	 * 1400 psig at 1000 °F (IF97 within 0.2 % there), so the column heading in the
	 * reproduction is in doubt. The 400 psig exhaust from 600 psig/825 °F prints 78.3; IF97
	 * gives 67.0, a 14 % gap no steam-table edition explains beside its neighbours' 0.1 %, so
	 * a misprint. Neither is guessed at; they are not checked.
	 */
	const skipped = (column: number, row: string) =>
		throttles[column][0] === 1450 || (row === '400 psig' && column === 4);

	it('reproduces every other entry within 0.3 %', () => {
		let checked = 0;
		for (const [row, p2, rates] of rows) {
			rates.forEach((published, column) => {
				if (published === null || skipped(column, row)) return;
				const [pin, tin] = throttles[column];
				const r = expandSteam({
					p1: psig(pin),
					...(tin === null ? { x1: 1 } : { T1: fahrenheit(tin) }),
					p2,
					isentropicEfficiency: 1
				});
				const rate = 3413 / (r.isentropicWork / BTU_PER_LB);
				// Printed to four figures from a pre-IF97 steam table; IF97 is within 0.15 %.
				expect(Math.abs(rate - published) / published, `${pin} psig → ${row}`).toBeLessThan(0.003);
				checked++;
			});
		}
		expect(checked).toBe(111);
	});
});

/** A cost basis that prices steam energy directly: η = 1 and feedwater at makeup temperature. */
function steamCostBasis(pricePerMMBtu: string, feedwaterF: number, hours: number): CostBasis {
	return {
		fuel: { kind: 'natural-gas', price: pricePerMMBtu, unit: 'MMBtu' },
		currency: 'USD',
		boilerEfficiency: 1,
		feedwaterTemperature: fahrenheit(feedwaterF),
		condensateReturnFraction: 0,
		makeupWaterPrice: '0',
		waterTreatmentPrice: '0',
		operatingHours: hours,
		makeupWaterTemperature: fahrenheit(feedwaterF)
	};
}

describe('US DOE Steam Tip Sheet #12, flashing 150 psig condensate at 30 psig (pub)', () => {
	// The sheet: "when 150-psig condensate is flashed at 30 psig, 10.3% of the condensate
	// vaporizes"; 5,000 lb/h flashed gives 515 lb/h; valued at $8.00/MMBtu of steam, from
	// 70 °F makeup water, 8,760 h/yr: $40,924 a year.
	const example = () =>
		flashRecovery({
			condensateFlow: 5000 * LB_PER_H,
			pHigh: psig(150),
			pLow: psig(30),
			basis: steamCostBasis('8', 70, 8760)
		});

	it('flashes 10.3 % (table) and 515 lb/h of 5,000 lb/h', () => {
		const r = example();
		expect(r.fraction).toBeCloseTo(0.103, 3);
		expect(Math.abs(r.flashSteamFlow / LB_PER_H - 515)).toBeLessThan(2.5);
	});

	it('saves $40,924 a year within 0.3 %', () => {
		// The sheet rounds the fraction to 10.3 % and reads h from the ASME tables (1,171.9 and
		// 38.0 Btu/lb); IF97 gives 10.28 % and 1,172.0 and 38.1 Btu/lb: 0.2 % less.
		const saving = example().saving;
		expect(Math.abs(saving.total.amount - 40924) / 40924).toBeLessThan(0.003);
		expect(saving.year.fuelEnergy / MMBTU_GJ).toBeCloseTo(saving.total.amount / 8, 6);
	});
});

describe('US DOE Steam Tip Sheet #10, heat recovered from blowdown (pub)', () => {
	// The sheet's table: heat recoverable, MMBtu/h, per 100,000 lb/h, "60°F makeup water and
	// 90% heat recovery", by blowdown rate and boiler pressure. Its 150 psig, 6 % entry is 1.7
	// (2012 edition); the 2001 edition works its example with 1.67. Both are 6 % of
	// 100,000 lb/h blown down: feedwater of 100,000 lb/h, steam of 94,000 lb/h.
	const basis: CostBasis = { ...steamCostBasis('8', 60, 8000), boilerEfficiency: 0.8 };
	const boiler = {
		feedwaterTds: 60,
		boilerTds: 1000,
		boilerPressure: psig(150),
		heatExchanger: { recoveredFraction: 0.9 },
		basis
	};

	it('the blowdown ratio: 3,200 lb/h from a 50,000 lb/h boiler at 6.0 % of feedwater', () => {
		const r = blowdownRecovery({ ...boiler, steamFlow: 50000 * LB_PER_H });
		expect(r.rate.fractionOfFeedwater).toBeCloseTo(0.06, 15);
		// 3,200 ÷ (3,200 + 50,000) = 6.0 % as the sheet rounds it; 6 % exactly is 3,191 lb/h.
		expect(Math.abs(r.rate.blowdownFlow / LB_PER_H - 3200) / 3200).toBeLessThan(0.003);
	});

	it('the table entry: 1.67 MMBtu/h (2001 edition; 1.7 in 2012) within 0.5 %', () => {
		const r = blowdownRecovery({ ...boiler, steamFlow: 94000 * LB_PER_H });
		expect(r.rate.feedwaterFlow / LB_PER_H).toBeCloseTo(100000, 6);
		const mmbtuPerHour = (r.heatRecovered * 3600) / 1e6 / MMBTU_GJ;
		expect(Math.abs(mmbtuPerHour - 1.67) / 1.67).toBeLessThan(0.005);
		expect(mmbtuPerHour.toFixed(1)).toBe('1.7');
	});

	it('the example: 8,500 MMBtu/yr of fuel at 80 %, 8,000 h, $68,000 at $8/MMBtu', () => {
		// The sheet scales the table (6 % of 100,000 lb/h) by steam flow, 50,000/100,000, so it
		// prices 3,000 lb/h of blowdown; its own blowdown is 3,200 lb/h. The fuel saved must lie
		// between its 8,500 MMBtu and the same figure for 3,200 lb/h.
		const r = blowdownRecovery({ ...boiler, steamFlow: 50000 * LB_PER_H });
		const fuel = r.saving.year.fuelEnergy / MMBTU_GJ;
		expect(fuel).toBeGreaterThan(8500);
		expect(fuel).toBeLessThan((8500 * 3200) / 3000);
		expect(r.saving.total.amount).toBeCloseTo(fuel * 8, 6);
		expect(Math.abs(r.flashHeat + r.exchangerHeat + r.drainHeat - r.heatAvailable)).toBeLessThan(
			1e-9 * r.heatAvailable
		);
	});
});

describe('US DOE Steam Tip Sheet #20, a back-pressure turbine in place of a valve (pub)', () => {
	// The sheet's method: the turbine consumes no steam; the heat it turns into power is made
	// up by raising more steam. With boiler efficiency η_b and generator efficiency η_g, each
	// kWh made costs 1 / (η_b η_g) kWh of fuel, whatever the turbine's own efficiency.
	// 1 kWh = 3,412.14 Btu (NIST SP 811 B.8). The flows, pressures and prices are only inputs.
	it('generates at a fuel cost of 3,412.14 Btu/kWh ÷ (η_b η_g)', () => {
		const basis = { ...steamCostBasis('8', 60, 8000), boilerEfficiency: 0.8 };
		for (const eta of [0.5, 0.7]) {
			const r = letdownTurbine({
				steamFlow: 20000 * LB_PER_H,
				p1: psig(150),
				p2: psig(15),
				isentropicEfficiency: eta,
				generatorEfficiency: 0.95,
				basis,
				electricityPrice: 0.06
			});
			const fuelBtuPerKWh = (r.extraFuel.year.fuelEnergy / MMBTU_GJ / r.electricityPerYear) * 1e6;
			expect(fuelBtuPerKWh).toBeCloseTo(3412.14 / (0.8 * 0.95), 0);
			// Fuel at $8/MMBtu: electricity breaks even at 8 × 3412.14e-6 $/kWh ÷ (0.8 × 0.95).
			expect(r.breakevenElectricityPrice).toBeCloseTo((8 * 3412.1416e-6) / 0.76, 9);
		}
	});
});
