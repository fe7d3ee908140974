import { describe, expect, it } from 'vitest';
import { LEAK_SIZE_CLASSES } from '../vocabulary';
import { LEAK_SIZE_GUIDE, leakDiameter, leakSteamLoss } from './leaks';
import { orificeSteamFlow } from './orifice';
import { DISCHARGE_COEFFICIENT } from './traps';

describe('leak size guide', () => {
	it('covers every size class with growing holes and plain guidance', () => {
		const diameters = LEAK_SIZE_CLASSES.map((c) => LEAK_SIZE_GUIDE[c].diameter);
		for (let i = 1; i < diameters.length; i++)
			expect(diameters[i]).toBeGreaterThan(diameters[i - 1]);
		for (const c of LEAK_SIZE_CLASSES)
			expect(LEAK_SIZE_GUIDE[c].guidance.length).toBeGreaterThan(10);
	});

	it('prefers a measured hole and marks a size class as common practice', () => {
		expect(leakDiameter({ holeDiameter: 0.002, sizeClass: 'large' }).value).toBe(0.002);
		const byClass = leakDiameter({ sizeClass: 'medium' });
		expect(byClass.value).toBeCloseTo(0.0254 / 8, 12);
		expect(byClass.source).toMatch(/^common practice/);
		expect(() => leakDiameter({})).toThrow(
			'Give the leak’s equivalent hole diameter or choose a size class'
		);
	});
});

describe('leakSteamLoss', () => {
	it('is the orifice flow through the equivalent hole to atmosphere', () => {
		const loss = leakSteamLoss({ holeDiameter: 0.003 }, 1.1, 0.101325);
		const flow = orificeSteamFlow({
			p1: 1.1,
			p2: 0.101325,
			diameter: 0.003,
			cd: DISCHARGE_COEFFICIENT.value
		});
		expect(loss.steamFlow).toBeCloseTo(flow.massFlow, 12);
		expect(loss.note).toBe('Leak through an equivalent 3.0 mm hole (choked flow)');
	});

	it('refuses a header at or below atmospheric pressure', () => {
		expect(() => leakSteamLoss({ holeDiameter: 0.003 }, 0.1, 0.101325)).toThrow(
			'The header pressure (0.1 MPa abs) must be above atmospheric (0.101325 MPa abs) for steam to leak out'
		);
	});
});
