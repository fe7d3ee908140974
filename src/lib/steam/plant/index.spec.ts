/**
 * The plant module's contract names, as the Desk and other checks call them, from the engine's
 * public barrel.
 */
import { describe, expect, it } from 'vitest';
import * as steam from '../index';

describe('the public barrel', () => {
	it.each([
		'expandSteam',
		'pumpWork',
		'rankineCycle',
		'letdownTurbine',
		'flashRecovery',
		'condensateReturn',
		'blowdownRate',
		'blowdownRecovery',
		'saturationDome',
		'expansionLine',
		'plantCautions'
	])('exports %s', (name) => {
		expect(typeof (steam as Record<string, unknown>)[name]).toBe('function');
	});

	it('gives the same SteamRangeError the plant functions throw', () => {
		expect(() => steam.expandSteam({ p1: 200, T1: 700, p2: 1, isentropicEfficiency: 0.8 })).toThrow(
			steam.SteamRangeError
		);
	});
});
