import { describe, expect, it } from 'vitest';
import { SteamRangeError } from '../errors';
import { stateFromPT } from '../forward';
import { saturationTemperature } from '../region4';
import { stateFromPX } from '../saturation';
import { checkExpansionPressures, steamInlet, superheatOf } from './inlet';

function rangeError(call: () => unknown): SteamRangeError {
	try {
		call();
	} catch (error) {
		expect(error).toBeInstanceOf(SteamRangeError);
		return error as SteamRangeError;
	}
	throw new Error('expected a SteamRangeError');
}

describe('steamInlet', () => {
	it('takes superheated steam from T1 and wet steam from x1', () => {
		expect(steamInlet({ p1: 4, T1: 673.15 })).toEqual(stateFromPT(4, 673.15));
		expect(steamInlet({ p1: 1, x1: 0.95 })).toEqual(stateFromPX(1, 0.95));
	});

	it('accepts both only when T1 is the saturation temperature, and then x1 decides', () => {
		const Ts = saturationTemperature(1);
		expect(steamInlet({ p1: 1, T1: Ts, x1: 0.9 }).x).toBeCloseTo(0.9, 15);
		expect(() => steamInlet({ p1: 1, T1: Ts + 5, x1: 0.9 })).toThrow(
			/Give T1 or x1, not both: .*\(453\.0356 K at p1 = 1 MPa abs\).*T1 = 458\.03/
		);
	});

	it('asks for one of T1 and x1 when neither is given', () => {
		expect(() => steamInlet({ p1: 1 })).toThrow(
			'Give the inlet temperature T1 (superheated steam) or the inlet dryness fraction x1'
		);
	});

	it('asks for x1 when T1 is the saturation temperature itself', () => {
		expect(() => steamInlet({ p1: 1, T1: saturationTemperature(1) })).toThrow(
			/is the saturation temperature at p1 = 1 MPa abs.*give the dryness fraction x1/
		);
	});

	it('refuses liquid water below saturation and compressed liquid above the critical pressure', () => {
		expect(() => steamInlet({ p1: 1, T1: 400 })).toThrow(
			'At p1 = 1 MPa abs, T1 = 400 K is below saturation (453.04 K): that is liquid water, not steam'
		);
		expect(() => steamInlet({ p1: 30, T1: 600 })).toThrow(/compressed liquid, not steam/);
	});

	it('takes supercritical steam from T1', () => {
		expect(steamInlet({ p1: 25, T1: 873.15 }).phase).toBe('supercritical');
	});

	it('names the input outside IF97', () => {
		expect(rangeError(() => steamInlet({ p1: 150, T1: 700 })).quantity).toBe('inlet pressure p1');
		expect(rangeError(() => steamInlet({ p1: 1, T1: 3000 })).quantity).toBe('inlet temperature T1');
		expect(rangeError(() => steamInlet({ p1: 1, x1: 1.2 })).quantity).toBe(
			'inlet dryness fraction x1'
		);
		const above = rangeError(() => steamInlet({ p1: 25, x1: 1 }));
		expect(above.quantity).toBe('inlet pressure p1');
		expect(above.message).toContain('the saturation line, where a dryness fraction applies');
		// Region 5 stops at 50 MPa: the engine's own check names the pair.
		expect(rangeError(() => steamInlet({ p1: 60, T1: 1500 })).quantity).toBe('pressure p');
	});
});

describe('checkExpansionPressures', () => {
	it('refuses an outlet at or above the inlet, and outside IF97', () => {
		expect(() => checkExpansionPressures(1, 1)).toThrow(
			'The outlet pressure p2 (1 MPa abs) must be below the inlet pressure p1 (1 MPa abs)'
		);
		expect(() => checkExpansionPressures(1, 2)).toThrow(/must be below the inlet pressure/);
		expect(rangeError(() => checkExpansionPressures(1, 0)).quantity).toBe('outlet pressure p2');
		expect(rangeError(() => checkExpansionPressures(1, NaN)).quantity).toBe('outlet pressure p2');
		expect(() => checkExpansionPressures(1, 0.5)).not.toThrow();
	});
});

describe('superheatOf', () => {
	it('is T − T_sat for vapour, null inside the dome, for liquid and above the critical pressure', () => {
		expect(superheatOf(stateFromPT(1, 500))).toBeCloseTo(500 - saturationTemperature(1), 12);
		expect(superheatOf(stateFromPX(1, 0.5))).toBeNull();
		expect(superheatOf(stateFromPT(1, 400))).toBeNull();
		expect(superheatOf(stateFromPT(25, 900))).toBeNull();
	});
});
