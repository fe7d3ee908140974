import { describe, expect, it } from 'vitest';
import {
	fieldPath,
	flatFields,
	FormFieldError,
	MAX_FIELD_DEPTH,
	MAX_FIELD_INDEX,
	nestFields
} from './form-fields';

type Entry = [string, FormDataEntryValue];
const file = () => new File(['not text'], 'payload.bin');

/** The message a refusal gives, or a failed expectation when there is none. */
function refusal(run: () => unknown): string {
	try {
		run();
	} catch (e) {
		expect(e).toBeInstanceOf(FormFieldError);
		return (e as Error).message;
	}
	throw new Error('expected a refusal');
}

describe('fieldPath', () => {
	it('reads dots as groups and digits or brackets as rows', () => {
		expect(fieldPath('email')).toEqual(['email']);
		expect(fieldPath('fuel.price')).toEqual(['fuel', 'price']);
		expect(fieldPath('headers[1].pressure')).toEqual(['headers', 1, 'pressure']);
		expect(fieldPath('headers.1.pressure')).toEqual(['headers', 1, 'pressure']);
		expect(fieldPath('grid[2][3]')).toEqual(['grid', 2, 3]);
	});

	it('keeps a first segment of digits a name (the form itself is a group)', () => {
		expect(fieldPath('0.a')).toEqual(['0', 'a']);
	});

	it('refuses names it cannot read', () => {
		for (const name of ['', 'a..b', 'a.', '.a', 'a[x]', 'a[]', 'a[1', 'a]', '[0]', 'a.[0]']) {
			expect(
				refusal(() => fieldPath(name)),
				name
			).toContain('cannot be read');
		}
	});

	it('refuses prototype segments anywhere in the name', () => {
		for (const name of [
			'__proto__.x',
			'a.__proto__',
			'a.constructor.prototype',
			'rows[0].constructor'
		]) {
			expect(
				refusal(() => fieldPath(name)),
				name
			).toContain('does not accept');
		}
	});

	it('refuses row numbers past the limit or written with leading zeros', () => {
		expect(fieldPath(`a[${MAX_FIELD_INDEX}]`)).toEqual(['a', MAX_FIELD_INDEX]);
		expect(refusal(() => fieldPath(`a[${MAX_FIELD_INDEX + 1}]`))).toContain('row number');
		expect(refusal(() => fieldPath('a.99999999999999999999'))).toContain('row number');
		expect(refusal(() => fieldPath('a[01]'))).toContain('row number');
	});

	it('refuses paths deeper than the limit', () => {
		const deepest = Array.from({ length: MAX_FIELD_DEPTH }, (_, i) => `g${i}`).join('.');
		expect(fieldPath(deepest)).toHaveLength(MAX_FIELD_DEPTH);
		expect(refusal(() => fieldPath(`${deepest}.more`))).toContain('nested too deeply');
	});
});

describe('flatFields', () => {
	it('keeps every name as it is, dots included', () => {
		expect(
			flatFields([
				['email', 'a@b.example'],
				['fuel.price', '']
			])
		).toEqual({
			email: 'a@b.example',
			'fuel.price': ''
		});
	});

	it('refuses a repeated name, a file and a prototype name', () => {
		const twice: Entry[] = [
			['email', 'a'],
			['email', 'b']
		];
		expect(refusal(() => flatFields(twice))).toBe('The field "email" was sent twice.');
		expect(refusal(() => flatFields([['email', file()]]))).toBe('The field "email" must be text.');
		expect(refusal(() => flatFields([['__proto__', 'x']]))).toContain('does not accept');
	});

	it('takes names an empty object happens to inherit as ordinary fields', () => {
		expect(flatFields([['toString', 'x']])).toEqual({ toString: 'x' });
	});
});

describe('nestFields', () => {
	it('builds groups and rows, rows in any order, empty strings kept', () => {
		const entries: Entry[] = [
			['fuel.kind', 'natural-gas'],
			['fuel.price', ''],
			['trapFactors.failedOpen', '0.5'],
			['headers[1].pressure', '1.1'],
			['headers[0].name', 'Main'],
			['headers.0.pressure', '1.0'],
			['headers[1].name', 'Plant']
		];
		expect(nestFields(entries)).toEqual({
			fuel: { kind: 'natural-gas', price: '' },
			trapFactors: { failedOpen: '0.5' },
			headers: [
				{ name: 'Main', pressure: '1.0' },
				{ pressure: '1.1', name: 'Plant' }
			]
		});
	});

	it('collects a declared list in order and makes an unticked one empty', () => {
		const entries: Entry[] = [
			['findingIds', 'b'],
			['note', 'x'],
			['findingIds', 'a'],
			['findingIds', 'b']
		];
		expect(nestFields(entries, { lists: ['findingIds', 'bulk.auditorIds'] })).toEqual({
			findingIds: ['b', 'a', 'b'],
			note: 'x',
			bulk: { auditorIds: [] }
		});
		expect(nestFields([], { lists: ['findingIds'] })).toEqual({ findingIds: [] });
	});

	it('refuses a repeated name that is not a list', () => {
		const twice: Entry[] = [
			['fuel.price', '1'],
			['fuel.price', '2']
		];
		expect(refusal(() => nestFields(twice))).toBe('The field "fuel.price" was sent twice.');
		// Two spellings of one field are one field sent twice.
		const spellings: Entry[] = [
			['rows[0]', '1'],
			['rows.0', '2']
		];
		expect(refusal(() => nestFields(spellings))).toBe('The field "rows.0" was sent twice.');
	});

	it('refuses a file, in a plain field and in a list', () => {
		expect(refusal(() => nestFields([['fuel.price', file()]]))).toContain('must be text');
		const inList = () =>
			nestFields(
				[
					['ids', 'a'],
					['ids', file()]
				],
				{ lists: ['ids'] }
			);
		expect(refusal(inList)).toBe('The field "ids" must be text.');
	});

	it('refuses a name used both as a value and as a group or rows', () => {
		const cases: Entry[][] = [
			[
				['fuel', 'x'],
				['fuel.price', '1']
			],
			[
				['fuel.price', '1'],
				['fuel', 'x']
			],
			[
				['headers[0].name', 'a'],
				['headers.name', 'b']
			],
			[
				['headers.name', 'b'],
				['headers[0].name', 'a']
			]
		];
		for (const entries of cases) {
			expect(
				refusal(() => nestFields(entries)),
				entries[1][0]
			).toContain('both as one value');
		}
		const listClash = () => nestFields([['ids[0]', 'a']], { lists: ['ids'] });
		expect(refusal(listClash)).toContain('"ids"');
	});

	it('refuses rows that skip a number, however far the gap', () => {
		expect(refusal(() => nestFields([['rows[1].a', 'x']]))).toBe(
			'The rows of "rows" skip a number.'
		);
		const deep: Entry[] = [
			['g.rows[0]', 'x'],
			['g.rows[10000]', 'y']
		];
		expect(refusal(() => nestFields(deep))).toBe('The rows of "g.rows" skip a number.');
	});

	it('refuses prototype names before anything is built', () => {
		expect(refusal(() => nestFields([['__proto__.polluted', 'yes']]))).toContain('does not accept');
		expect(refusal(() => nestFields([['a.constructor.prototype.x', '1']]))).toContain(
			'does not accept'
		);
		expect(({} as Record<string, unknown>).polluted).toBeUndefined();
		expect(refusal(() => nestFields([], { lists: ['__proto__'] }))).toContain('does not accept');
	});
});
