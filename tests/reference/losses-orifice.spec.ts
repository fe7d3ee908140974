/**
 * Orifice flow of steam checked against the outside world: python3-iapws (the same isentropic
 * model computed by another IF97 implementation), Napier's formula, the US DOE steam fact
 * sheet's table of steam lost through trap orifices, and Manczyk's worked example.
 */
import { describe, expect, it } from 'vitest';
import {
	DISCHARGE_COEFFICIENT,
	napierSteamFlow,
	orificeSteamFlow
} from '../../src/lib/steam/losses/index';

const PSI_MPA = (0.45359237 * 9.80665) / 0.0254 ** 2 / 1e6; // NIST SP 811, exact
const LB_PER_H = 3600 / 0.45359237; // kg/s → lb/h
const ATM_PSIA = 14.696;
const psig = (p: number) => (p + ATM_PSIA) * PSI_MPA;
const barg = (p: number) => (p * 1e5 + 101325) / 1e6;
const inch = (d: number) => d * 0.0254;

describe('critical flow of dry saturated steam vs python3-iapws', () => {
	// (lib) python3-iapws 1.5.2, tests/reference/losses_points.py: bar(g), p*/p1, G* kg/(m² s).
	const reference: [number, number, number][] = [
		[1, 0.57747, 304.2412],
		[2, 0.57702, 449.8877],
		[5, 0.57657, 880.0282],
		[10, 0.57672, 1586.533],
		[20, 0.57785, 2987.6468],
		[30, 0.57932, 4389.2965],
		[40, 0.58095, 5799.8912]
	];
	it.each(reference)('%i bar(g): critical ratio %f, mass flux %f', (gauge, ratio, flux) => {
		const p1 = barg(gauge);
		const flow = orificeSteamFlow({ p1, p2: 0.1, diameter: 0.01, cd: 1 });
		expect(flow.choked).toBe(true);
		// Both engines implement IF97 to ~1e-9, so the peak flux agrees to its printed digits
		// (5e-5 relative allows for the 4-decimal rounding). The peak is flat in pressure, so
		// its location is only defined to ~1e-4 by either search.
		expect(flow.massFlux / flux - 1).toBeLessThan(5e-5);
		expect(flow.massFlux / flux - 1).toBeGreaterThan(-5e-5);
		expect(flow.criticalPressure / p1).toBeCloseTo(ratio, 3);
	});
});

describe("orifice flow vs Napier's formula, 1 to 40 bar(g) dry saturated", () => {
	/*
	 * Napier (W = A·P/70 in lb/s, in², psia) takes the choked flux as proportional to the
	 * upstream pressure alone. For a real vapour G* ∝ p1/√(Z·R·T1): along the saturation line
	 * T1 rises from 393 K to 525 K over this range while Z falls, so the IF97 flux per unit
	 * pressure falls steadily by about 7 % and crosses Napier's constant near 5 bar(g).
	 * Measured here: +3.7 % at 1 bar(g) to −2.9 % at 40 bar(g). Tolerance 4 % (docs/sources.md:
	 * "within about 3 % between 30 and 600 psia"; 1 bar(g) is just below 30 psia).
	 */
	const gauges = [1, 2, 3, 5, 7, 10, 15, 20, 25, 30, 35, 40];
	const ratios = gauges.map((g) => {
		const p1 = barg(g);
		const ours = orificeSteamFlow({ p1, p2: 0.101325, diameter: 0.005, cd: 1 }).massFlow;
		return ours / napierSteamFlow({ p1, diameter: 0.005, cd: 1 }).massFlow;
	});

	it('agrees within 4 % everywhere', () => {
		for (const ratio of ratios) expect(Math.abs(ratio - 1)).toBeLessThan(0.04);
	});

	it('departs the way the physics says: IF97 flux per unit pressure falls as T_sat rises', () => {
		for (let i = 1; i < ratios.length; i++) expect(ratios[i]).toBeLessThan(ratios[i - 1]);
		expect(ratios[0]).toBeGreaterThan(1.02);
		expect(ratios[ratios.length - 1]).toBeLessThan(0.98);
	});
});

describe('US DOE steam fact sheet "Inspect and Repair Steam Traps": leaking trap discharge rate', () => {
	/*
	 * Table "Leaking Steam Trap Discharge Rate", steam loss lb/h by orifice diameter (in) and
	 * steam pressure (psig), discharge to atmosphere. Entries marked (pub) were confirmed in a
	 * reproduction of the fact sheet; the others are from memory. Every entry is Napier's
	 * formula × 0.73 (to its 2–3 printed digits), which the first test shows.
	 */
	const table: [number, number, number, string][] = [
		[1 / 32, 15, 0.85, 'pub'],
		[1 / 32, 100, 3.3, 'pub'],
		[1 / 32, 150, 4.8, 'pub'],
		[1 / 16, 15, 3.4, 'pub'],
		[1 / 16, 100, 13.2, 'pub'],
		[1 / 8, 150, 75.8, 'pub (worked example)'],
		[1 / 16, 150, 18.9, 'from memory'],
		[1 / 16, 300, 36.2, 'from memory'],
		[1 / 8, 15, 13.7, 'from memory'],
		[1 / 8, 100, 52.8, 'from memory'],
		[1 / 8, 300, 145, 'from memory'],
		[3 / 16, 15, 30.7, 'from memory'],
		[3 / 16, 100, 119, 'from memory'],
		[3 / 16, 150, 170, 'from memory'],
		[3 / 16, 300, 326, 'from memory'],
		[1 / 4, 15, 54.7, 'from memory'],
		[1 / 4, 100, 211, 'from memory'],
		[1 / 4, 150, 303, 'from memory'],
		[1 / 4, 300, 579, 'from memory'],
		[3 / 8, 15, 123, 'from memory'],
		[3 / 8, 100, 475, 'from memory'],
		[3 / 8, 150, 682, 'from memory'],
		[3 / 8, 300, 1303, 'from memory']
	];

	it.each(table)(
		'%f in at %i psig: %f lb/h (%s) is Napier × 0.73 within its rounding',
		(d, p, lbh) => {
			const napier =
				napierSteamFlow({ p1: psig(p), diameter: inch(d), cd: 0.73 }).massFlow * LB_PER_H;
			// 2-digit entries (0.85, 3.3, 4.8) round by up to 1.2 %; allow 1.5 %.
			expect(Math.abs(napier / lbh - 1)).toBeLessThan(0.015);
		}
	);

	it.each(table)(
		'%f in at %i psig: IF97 orifice with the default cd reproduces %f lb/h (%s) within 5 %',
		(d, p, lbh) => {
			// Tolerance: IF97 departs from Napier by −3 % to +4 % over 15–300 psig (above), the
			// default cd 0.72 is 1.4 % under the table's 0.73, and entries round by up to 1.2 %.
			const flow = orificeSteamFlow({
				p1: psig(p),
				p2: ATM_PSIA * PSI_MPA,
				diameter: inch(d),
				cd: DISCHARGE_COEFFICIENT.value
			});
			expect(Math.abs((flow.massFlow * LB_PER_H) / lbh - 1)).toBeLessThan(0.05);
		}
	);
});

describe('Manczyk, "Estimating the Cost of Steam Loss Through the Orifice of a Steam Trap"', () => {
	// (pub) W = 24.24 · P[psia] · D²[in]; 5 psig (19.696 psia), D = 0.1875 in → 16.78 lb/h.
	// 24.24 is Napier's 3600·(π/4)/70 = 40.39 times a discharge coefficient of 0.6001.
	const cd = 24.24 / ((3600 * Math.PI) / 4 / 70);
	const p1 = 19.696 * PSI_MPA;
	const diameter = inch(0.1875);

	it('the field form is Napier with cd ≈ 0.6 and reproduces 16.78 lb/h to its 4 digits', () => {
		expect(cd).toBeCloseTo(0.6, 3);
		expect(napierSteamFlow({ p1, diameter, cd }).massFlow * LB_PER_H).toBeCloseTo(16.78, 2);
	});

	it('IF97 says 5 psig to atmosphere is not choked, and gives 3 % less than the field form', () => {
		// p2/p1 = 14.696/19.696 = 0.746, above the critical ratio of about 0.58: Napier, which
		// assumes choked flow, overstates the loss here. IF97 with the same cd: 16.25 lb/h.
		const flow = orificeSteamFlow({ p1, p2: ATM_PSIA * PSI_MPA, diameter, cd });
		expect(flow.choked).toBe(false);
		expect(flow.throatPressure).toBeCloseTo(ATM_PSIA * PSI_MPA, 12);
		const lbh = flow.massFlow * LB_PER_H;
		expect(lbh / 16.78 - 1).toBeLessThan(-0.02);
		expect(lbh / 16.78 - 1).toBeGreaterThan(-0.05);
	});
});
