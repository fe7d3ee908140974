import { describe, expect, it } from 'vitest';
import {
	INSULATION_ITEMS,
	INSULATION_MATERIALS,
	INSULATION_STATES,
	LEAK_COMPONENTS,
	LEAK_SIZE_CLASSES,
	TRAP_CONDITIONS,
	TRAP_DISCHARGES,
	TRAP_TEST_METHODS,
	TRAP_TYPES
} from '$lib/schemas/finding-vocabulary';
import { fromCapture } from './from-capture';
import { AREA_ID, ATMOSPHERE, formContext, HEADER_ID } from './spec-fixtures';
import { type CaptureResult, toCapture } from './to-capture';
import type { FormValues, Problems } from './types';

function captured(result: CaptureResult) {
	if ('problems' in result)
		throw new Error(`Unexpected problems: ${JSON.stringify(result.problems)}`);
	return result.capture;
}
function problems(result: CaptureResult): Problems {
	if (!('problems' in result)) throw new Error('Expected problems, got a capture');
	return result.problems;
}

const trapSI: FormValues = {
	tag: 'ST-104',
	location: 'North wall, tracer 4',
	areaId: AREA_ID,
	trapType: 'thermodynamic',
	size: '15',
	orifice: '3,2',
	headerId: HEADER_ID,
	discharge: 'condensate-return',
	backPressure: '0.5',
	testMethod: 'combined',
	inletTemperature: '180',
	outletTemperature: '110',
	condition: 'failed-open',
	notes: 'Blowing hard',
	photoIds: '[]'
};

describe('toCapture and fromCapture: trap test', () => {
	it('converts SI entries to base units, gauge pressure at the site atmosphere', () => {
		const c = captured(toCapture('trap', trapSI, formContext('SI')));
		if (c.kind !== 'trap') throw new Error('kind');
		expect(c.assetTag).toBe('ST-104');
		expect(c.inputs.dn).toBe(15);
		expect(c.inputs.orificeDiameter).toBeCloseTo(0.0032, 12); // 3,2 mm with a decimal comma
		// 0.5 bar g = 0.05 MPa above this site's 0.095 MPa atmosphere (bar = 0.1 MPa, NIST SP 811)
		expect(c.inputs.backPressure).toBeCloseTo(0.145, 12);
		expect(c.inputs.inletTemperature).toBeCloseTo(453.15, 9); // 180 °C
		expect(c.areaId).toBe(AREA_ID);
		expect(c.notes).toBe('Blowing hard');
	});

	it('round-trips SI values through the capture unchanged', () => {
		const ctx = formContext('SI');
		const back = fromCapture(captured(toCapture('trap', trapSI, ctx)), ctx);
		expect(back).toEqual({ ...trapSI, orifice: '3.2' });
	});

	it('reads and shows US entries: psig, °F, inches, NPS by its DN', () => {
		const ctx = formContext('US');
		const us = { ...trapSI, orifice: '0.125', backPressure: '7.25', inletTemperature: '356' };
		const c = captured(toCapture('trap', us, ctx));
		if (c.kind !== 'trap') throw new Error('kind');
		expect(c.inputs.orificeDiameter).toBeCloseTo(0.003175, 12); // 1/8 in = 3.175 mm
		// 7.25 psi = 0.049 987 MPa (psi = 6894.757 Pa, NIST SP 811 B.8) above 0.095 MPa
		expect(c.inputs.backPressure).toBeCloseTo(0.095 + 7.25 * 0.006894757293168361, 12);
		expect(c.inputs.inletTemperature).toBeCloseTo(453.15, 9); // 356 °F = 180 °C
		expect(fromCapture(c, ctx)).toEqual(us);
	});

	it('a gauge reading is read against the site’s own atmosphere', () => {
		const low = { ...formContext('SI'), atmosphericPressure: 0.08 };
		const c = captured(toCapture('trap', trapSI, low));
		if (c.kind !== 'trap') throw new Error('kind');
		expect(c.inputs.backPressure).toBeCloseTo(0.13, 12); // 0.05 MPa gauge + 0.08 MPa
		expect(ATMOSPHERE).not.toBe(0.08);
	});

	it('needs the condition and the header, in plain words', () => {
		const p = problems(
			toCapture('trap', { ...trapSI, condition: '', headerId: '' }, formContext())
		);
		expect(p.condition).toBe('Choose the trap’s condition');
		expect(p.headerId).toBe('Pick the header this trap is on');
	});

	it('a condensate return needs its back pressure, below the header’s', () => {
		const ctx = formContext('SI');
		expect(problems(toCapture('trap', { ...trapSI, backPressure: '' }, ctx)).backPressure).toBe(
			'Enter the return’s back pressure'
		);
		expect(problems(toCapture('trap', { ...trapSI, backPressure: '12' }, ctx)).backPressure).toBe(
			'The return’s back pressure must be below the header’s 10 bar g'
		);
		// To atmosphere, the back pressure is not asked for and not stored.
		const c = captured(toCapture('trap', { ...trapSI, discharge: 'atmosphere' }, ctx));
		expect(c.kind === 'trap' && c.inputs.backPressure).toBe(undefined);
	});

	it('names the orifice limits in the person’s units', () => {
		const bad = { ...trapSI, orifice: '80' };
		expect(problems(toCapture('trap', bad, formContext('SI'))).orifice).toBe(
			'Enter an orifice diameter above 0 and up to 50 mm'
		);
		// 50 mm = 1.97 in (in = 25.4 mm, NIST SP 811 B.8)
		expect(problems(toCapture('trap', { ...bad, orifice: '3' }, formContext('US'))).orifice).toBe(
			'Enter an orifice diameter above 0 and up to 1.97 in'
		);
		expect(problems(toCapture('trap', { ...bad, orifice: 'big' }, formContext('SI'))).orifice).toBe(
			'Enter the orifice diameter as a number in mm, e.g. 3.5'
		);
	});

	it('refuses choices that are not on the list, without naming ids', () => {
		const p = problems(
			toCapture('trap', { ...trapSI, trapType: 'steam-wizard', areaId: 'x' }, formContext())
		);
		expect(p.trapType).toBe('Choose the trap’s type');
		expect(p.areaId).toBe('Pick the area');
	});
});

const leak: FormValues = {
	location: 'Valve V-12',
	component: 'valve-stem',
	headerId: HEADER_ID,
	sizeMode: 'measured',
	holeDiameter: '2',
	notes: ''
};

describe('leak', () => {
	it('takes a measured hole or a plume class', () => {
		const ctx = formContext('SI');
		const measured = captured(toCapture('leak', leak, ctx));
		expect(measured.kind === 'leak' && measured.inputs.holeDiameter).toBeCloseTo(0.002, 12);
		const guided = captured(
			toCapture('leak', { ...leak, sizeMode: 'guide', sizeClass: 'medium' }, ctx)
		);
		expect(guided.kind === 'leak' && guided.inputs).toEqual({
			sizeClass: 'medium',
			component: 'valve-stem'
		});
		expect(fromCapture(guided, ctx).sizeMode).toBe('guide');
	});

	it('asks for the plume or the hole, in the person’s units', () => {
		const ctx = formContext('US');
		expect(problems(toCapture('leak', { ...leak, sizeMode: 'guide' }, ctx)).sizeClass).toBe(
			'Choose the plume that matches the leak'
		);
		// 100 mm = 3.94 in
		expect(problems(toCapture('leak', { ...leak, holeDiameter: '5' }, ctx)).holeDiameter).toBe(
			'Enter a hole size above 0 and up to 3.94 in'
		);
	});
});

const pipe: FormValues = {
	item: 'pipe',
	size: '50',
	length: '12',
	temperatureSource: 'header',
	headerId: HEADER_ID,
	ambient: '20',
	wind: '0',
	surfaceState: 'damaged',
	material: 'mineral-wool',
	thickness: '50',
	bareEmissivity: '0.85',
	jacketEmissivity: '0.1',
	location: 'Pipe bridge',
	areaId: AREA_ID,
	notes: ''
};

describe('insulation gap', () => {
	it('round-trips a pipe run in SI and US', () => {
		for (const system of ['SI', 'US'] as const) {
			const ctx = formContext(system);
			const values =
				system === 'US'
					? { ...pipe, length: '40', ambient: '68', wind: '5', thickness: '2' }
					: pipe;
			const c = captured(toCapture('insulation', values, ctx));
			expect(fromCapture(c, ctx)).toEqual({ ...values, photoIds: '[]' });
		}
	});

	it('a surface takes its area in m² or ft² and its own temperature', () => {
		const surface = {
			...pipe,
			item: 'surface',
			area: '10',
			height: '2',
			temperatureSource: 'measured',
			surfaceTemperature: '140',
			ambient: '68',
			thickness: '2'
		};
		const c = captured(toCapture('insulation', surface, formContext('US')));
		if (c.kind !== 'insulation') throw new Error('kind');
		expect(c.inputs.area).toBeCloseTo(0.9290304, 12); // 10 ft² (ft² = 0.092 903 04 m², NIST SP 811)
		expect(c.inputs.dn).toBeUndefined();
		expect(c.headerId).toBeUndefined();
		expect(c.inputs.processTemperature).toBeCloseTo(333.15, 9); // 140 °F = 60 °C
	});

	it('says what a flat surface or a valve still needs', () => {
		const ctx = formContext('SI');
		const s = problems(toCapture('insulation', { ...pipe, item: 'surface' }, ctx));
		expect(s.area).toBe('Enter the bare area');
		expect(s.height).toBe('Enter the surface height');
		expect(problems(toCapture('insulation', { ...pipe, item: 'valve' }, ctx)).count).toBe(
			'Enter how many are bare'
		);
		expect(
			problems(toCapture('insulation', { ...pipe, item: 'valve', count: '2.5' }, ctx)).count
		).toBe('Enter a count as a whole number between 1 and 10,000');
	});

	it('names air and wind limits in °C, °F, m/s and mph', () => {
		const bad = { ...pipe, ambient: '80', wind: '50' };
		const si = problems(toCapture('insulation', bad, formContext('SI')));
		expect(si.ambient).toBe('Enter an ambient air temperature between −50 and 60 °C');
		expect(si.wind).toBe('Enter a wind speed between 0 and 35 m/s');
		const us = problems(
			toCapture('insulation', { ...bad, ambient: '200', wind: '100' }, formContext('US'))
		);
		expect(us.ambient).toBe('Enter an ambient air temperature between −58 and 140 °F');
		// 35 m/s ÷ 0.447 04 = 78.3 mph (NIST SP 811 B.8)
		expect(us.wind).toBe('Enter a wind speed between 0 and 78.3 mph');
	});

	it('a measured surface must be warmer than the air', () => {
		const p = problems(
			toCapture(
				'insulation',
				{ ...pipe, temperatureSource: 'measured', surfaceTemperature: '15' },
				formContext()
			)
		);
		expect(p.surfaceTemperature).toBe('The surface must be warmer than the air around it (20 °C)');
	});
});

describe('header reading', () => {
	it('reads gauge pressure against the site’s atmosphere and round-trips', () => {
		const ctx = formContext('SI');
		const values = {
			headerId: HEADER_ID,
			pressure: '9,5',
			temperature: '185',
			location: '',
			notes: ''
		};
		const c = captured(toCapture('header', values, ctx));
		expect(c.kind === 'header' && c.inputs.measuredPressure).toBeCloseTo(1.045, 12);
		expect(fromCapture(c, ctx)).toEqual({ ...values, pressure: '9.5', photoIds: '[]' });
	});

	it('limits the pressure in bar g and psig', () => {
		const values = { headerId: HEADER_ID, pressure: '400' };
		// 22 MPa absolute less the 0.095 MPa atmosphere = 219 bar g
		expect(problems(toCapture('header', values, formContext('SI'))).pressure).toBe(
			'Enter a pressure above −0.95 and up to 219 bar g'
		);
		expect(
			problems(toCapture('header', { ...values, pressure: '5000' }, formContext('US'))).pressure
		).toBe('Enter a pressure above −13.8 and up to 3,180 psig');
		expect(problems(toCapture('header', { pressure: '5' }, formContext())).headerId).toBe(
			'Pick the header this reading is on'
		);
	});
});

describe('every message is in plain words', () => {
	const ids = [
		...TRAP_TYPES,
		...TRAP_CONDITIONS,
		...TRAP_DISCHARGES,
		...TRAP_TEST_METHODS,
		...LEAK_SIZE_CLASSES,
		...LEAK_COMPONENTS,
		...INSULATION_ITEMS,
		...INSULATION_MATERIALS,
		...INSULATION_STATES
	].filter((id) => id.includes('-'));
	const nonsense = (values: FormValues, value: string) =>
		Object.fromEntries(Object.keys(values).map((k) => [k, value]));

	it('never shows MPa, kelvin or a raw id', () => {
		const messages: string[] = [];
		for (const system of ['SI', 'US'] as const) {
			const ctx = formContext(system);
			const cases: [Parameters<typeof toCapture>[0], FormValues][] = [
				['trap', trapSI],
				['leak', leak],
				['insulation', pipe],
				['header', { headerId: HEADER_ID, pressure: '5' }]
			];
			for (const [kind, values] of cases) {
				for (const bad of ['', 'x', '-1e9', '1e9', '0', 'failed-open']) {
					const result = toCapture(kind, { ...nonsense(values, bad), photoIds: '[]' }, ctx);
					if ('problems' in result) messages.push(...Object.values(result.problems));
				}
			}
		}
		expect(messages.length).toBeGreaterThan(50);
		for (const message of messages) {
			expect(message).not.toMatch(/MPa/);
			expect(message).not.toMatch(/ K\b/);
			for (const id of ids) expect(message).not.toContain(id);
		}
	});
});
