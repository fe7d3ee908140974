import { describe, expect, it } from 'vitest';
import { evaluateFinding } from '$lib/steam';
import { lossCostBasis } from '../../../../../tests/fixtures/loss-site';
import { showAssumption, showFigure } from './display';
import { estimateFinding } from './estimate';
import { formContext, HEADER_ID } from './spec-fixtures';
import { toCapture } from './to-capture';

const trap = {
	tag: 'ST-1',
	trapType: 'thermodynamic',
	size: '15',
	headerId: HEADER_ID,
	discharge: 'atmosphere',
	condition: 'failed-open',
	photoIds: '[]'
};
const basis = { ...lossCostBasis, atmosphericPressure: 0.095 };

describe('estimateFinding', () => {
	it('says which fields are still needed, by their labels', () => {
		const e = estimateFinding(
			'trap',
			{ ...trap, condition: '', headerId: '' },
			formContext(),
			basis
		);
		expect(e).toEqual({ state: 'incomplete', missing: ['Header', 'Condition'] });
	});

	it('gives the engine’s own figures, in its base units, when the site is priced', () => {
		const ctx = formContext('SI');
		const e = estimateFinding('trap', trap, ctx, basis);
		if (e.state !== 'ready') throw new Error(e.state);
		const built = toCapture('trap', trap, ctx);
		if (!('capture' in built)) throw new Error('capture');
		const engine = evaluateFinding(built.capture, { costBasis: basis, headers: ctx.headers });
		const value = (key: string) => e.figures.find((f) => f.key === key)?.value;
		expect(value('steam')).toBe(engine.steamLoss);
		expect(value('heat')).toBe(engine.heatLoss);
		expect(value('fuel')).toBe(engine.fuelEnergy);
		expect(value('cost')).toBe(engine.cost.amount);
		expect(value('co2')).toBe(engine.co2);
		expect(value('water')).toBe(engine.water);
		expect(e.priced).toBe(true);
		expect(e.cautions.map((c) => c.key)).toContain('steam-plume');
	});

	it('without a cost basis shows the same steam, no money, and says why heat waits', () => {
		const ctx = formContext('SI');
		const priced = estimateFinding('trap', trap, ctx, basis);
		const bare = estimateFinding('trap', trap, ctx, null);
		if (priced.state !== 'ready' || bare.state !== 'ready') throw new Error('state');
		expect(bare.priced).toBe(false);
		expect(bare.figures.map((f) => f.key)).toEqual(['steam']);
		expect(bare.figures[0].value).toBeCloseTo(priced.figures[0].value, 9);
		expect(bare.gaps[0]).toMatch(/cost basis/);
	});

	it('insulation without a cost basis still has its heat saved', () => {
		const values = {
			item: 'pipe',
			size: '50',
			length: '10',
			temperatureSource: 'header',
			headerId: HEADER_ID,
			ambient: '20',
			wind: '0',
			material: 'mineral-wool',
			thickness: '50',
			bareEmissivity: '0.85',
			jacketEmissivity: '0.1'
		};
		const e = estimateFinding('insulation', values, formContext(), null);
		if (e.state !== 'ready') throw new Error(e.state);
		expect(e.figures.map((f) => f.key)).toEqual(['heat']);
		expect(e.figures[0].value).toBeGreaterThan(0);
		expect(e.cautions.map((c) => c.key)).toContain('hot-surface');
	});

	it('an impossible trap reading gives words, not an engine error', () => {
		const e = estimateFinding('trap', { ...trap, trapType: 'fixed-orifice' }, formContext(), basis);
		expect(e).toEqual({
			state: 'unavailable',
			reason:
				'Enter the discharge orifice: there is no usual seat size for this trap type and size.'
		});
	});

	it('a header reading at saturation is flagged', () => {
		const ctx = formContext('SI');
		// 10 bar g at 0.095 MPa = 1.095 MPa abs; saturation 184.0 °C (IAPWS-IF97 region 4)
		const e = estimateFinding(
			'header',
			{ headerId: HEADER_ID, pressure: '10', temperature: '184' },
			ctx,
			null
		);
		if (e.state !== 'ready') throw new Error(e.state);
		expect(e.header?.condition).toBe('at-saturation');
		expect(e.header?.saturationTemperature).toBeCloseTo(457.2, 0);
	});
});

describe('showing figures and assumptions', () => {
	it('in the person’s units', () => {
		expect(showFigure({ key: 'steam', value: 12.34 }, 'SI', null)).toEqual({
			number: '12.3',
			unit: 'kg/h'
		});
		// 12.34 kg/h ÷ 0.453 592 37 = 27.2 lb/h
		expect(showFigure({ key: 'steam', value: 12.34 }, 'US', null)).toEqual({
			number: '27.2',
			unit: 'lb/h'
		});
		expect(showFigure({ key: 'cost', value: 12345.6 }, 'SI', 'EUR').number).toBe('€12,300');
		expect(showFigure({ key: 'co2', value: 23456 }, 'SI', null)).toEqual({
			number: '23.5',
			unit: 't CO2 per year'
		});
		expect(showFigure({ key: 'fuel', value: 105.5 }, 'US', null).unit).toBe('MMBtu per year');
	});

	it('assumption pressures gauge, the atmosphere absolute', () => {
		const a = {
			key: 'headerPressure',
			label: 'Header pressure',
			value: 1.095,
			unit: 'MPa abs',
			source: 'site header list'
		};
		expect(showAssumption(a, 'SI', 0.095)).toBe('10 bar g');
		expect(showAssumption({ ...a, key: 'atmosphericPressure', value: 0.095 }, 'SI', 0.095)).toBe(
			'0.95 bar a'
		);
		expect(showAssumption({ ...a, unit: 'm', value: 0.0032 }, 'SI', 0.095)).toBe('3.2 mm');
	});
});
