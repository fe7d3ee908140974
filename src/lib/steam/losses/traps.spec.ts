import { describe, expect, it } from 'vitest';
import type { TrapInputs } from './inputs';
import { orificeSteamFlow } from './orifice';
import { DISCHARGE_COEFFICIENT, TRAP_FACTORS, defaultTrapOrifice, trapSteamLoss } from './traps';

const trap: TrapInputs = {
	trapType: 'inverted-bucket',
	dn: 15,
	condition: 'failed-open',
	discharge: 'atmosphere',
	orificeDiameter: 0.004
};
const input = { inputs: trap, inletPressure: 1.1, atmosphere: 0.101325 };

describe('defaultTrapOrifice', () => {
	it('gives mechanical traps smaller seats at higher pressure ratings', () => {
		const low = defaultTrapOrifice('inverted-bucket', 15, 0.1).value;
		const mid = defaultTrapOrifice('inverted-bucket', 15, 0.7).value;
		const high = defaultTrapOrifice('inverted-bucket', 15, 1.7).value;
		expect(low).toBeGreaterThan(mid);
		expect(mid).toBeGreaterThan(high);
	});

	it('marks every default as common practice', () => {
		expect(defaultTrapOrifice('thermodynamic', 20, 1).source).toMatch(/^common practice/);
	});

	it('grows with trap size for every type with a table', () => {
		for (const type of [
			'inverted-bucket',
			'float-thermostatic',
			'thermodynamic',
			'thermostatic',
			'bimetallic'
		] as const) {
			const sizes = [8, 10, 15, 20, 25, 32, 40, 50].map(
				(dn) => defaultTrapOrifice(type, dn, 0.5).value
			);
			for (let i = 1; i < sizes.length; i++) expect(sizes[i]).toBeGreaterThanOrEqual(sizes[i - 1]);
		}
	});

	it('refuses to guess for fixed-orifice, other and out-of-table sizes', () => {
		expect(() => defaultTrapOrifice('fixed-orifice', 15, 1)).toThrow(
			'Enter the discharge orifice diameter for a fixed-orifice trap: there is no default'
		);
		expect(() => defaultTrapOrifice('thermodynamic', 80, 1)).toThrow(
			'Enter the discharge orifice diameter for a DN 80 trap: defaults cover DN 8 to DN 50'
		);
	});
});

describe('trapSteamLoss', () => {
	it('prices a failed-open trap at the full orifice flow with the default cd', () => {
		const loss = trapSteamLoss(input);
		const full = orificeSteamFlow({
			p1: 1.1,
			p2: 0.101325,
			diameter: 0.004,
			cd: DISCHARGE_COEFFICIENT.value
		});
		expect(TRAP_FACTORS.failedOpen.value).toBe(1);
		expect(loss.steamFlow).toBeCloseTo(full.massFlow, 12);
		expect(loss.assumptions.map((a) => a.key)).toEqual([
			'orificeDiameter',
			'dischargeCoefficient',
			'trapFactor.failedOpen',
			'backPressure'
		]);
	});

	it('prices a leaking trap at the leaking fraction, and takes site overrides', () => {
		const open = trapSteamLoss(input).steamFlow;
		const leaking = trapSteamLoss({ ...input, inputs: { ...trap, condition: 'leaking' } });
		expect(leaking.steamFlow).toBeCloseTo(open * TRAP_FACTORS.leaking.value, 12);
		const site = trapSteamLoss({
			...input,
			inputs: { ...trap, condition: 'leaking' },
			factors: { leaking: 0.4 }
		});
		expect(site.steamFlow).toBeCloseTo(open * 0.4, 12);
		expect(site.assumptions.find((a) => a.key === 'trapFactor.leaking')?.source).toBe(
			'site cost basis'
		);
	});

	it('loses less into a pressurised return than to atmosphere when the return un-chokes it', () => {
		const toReturn = trapSteamLoss({
			...input,
			inputs: { ...trap, discharge: 'condensate-return', backPressure: 0.9 }
		});
		expect(toReturn.orifice?.choked).toBe(false);
		expect(toReturn.steamFlow).toBeLessThan(trapSteamLoss(input).steamFlow);
	});

	it.each(['failed-closed', 'flooded'] as const)('%s: no steam loss, a risk note', (condition) => {
		const loss = trapSteamLoss({ ...input, inputs: { ...trap, condition } });
		expect(loss.steamFlow).toBe(0);
		expect(loss.riskNote).toMatch(/water hammer/);
	});

	it.each(['working', 'out-of-service', 'not-accessible'] as const)(
		'%s: nothing, with a note',
		(condition) => {
			const loss = trapSteamLoss({ ...input, inputs: { ...trap, condition } });
			expect(loss.steamFlow).toBe(0);
			expect(loss.riskNote).toBeNull();
			expect(loss.note).not.toBeNull();
		}
	);

	it('refuses a return at or above the inlet pressure', () => {
		expect(() =>
			trapSteamLoss({
				...input,
				inputs: { ...trap, discharge: 'condensate-return', backPressure: 1.2 }
			})
		).toThrow(
			"The trap's back pressure (1.2 MPa abs) must be below its inlet pressure (1.1 MPa abs)"
		);
	});
});
