import { describe, expect, it } from 'vitest';
import { cautionsFor } from './cautions';

const keys = (c: ReturnType<typeof cautionsFor>) => c.map((x) => x.key);

describe('cautionsFor', () => {
	it('puts the plume warning first for steam vented to air', () => {
		const c = cautionsFor({ kind: 'leak', ventsSteam: true });
		expect(keys(c)).toEqual(['steam-plume', 'ppe', 'isolation', 'local-codes', 'estimate']);
		expect(c[0].text).toMatch(/invisible/);
	});

	it('warns of water hammer for a failed-closed or flooded trap', () => {
		expect(keys(cautionsFor({ kind: 'trap', condition: 'flooded' }))).toContain('water-hammer');
		expect(keys(cautionsFor({ kind: 'trap', condition: 'working' }))).not.toContain('water-hammer');
	});

	it('warns of hot surfaces and old insulation for insulation gaps', () => {
		expect(keys(cautionsFor({ kind: 'insulation', hotSurface: true }))).toEqual([
			'hot-surface',
			'ppe',
			'isolation',
			'old-insulation',
			'local-codes',
			'estimate'
		]);
	});

	it('always says the figures are estimates, and that repairs need isolation', () => {
		for (const kind of ['trap', 'leak', 'insulation'] as const) {
			const k = keys(cautionsFor({ kind }));
			expect(k).toContain('estimate');
			expect(k).toContain('isolation');
		}
		expect(keys(cautionsFor({ kind: 'header' }))).toEqual(['ppe', 'local-codes', 'estimate']);
	});
});
