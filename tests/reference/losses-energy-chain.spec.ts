/**
 * The energy chain checked against government fact sheets and a published worked example:
 * US DOE "Benchmark the Fuel Cost of Steam Generation" (Table 1 and its cost-of-steam
 * formula), US DOE "Inspect and Repair Steam Traps" (annual saving example) and Manczyk's
 * annual fuel cost of a leaking trap.
 */
import { describe, expect, it } from 'vitest';
import { saturatedVapour, stateFromTX } from '../../src/lib/steam/index';
import {
	annualLoss,
	fuelPower,
	MMBTU_GJ,
	steamFuelCostPerTonne,
	steamHeatRate
} from '../../src/lib/steam/losses/index';

const PSI_MPA = (0.45359237 * 9.80665) / 0.0254 ** 2 / 1e6; // NIST SP 811, exact
const BTU_PER_LB = 2.326; // kJ/kg per Btu/lb, exact (International Table)
const LB = 0.45359237; // kg
const psig = (p: number) => (p + 14.696) * PSI_MPA;
const fahrenheit = (f: number) => ((f - 32) * 5) / 9 + 273.15;

describe('DOE "Benchmark the Fuel Cost of Steam Generation", Table 1', () => {
	// (pub) Energy to raise 1 lb of saturated steam from feedwater, Btu/lb, feedwater 50, 100,
	// 150, 200 and 250 °F, as listed in docs/sources.md.
	const table: [number, number[]][] = [
		[150, [1178, 1128, 1078, 1028, 977]],
		[450, [1187, 1137, 1087, 1037, 986]],
		[600, [1184, 1134, 1084, 1034, 984]]
	];
	const feedwaterF = [50, 100, 150, 200, 250];

	it.each(table)('%i psig row from IF97 within 2 Btu/lb', (p, row) => {
		const hSteam = saturatedVapour(psig(p)).h;
		row.forEach((published, i) => {
			const hFeed = stateFromTX(fahrenheit(feedwaterF[i]), 0).h;
			const perLb = steamHeatRate(1, hSteam, hFeed) / 1000 / BTU_PER_LB;
			// The table is printed to whole Btu/lb (±0.5) from an older steam-table edition;
			// IF97 (python3-iapws agrees: losses_points.py) is within 1 Btu/lb on the 150 and
			// 450 psig rows and 1.6 Btu/lb high on the 600 psig row, where h'' is nearly flat
			// in pressure. 2 Btu/lb is 0.2 %.
			expect(Math.abs(perLb - published)).toBeLessThan(2);
		});
	});

	it("the fact sheet's cost of steam: $/1000 lb = $/MMBtu × Δh / (1000 × η)", () => {
		// (pub) formula; inputs are an example: $8/MMBtu, 80 % efficiency, 150 psig from 100 °F.
		const hSteam = saturatedVapour(psig(150)).h;
		const hFeed = stateFromTX(fahrenheit(100), 0).h;
		const deltaBtu = (hSteam - hFeed) / BTU_PER_LB;
		const perThousandLb = (8 * deltaBtu) / (1000 * 0.8);
		const perTonne = steamFuelCostPerTonne(hSteam, hFeed, 0.8, 8 / MMBTU_GJ);
		expect((perTonne * (1000 * LB)) / 1000).toBeCloseTo(perThousandLb, 9);
		// Against the table's 1128 Btu/lb: $11.28/1000 lb, to the cent.
		expect(perThousandLb).toBeCloseTo(11.28, 2);
	});
});

describe('DOE "Inspect and Repair Steam Traps": annual saving of a trap stuck open', () => {
	it('75.8 lb/h × 8760 h/yr × $4.50/1000 lb = $2,988/yr (pub)', () => {
		// Price fuel so that steam costs $4.50/1000 lb at 150 psig from 100 °F feedwater and 80 %
		// efficiency; the chain must then give the fact sheet's saving.
		const hSteam = saturatedVapour(psig(150)).h;
		const hFeed = stateFromTX(fahrenheit(100), 0).h;
		const steamFlow = (75.8 * LB) / 3600;
		const perKgSteam = 4.5 / (1000 * LB);
		const fuelGJPerKg = (hSteam - hFeed) / 1e6 / 0.8;
		const year = annualLoss(fuelPower(steamHeatRate(steamFlow, hSteam, hFeed), 0.8), 0, {
			hours: 8760,
			fuelPricePerGJ: perKgSteam / fuelGJPerKg,
			emissionFactor: 0,
			waterPricePerM3: 0
		});
		// Published to whole dollars (75.8 × 8760 × 0.0045 = 2988.04).
		expect(Math.abs(year.fuelCost - 2988)).toBeLessThan(0.5);
	});
});

describe('Manczyk, annual fuel cost per leaking trap (pub)', () => {
	// Q = L × H × E × 1e-6 × C / BE = 16.78 lb/h × 5808 h × 960.8 Btu/lb × 1e-6 × $6.23/MMBtu
	// / 0.80 = $729.20 (latent heat at 5 psig as the lost energy).
	const flow = (16.78 * LB) / 3600;
	const basis = {
		hours: 5808,
		fuelPricePerGJ: 6.23 / MMBTU_GJ,
		emissionFactor: 0,
		waterPricePerM3: 0
	};

	it('reproduces $729.20 with the published latent heat', () => {
		const heat = flow * 960.8 * BTU_PER_LB * 1000; // W
		expect(annualLoss(fuelPower(heat, 0.8), 0, basis).fuelCost).toBeCloseTo(729.2, 1);
	});

	it('gives the same within 0.05 % with the IF97 latent heat at 5 psig', () => {
		// IF97: h'' − h' = 960.47 Btu/lb at 19.696 psia (python3-iapws agrees), vs 960.8 printed.
		const p = psig(5);
		const heat = steamHeatRate(flow, saturatedVapour(p).h, stateFromTX(saturatedVapour(p).T, 0).h);
		const cost = annualLoss(fuelPower(heat, 0.8), 0, basis).fuelCost;
		expect(Math.abs(cost / 729.2 - 1)).toBeLessThan(5e-4);
	});
});
