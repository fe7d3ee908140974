/**
 * The public API: every function refuses non-finite and out-of-range input with a
 * SteamRangeError that names the quantity, the value given and the valid range.
 */
import { describe, expect, it } from 'vitest';
import * as steam from './index';

const { SteamRangeError } = steam;

type Case = [call: () => unknown, quantity: string, shown: string, range: RegExp];

function expectRefused([call, quantity, shown, range]: Case): void {
	let error: unknown;
	try {
		call();
	} catch (e) {
		error = e;
	}
	expect(error).toBeInstanceOf(SteamRangeError);
	const { message } = error as InstanceType<typeof SteamRangeError>;
	expect(message).toContain(`${quantity} = ${shown}`);
	expect(message).toMatch(range);
	expect((error as InstanceType<typeof SteamRangeError>).quantity).toBe(quantity);
}

const NON_FINITE: [number, string][] = [
	[Number.NaN, 'NaN (not a finite number)'],
	[Infinity, 'Infinity (not a finite number)'],
	[-Infinity, '-Infinity (not a finite number)']
];

const P_RANGE = /0\.000001 to 100 MPa/;
const T_RANGE = /273\.15 to 2273\.15 K/;
const SAT_P_RANGE = /0\.000611213 to 22\.064 MPa \(the saturation line\)/;
const SAT_T_RANGE = /273\.15 to 647\.096 K/;
const X_RANGE = /0 to 1/;

const cases: Record<string, Case[]> = {
	saturationPressure: [
		...NON_FINITE.map(([v, s]): Case => [
			() => steam.saturationPressure(v),
			'temperature T',
			s,
			SAT_T_RANGE
		]),
		[() => steam.saturationPressure(-5), 'temperature T', '-5', SAT_T_RANGE],
		[() => steam.saturationPressure(273.14), 'temperature T', '273.14', SAT_T_RANGE],
		[() => steam.saturationPressure(650), 'temperature T', '650', SAT_T_RANGE]
	],
	saturationTemperature: [
		...NON_FINITE.map(([v, s]): Case => [
			() => steam.saturationTemperature(v),
			'pressure p',
			s,
			SAT_P_RANGE
		]),
		[() => steam.saturationTemperature(-1), 'pressure p', '-1', SAT_P_RANGE],
		[() => steam.saturationTemperature(0.0006), 'pressure p', '0.0006', SAT_P_RANGE],
		[() => steam.saturationTemperature(22.1), 'pressure p', '22.1', SAT_P_RANGE]
	],
	stateFromPT: [
		...NON_FINITE.map(([v, s]): Case => [
			() => steam.stateFromPT(v, 400),
			'pressure p',
			s,
			P_RANGE
		]),
		...NON_FINITE.map(([v, s]): Case => [
			() => steam.stateFromPT(1, v),
			'temperature T',
			s,
			T_RANGE
		]),
		[() => steam.stateFromPT(-1, 400), 'pressure p', '-1', P_RANGE],
		[() => steam.stateFromPT(0, 400), 'pressure p', '0', P_RANGE],
		[() => steam.stateFromPT(1, -300), 'temperature T', '-300', T_RANGE],
		[() => steam.stateFromPT(1, 273.1), 'temperature T', '273.1', T_RANGE],
		[() => steam.stateFromPT(101, 400), 'pressure p', '101', P_RANGE],
		[() => steam.stateFromPT(1, 2300), 'temperature T', '2300', T_RANGE],
		[
			() => steam.stateFromPT(60, 1500),
			'pressure p',
			'60',
			/to 50 MPa at temperatures above 1073\.15 K/
		]
	],
	stateFromPH: [
		...NON_FINITE.map(([v, s]): Case => [
			() => steam.stateFromPH(v, 1000),
			'pressure p',
			s,
			P_RANGE
		]),
		...NON_FINITE.map(([v, s]): Case => [
			() => steam.stateFromPH(1, v),
			'specific enthalpy h',
			s,
			/kJ\/kg/
		]),
		[() => steam.stateFromPH(-1, 1000), 'pressure p', '-1', P_RANGE],
		[() => steam.stateFromPH(101, 1000), 'pressure p', '101', P_RANGE],
		[() => steam.stateFromPH(1, -50), 'specific enthalpy h', '-50', /kJ\/kg at p = 1 MPa/],
		[() => steam.stateFromPH(60, 4500), 'specific enthalpy h', '4500', /kJ\/kg at p = 60 MPa/]
	],
	stateFromPS: [
		...NON_FINITE.map(([v, s]): Case => [() => steam.stateFromPS(v, 5), 'pressure p', s, P_RANGE]),
		...NON_FINITE.map(([v, s]): Case => [
			() => steam.stateFromPS(1, v),
			'specific entropy s',
			s,
			/kJ\/\(kg K\)/
		]),
		[() => steam.stateFromPS(-1, 5), 'pressure p', '-1', P_RANGE],
		[() => steam.stateFromPS(101, 5), 'pressure p', '101', P_RANGE],
		[() => steam.stateFromPS(1, -1), 'specific entropy s', '-1', /kJ\/\(kg K\) at p = 1 MPa/],
		[() => steam.stateFromPS(1, 20), 'specific entropy s', '20', /kJ\/\(kg K\) at p = 1 MPa/]
	],
	stateFromPX: [
		...NON_FINITE.map(([v, s]): Case => [
			() => steam.stateFromPX(v, 0.5),
			'pressure p',
			s,
			SAT_P_RANGE
		]),
		...NON_FINITE.map(([v, s]): Case => [
			() => steam.stateFromPX(1, v),
			'dryness fraction x',
			s,
			X_RANGE
		]),
		[() => steam.stateFromPX(-1, 0.5), 'pressure p', '-1', SAT_P_RANGE],
		[() => steam.stateFromPX(0.0001, 0.5), 'pressure p', '0.0001', SAT_P_RANGE],
		[() => steam.stateFromPX(30, 0.5), 'pressure p', '30', SAT_P_RANGE],
		[() => steam.stateFromPX(1, -0.1), 'dryness fraction x', '-0.1', X_RANGE],
		[() => steam.stateFromPX(1, 1.5), 'dryness fraction x', '1.5', X_RANGE]
	],
	stateFromTX: [
		...NON_FINITE.map(([v, s]): Case => [
			() => steam.stateFromTX(v, 0.5),
			'temperature T',
			s,
			SAT_T_RANGE
		]),
		...NON_FINITE.map(([v, s]): Case => [
			() => steam.stateFromTX(400, v),
			'dryness fraction x',
			s,
			X_RANGE
		]),
		[() => steam.stateFromTX(-10, 0.5), 'temperature T', '-10', SAT_T_RANGE],
		[() => steam.stateFromTX(270, 0.5), 'temperature T', '270', SAT_T_RANGE],
		[() => steam.stateFromTX(700, 0.5), 'temperature T', '700', SAT_T_RANGE],
		[() => steam.stateFromTX(400, -1), 'dryness fraction x', '-1', X_RANGE],
		[() => steam.stateFromTX(400, 2), 'dryness fraction x', '2', X_RANGE]
	],
	saturatedLiquid: [
		...NON_FINITE.map(([v, s]): Case => [
			() => steam.saturatedLiquid(v),
			'pressure p',
			s,
			SAT_P_RANGE
		]),
		[() => steam.saturatedLiquid(-1), 'pressure p', '-1', SAT_P_RANGE],
		[() => steam.saturatedLiquid(0.0005), 'pressure p', '0.0005', SAT_P_RANGE],
		[() => steam.saturatedLiquid(23), 'pressure p', '23', SAT_P_RANGE]
	],
	saturatedVapour: [
		...NON_FINITE.map(([v, s]): Case => [
			() => steam.saturatedVapour(v),
			'pressure p',
			s,
			SAT_P_RANGE
		]),
		[() => steam.saturatedVapour(-1), 'pressure p', '-1', SAT_P_RANGE],
		[() => steam.saturatedVapour(0.0005), 'pressure p', '0.0005', SAT_P_RANGE],
		[() => steam.saturatedVapour(23), 'pressure p', '23', SAT_P_RANGE]
	]
};

describe('bad input throws SteamRangeError with a useful message', () => {
	for (const [name, list] of Object.entries(cases)) {
		it(name, () => list.forEach(expectRefused));
	}

	it('covers every function of the properties API (issue 3)', () => {
		const api = [
			'saturationPressure',
			'saturationTemperature',
			'stateFromPT',
			'stateFromPH',
			'stateFromPS',
			'stateFromPX',
			'stateFromTX',
			'saturatedLiquid',
			'saturatedVapour'
		];
		for (const name of api)
			expect(typeof (steam as Record<string, unknown>)[name]).toBe('function');
		expect(Object.keys(cases).sort()).toEqual(api.sort());
	});
});

describe('the public API', () => {
	it('returns every field of a state, never NaN', () => {
		const states = [
			steam.stateFromPT(1, 500),
			steam.stateFromPH(1, 2000),
			steam.stateFromPS(20, 4.4),
			steam.stateFromPX(1, 0.5),
			steam.stateFromTX(400, 0),
			steam.saturatedLiquid(20),
			steam.saturatedVapour(0.1)
		];
		for (const state of states) {
			expect(Object.keys(state).sort()).toEqual(
				['T', 'cp', 'cv', 'h', 'p', 'phase', 'region', 's', 'u', 'v', 'w', 'x'].sort()
			);
			for (const value of Object.values(state)) expect(Number.isNaN(value)).toBe(false);
		}
	});

	it('accepts the limits themselves', () => {
		expect(steam.stateFromPT(100, 273.15).region).toBe(1);
		expect(steam.stateFromPT(100, 1073.15).region).toBe(2);
		expect(steam.stateFromPT(50, 2273.15).region).toBe(5);
		expect(steam.stateFromPT(1e-6, 273.15).region).toBe(2);
		expect(steam.saturationPressure(273.15)).toBeCloseTo(0.000611212677, 12);
		expect(steam.saturationTemperature(22.064)).toBeCloseTo(647.096, 6);
		expect(steam.stateFromTX(647.096, 1).region).toBe(3);
	});
});
