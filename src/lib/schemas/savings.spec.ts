import { describe, expect, it } from 'vitest';
import { readSavingsQuery } from './savings';

const read = (qs: string) => readSavingsQuery(new URLSearchParams(qs));

describe('readSavingsQuery', () => {
	it('takes each rank, and annual saving when none is given', () => {
		expect(read('rank=payback')).toEqual({ ok: true, query: { rank: 'payback' } });
		expect(read('rank=co2')).toEqual({ ok: true, query: { rank: 'co2' } });
		expect(read('')).toEqual({ ok: true, query: { rank: 'savings' } });
	});

	it('refuses an unknown rank, an unknown parameter and a repeated one, in words', () => {
		expect(read('rank=Savings')).toEqual({
			ok: false,
			message: 'rank must be one of: savings, payback, co2'
		});
		expect(read('rank=')).toEqual({
			ok: false,
			message: 'rank must be one of: savings, payback, co2'
		});
		expect(read('sort=cost')).toEqual({
			ok: false,
			message: 'Unknown parameter sort: the savings list takes only rank'
		});
		expect(read('rank=co2&rank=co2')).toEqual({ ok: false, message: 'Give rank only once.' });
	});
});
