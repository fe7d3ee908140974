import { describe, expect, it } from 'vitest';
import {
	NOMINAL_PIPE_SIZES,
	nominalPipeSize,
	pipeOutsideDiameter,
	resolveOuterDiameter
} from './pipe-sizes';
import { SteamRangeError } from '../errors';

describe('pipe sizes (ASME B36.10M)', () => {
	// Outside diameters in mm by NPS with DN, ASME B36.10M.
	const b3610m: [number, number, number][] = [
		[0.5, 15, 21.3],
		[0.75, 20, 26.7],
		[1, 25, 33.4],
		[1.25, 32, 42.2],
		[1.5, 40, 48.3],
		[2, 50, 60.3],
		[2.5, 65, 73.0],
		[3, 80, 88.9],
		[4, 100, 114.3],
		[5, 125, 141.3],
		[6, 150, 168.3],
		[8, 200, 219.1],
		[10, 250, 273.0],
		[12, 300, 323.8],
		[14, 350, 355.6],
		[16, 400, 406.4],
		[18, 450, 457],
		[20, 500, 508],
		[24, 600, 610]
	];

	it.each(b3610m)('NPS %s = DN %s has OD %s mm', (nps, dn, mm) => {
		expect(pipeOutsideDiameter({ nps })).toBeCloseTo(mm / 1000, 9);
		expect(pipeOutsideDiameter({ dn })).toBeCloseTo(mm / 1000, 9);
		expect(nominalPipeSize({ nps }).dn).toBe(dn);
	});

	it('lists sizes in ascending order of NPS, DN and diameter', () => {
		for (let i = 1; i < NOMINAL_PIPE_SIZES.length; i++) {
			const [a, b] = [NOMINAL_PIPE_SIZES[i - 1], NOMINAL_PIPE_SIZES[i]];
			expect(b.nps).toBeGreaterThan(a.nps);
			expect(b.dn).toBeGreaterThan(a.dn);
			expect(b.outerDiameter).toBeGreaterThan(a.outerDiameter);
		}
	});

	it('refuses sizes it does not carry, naming those it does', () => {
		expect(() => pipeOutsideDiameter({ nps: 7 })).toThrow(SteamRangeError);
		expect(() => pipeOutsideDiameter({ nps: 7 })).toThrow(/nps = 7 .*0.5, 0.75, 1/);
		expect(() => pipeOutsideDiameter({ dn: 175 })).toThrow(/dn = 175/);
	});

	it('resolves a size from exactly one of diameter, NPS or DN', () => {
		expect(resolveOuterDiameter({ nps: 2 })).toBeCloseTo(0.0603, 9);
		expect(resolveOuterDiameter({ dn: 50 })).toBeCloseTo(0.0603, 9);
		expect(resolveOuterDiameter({ outerDiameter: 0.07 })).toBe(0.07);
		expect(() => resolveOuterDiameter({})).toThrow(/exactly one/);
		expect(() => resolveOuterDiameter({ nps: 2, dn: 50 })).toThrow(/2 were given/);
	});
});
