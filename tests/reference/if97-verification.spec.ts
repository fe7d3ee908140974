/**
 * The computer-program verification values of IAPWS R7-97(2012), Revised Release on the IAPWS
 * Industrial Formulation 1997 for the Thermodynamic Properties of Water and Steam, for regions
 * 1, 2, 4 and 5, the B23 and 2b/2c boundary equations and the backward equations of regions 1
 * and 2. Each value must round to the nine published digits (half a unit in the last digit,
 * relative 5e-9 or tighter). Table numbers are the release's. Values marked (pub) were read
 * from the release (docs/sources.md lists it); values marked "from memory" are
 * recalled from the release and not confirmed against a copy of it. Region 3 (table 33) is
 * checked beside region 3's own code.
 */
import { describe, expect, it } from 'vitest';
import { b23Pressure, b23Temperature } from '../../src/lib/steam/b23';
import { saturationPressure, saturationTemperature, stateFromPT } from '../../src/lib/steam/index';
import { region1TemperaturePH, region1TemperaturePS } from '../../src/lib/steam/region1-backward';
import {
	b2bcEnthalpy,
	b2bcPressure,
	region2TemperaturePH
} from '../../src/lib/steam/region2-backward-ph';
import { region2TemperaturePS } from '../../src/lib/steam/region2-backward-ps';
import { expectPublished } from './if97-digits';

type Row = [
	T: number,
	p: number,
	v: string,
	h: string,
	u: string,
	s: string,
	cp: string,
	w: string
];

function checkForward(rows: Row[], region: number): void {
	for (const [T, p, v, h, u, s, cp, w] of rows) {
		it(`T = ${T} K, p = ${p} MPa`, () => {
			const state = stateFromPT(p, T);
			expect(state.region).toBe(region);
			expectPublished(state.v, v);
			expectPublished(state.h, h);
			expectPublished(state.u, u);
			expectPublished(state.s, s);
			expectPublished(state.cp as number, cp);
			expectPublished(state.w as number, w);
		});
	}
}

describe('region 1, IAPWS R7-97(2012) table 5 (pub)', () => {
	checkForward(
		[
			[
				300,
				3,
				'0.100215168e-2',
				'0.115331273e3',
				'0.112324818e3',
				'0.392294792',
				'0.417301218e1',
				'0.150773921e4'
			],
			[
				300,
				80,
				'0.971180894e-3',
				'0.184142828e3',
				'0.106448356e3',
				'0.368563852',
				'0.401008987e1',
				'0.163469054e4'
			],
			[
				500,
				3,
				'0.120241800e-2',
				'0.975542239e3',
				'0.971934985e3',
				'0.258041912e1',
				'0.465580682e1',
				'0.124071337e4'
			]
		],
		1
	);
});

describe('region 2, IAPWS R7-97(2012) table 15 (pub)', () => {
	checkForward(
		[
			[
				300,
				0.0035,
				'0.394913866e2',
				'0.254991145e4',
				'0.241169160e4',
				'0.852238967e1',
				'0.191300162e1',
				'0.427920172e3'
			],
			[
				700,
				0.0035,
				'0.923015898e2',
				'0.333568375e4',
				'0.301262819e4',
				'0.101749996e2',
				'0.208141274e1',
				'0.644289068e3'
			],
			[
				700,
				30,
				'0.542946619e-2',
				'0.263149474e4',
				'0.246861076e4',
				'0.517540298e1',
				'0.103505092e2',
				'0.480386523e3'
			]
		],
		2
	);
});

describe('region 5, IAPWS R7-97(2012) table 42 (pub)', () => {
	checkForward(
		[
			[
				1500,
				0.5,
				'0.138455090e1',
				'0.521976855e4',
				'0.452749310e4',
				'0.965408875e1',
				'0.261609445e1',
				'0.917068690e3'
			],
			[
				1500,
				30,
				'0.230761299e-1',
				'0.516723514e4',
				'0.447495124e4',
				'0.772970133e1',
				'0.272724317e1',
				'0.928548002e3'
			],
			[
				2000,
				30,
				'0.311385219e-1',
				'0.657122604e4',
				'0.563707038e4',
				'0.853640523e1',
				'0.288569882e1',
				'0.106736948e4'
			]
		],
		5
	);
});

describe('cv at the same points, against python3-iapws (not in the release tables)', () => {
	// Debian's python3-iapws 1.5 (IAPWS97 _Region1/_Region2/_Region5 'cv'), relative 1e-12.
	const points: [number, number, number][] = [
		[300, 3, 4.121201603587438],
		[300, 80, 3.9173660618448736],
		[500, 3, 3.2213922290283015],
		[300, 0.0035, 1.4413266189747822],
		[700, 0.0035, 1.619783325600298],
		[700, 30, 2.97553836890886],
		[1500, 0.5, 2.1533778352104127],
		[1500, 30, 2.1927482936648652],
		[2000, 30, 2.3958943623580446]
	];
	for (const [T, p, cv] of points) {
		it(`T = ${T} K, p = ${p} MPa`, () => {
			expect(Math.abs((stateFromPT(p, T).cv as number) / cv - 1)).toBeLessThan(1e-12);
		});
	}
});

describe('region 4, IAPWS R7-97(2012) tables 35 and 36 (pub)', () => {
	it.each([
		[300, '0.353658941e-2'],
		[500, '0.263889776e1'],
		[600, '0.123443146e2']
	])('table 35: psat(%f K) = %s MPa', (T, p) => expectPublished(saturationPressure(T), p));

	it.each([
		[0.1, '0.372755919e3'],
		[1, '0.453035632e3'],
		[10, '0.584149488e3']
	])('table 36: Tsat(%f MPa) = %s K', (p, T) => expectPublished(saturationTemperature(p), T));
});

describe('B23 boundary, IAPWS R7-97(2012) eqs. 5 and 6', () => {
	it('eq. 5: p(623.15 K) = 0.165291643e2 MPa (pub)', () => {
		expectPublished(b23Pressure(623.15), '0.165291643e2');
	});
	it('eq. 6: T(16.5291643 MPa) = 0.623150000e3 K (from memory)', () => {
		expectPublished(b23Temperature(0.165291643e2), '0.623150000e3');
	});
});

describe('2b/2c boundary, IAPWS R7-97(2012) eqs. 20 and 21 (from memory)', () => {
	it('eq. 20: p(3516.004323 kJ/kg) = 0.100000000e3 MPa', () => {
		expectPublished(b2bcPressure(0.3516004323e4), '0.100000000e3');
	});
	it('eq. 21: h(100 MPa) = 0.3516004323e4 kJ/kg', () => {
		expectPublished(b2bcEnthalpy(100), '0.3516004323e4');
	});
});

describe('region 1 backward T(p, h), IAPWS R7-97(2012) table 7 (pub)', () => {
	it.each([
		[3, 500, '0.391798509e3'],
		[80, 500, '0.378108626e3'],
		[80, 1500, '0.611041229e3']
	])('p = %f MPa, h = %f kJ/kg → T = %s K', (p, h, T) => {
		expectPublished(region1TemperaturePH(p, h), T);
	});
});

describe('region 1 backward T(p, s), IAPWS R7-97(2012) table 9 (pub)', () => {
	it.each([
		[3, 0.5, '0.307842258e3'],
		[80, 0.5, '0.309979785e3'],
		[80, 3, '0.565899909e3']
	])('p = %f MPa, s = %f kJ/(kg K) → T = %s K', (p, s, T) => {
		expectPublished(region1TemperaturePS(p, s), T);
	});
});

describe('region 2 backward T(p, h), IAPWS R7-97(2012) table 24 (pub)', () => {
	it.each([
		[0.001, 3000, '0.534433241e3'], // 2a
		[3, 3000, '0.575373370e3'], // 2a
		[3, 4000, '0.101077577e4'], // 2a
		[5, 3500, '0.801299102e3'], // 2b
		[5, 4000, '0.101531583e4'], // 2b
		[25, 3500, '0.875279054e3'], // 2b
		[40, 2700, '0.743056411e3'], // 2c
		[60, 2700, '0.791137067e3'], // 2c
		[60, 3200, '0.882756860e3'] // 2c
	])('p = %f MPa, h = %f kJ/kg → T = %s K', (p, h, T) => {
		expectPublished(region2TemperaturePH(p, h), T);
	});
});

describe('region 2 backward T(p, s), IAPWS R7-97(2012) table 29 (pub)', () => {
	it.each([
		[0.1, 7.5, '0.399517097e3'], // 2a
		[0.1, 8, '0.514127081e3'], // 2a
		[2.5, 8, '0.103984917e4'], // 2a
		[8, 6, '0.600484040e3'], // 2b
		[8, 7.5, '0.106495556e4'], // 2b
		[90, 6, '0.103801126e4'], // 2b
		[20, 5.75, '0.697992849e3'], // 2c
		[80, 5.25, '0.854011484e3'], // 2c
		[80, 5.75, '0.949017998e3'] // 2c
	])('p = %f MPa, s = %f kJ/(kg K) → T = %s K', (p, s, T) => {
		expectPublished(region2TemperaturePS(p, s), T);
	});
});
