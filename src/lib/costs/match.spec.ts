import { describe, expect, it } from 'vitest';
import { entryKey, layersThicknessMm, matchFinding, priceMatch, type PricedEntry } from './match';

const trap = (condition: string, extra: Record<string, unknown> = {}) => ({
	kind: 'trap',
	inputs: { trapType: 'thermodynamic', dn: 15, condition, discharge: 'atmosphere', ...extra }
});
const entry = (over: Partial<PricedEntry> = {}): PricedEntry => ({
	id: 'e',
	version: 1,
	currency: 'EUR',
	unitCost: 10_000,
	labourHours: null,
	...over
});

describe('matching a finding to its library entry', () => {
	it('repairs a leaking trap, replaces a failed one, leaves a working one alone', () => {
		expect(matchFinding(trap('leaking'))).toEqual({
			ok: true,
			key: 'trap-repair:thermodynamic:15',
			quantity: 1,
			unit: 'each'
		});
		expect(matchFinding(trap('failed-open'))).toMatchObject({
			key: 'trap-replacement:thermodynamic:15'
		});
		expect(matchFinding(trap('failed-closed'))).toMatchObject({ ok: true });
		expect(matchFinding(trap('working'))).toEqual({ ok: false, reason: 'no-repair' });
		expect(matchFinding(trap('not-accessible'))).toEqual({ ok: false, reason: 'no-repair' });
	});

	it('prices a pipe run per metre of its proposed thickness, covers per fitting', () => {
		const layers = [{ thickness: 0.03 }, { thickness: 0.02 }];
		expect(layersThicknessMm(layers)).toBe(50);
		expect(
			matchFinding({ kind: 'insulation', inputs: { item: 'pipe', dn: 50, length: 12.5, layers } })
		).toEqual({ ok: true, key: 'insulation:50:50', quantity: 12.5, unit: 'm' });
		expect(
			matchFinding({ kind: 'insulation', inputs: { item: 'valve', dn: 80, count: 3, layers } })
		).toEqual({ ok: true, key: 'fitting-cover:valve:80', quantity: 3, unit: 'each' });
		expect(
			matchFinding({ kind: 'insulation', inputs: { item: 'pipe', outerDiameter: 0.2, layers } })
		).toEqual({ ok: false, reason: 'no-size' });
		expect(matchFinding({ kind: 'insulation', inputs: { item: 'surface', area: 4 } })).toEqual({
			ok: false,
			reason: 'surface'
		});
		expect(matchFinding({ kind: 'insulation', inputs: { item: 'pipe', dn: 50, layers } })).toEqual({
			ok: false,
			reason: 'no-length'
		});
	});

	it('matches a leak by its size class only', () => {
		expect(matchFinding({ kind: 'leak', inputs: { sizeClass: 'medium' } })).toMatchObject({
			key: 'leak-repair:medium'
		});
		expect(matchFinding({ kind: 'leak', inputs: { holeDiameter: 0.002 } })).toEqual({
			ok: false,
			reason: 'no-size'
		});
		expect(matchFinding({ kind: 'header', inputs: {} })).toEqual({
			ok: false,
			reason: 'no-repair'
		});
	});

	it('makes the keys the library rows carry', () => {
		expect(entryKey({ kind: 'fitting-cover', fittingKind: 'flange-pair', dn: 100 })).toBe(
			'fitting-cover:flange-pair:100'
		);
		expect(entryKey({ kind: 'labour' })).toBe('labour');
	});
});

describe('pricing a match', () => {
	const pipe = { ok: true as const, key: 'insulation:50:50', quantity: 12.5, unit: 'm' as const };

	it('is quantity × (unit cost + hours × labour rate), rounded to minor units', () => {
		const entries = new Map([
			['insulation:50:50', entry({ unitCost: 3_333, labourHours: 0.5 })],
			['labour', entry({ id: 'l', unitCost: 6_500 })]
		]);
		// 12.5 × (3333 + 0.5 × 6500) = 12.5 × 6583 = 82 287.5 → 82 288
		expect(priceMatch(pipe, entries, 'EUR')).toMatchObject({ ok: true, costMinor: 82_288 });
	});

	it('never converts currencies and needs a labour rate for labour hours', () => {
		const inDollars = new Map([['insulation:50:50', entry({ currency: 'USD' })]]);
		expect(priceMatch(pipe, inDollars, 'EUR')).toEqual({ ok: false, reason: 'currency' });
		const noRate = new Map([['insulation:50:50', entry({ labourHours: 1 })]]);
		expect(priceMatch(pipe, noRate, 'EUR')).toEqual({ ok: false, reason: 'no-labour' });
		expect(priceMatch(pipe, new Map(), 'EUR')).toEqual({ ok: false, reason: 'no-entry' });
	});
});
