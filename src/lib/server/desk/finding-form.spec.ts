import { describe, expect, it } from 'vitest';
import { findingCaptureSchema, type TrapCapture } from '../../schemas/capture';
import { captureOf, demoFindings } from '../seed/findings';
import { compareCaptures, mergeCaptures } from './conflict-fields';
import { figureWords } from './finding-detail';
import { captureFromForm, formContext, formValuesOf, type EditSite } from './finding-form';

const raw = demoFindings.find((f) => f.kind === 'trap' && f.inputs.condition === 'failed-open')!;
const trap = findingCaptureSchema.parse(captureOf(raw)) as TrapCapture;
const site = (system: 'SI' | 'US'): EditSite => ({
	system,
	atmosphericPressure: 0.101325,
	headers: [{ id: trap.headerId!, name: 'HP boiler header', pressure: 1.1, sortOrder: 0 }],
	areas: trap.areaId ? [{ id: trap.areaId, name: 'Boiler house' }] : [],
	currency: 'USD'
});
const opened = (s: EditSite, c = trap) => {
	const { values, layers } = formValuesOf(c, 12_345, s);
	const { repairCost, ...fields } = values;
	return { version: '1', repairCost, layers, fields };
};

describe('the Desk edit form', () => {
	it('opens as typed and saves back the same capture (SI)', () => {
		const form = opened(site('SI'));
		expect(form.repairCost).toBe('123.45');
		const back = captureFromForm(trap, form, site('SI'));
		expect('capture' in back && back.capture.inputs).toEqual(trap.inputs);
		expect('capture' in back && back.repairCost).toBe(12_345);
	});

	it('reads the person’s units: an orifice of 1/8 in is 3.175 mm (exact inch, NIST SP 811)', () => {
		const form = opened(site('US'));
		const back = captureFromForm(
			trap,
			{ ...form, fields: { ...form.fields, orifice: '0.125' } },
			site('US')
		);
		if (!('capture' in back)) throw new Error(JSON.stringify(back));
		expect((back.capture as TrapCapture).inputs.orificeDiameter).toBeCloseTo(0.003175, 12);
	});

	it('carries over inputs the form has no field for', () => {
		const withLoad = { ...trap, inputs: { ...trap.inputs, condensateLoad: 0.02 } };
		const back = captureFromForm(withLoad, opened(site('SI'), withLoad), site('SI'));
		expect('capture' in back && (back.capture as TrapCapture).inputs.condensateLoad).toBe(0.02);
	});

	it('names each bad field by its form name, in the person’s words', () => {
		const form = opened(site('SI'));
		const back = captureFromForm(
			trap,
			{ ...form, repairCost: '-4', fields: { ...form.fields, orifice: 'wide', condition: '' } },
			site('SI')
		);
		expect('problems' in back && Object.keys(back.problems).sort()).toEqual([
			'condition',
			'orifice',
			'repairCost'
		]);
	});
});

describe('a conflict field by field', () => {
	const ctx = formContext(site('SI'), trap);
	const device = {
		...trap,
		notes: 'From the phone',
		inputs: { ...trap.inputs, condition: 'leaking' as const }
	};

	it('marks what differs, in words', () => {
		const rows = compareCaptures(trap, device, ctx);
		expect(
			rows
				.filter((r) => r.differs)
				.map((r) => r.key)
				.sort()
		).toEqual(['condition', 'notes']);
		expect(rows.find((r) => r.key === 'condition')).toMatchObject({
			server: 'Failed open',
			device: 'Leaking'
		});
	});

	it('merges the chosen side of each field and needs a choice for every difference', () => {
		const rows = compareCaptures(trap, device, ctx);
		const missing = mergeCaptures(trap, device, { notes: 'device' }, rows);
		expect('errors' in missing && Object.keys(missing.errors)).toEqual(['choice.condition']);
		const merged = mergeCaptures(trap, device, { notes: 'device', condition: 'server' }, rows);
		if (!('capture' in merged)) throw new Error(merged.problem);
		expect(merged.capture.notes).toBe('From the phone');
		expect(merged.capture.inputs).toEqual(trap.inputs);
	});
});

describe('stored figures that are not current', () => {
	it('say so in words, naming both basis versions', () => {
		expect(figureWords('basis', 2, 3)).toMatch(
			/priced on cost basis version 2; the site is now on version 3/
		);
		expect(figureWords('current', 3, 3)).toBeNull();
		expect(figureWords('engine', 3, 3)).toMatch(/earlier version of the engine/);
	});
});
