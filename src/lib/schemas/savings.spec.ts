import { describe, expect, it } from 'vitest';
import { DEFAULT_SAVINGS_ITEMS, readSavingsQuery } from './savings';

const read = (qs: string) => readSavingsQuery(new URLSearchParams(qs));
const first = DEFAULT_SAVINGS_ITEMS;

describe('readSavingsQuery', () => {
	it('takes each rank, and annual saving when none is given', () => {
		expect(read('rank=payback')).toEqual({ ok: true, query: { rank: 'payback', limit: first } });
		expect(read('rank=co2')).toEqual({ ok: true, query: { rank: 'co2', limit: first } });
		expect(read('')).toEqual({ ok: true, query: { rank: 'savings', limit: first } });
	});

	it('takes a published revision’s number and how many items, within bounds', () => {
		expect(read('revision=2&limit=5000')).toEqual({
			ok: true,
			query: { rank: 'savings', revision: 2, limit: 5000 }
		});
		expect(read('limit=1')).toMatchObject({ ok: true, query: { limit: 1 } });
		for (const limit of ['0', '5001', '-3', '1e3', '']) {
			expect(read(`limit=${limit}`), limit).toEqual({
				ok: false,
				message: 'limit must be a whole number from 1 to 5,000'
			});
		}
		expect(read('revision=0')).toMatchObject({ ok: false });
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
			message: 'Unknown parameter sort: the savings list takes only rank, revision and limit'
		});
		expect(read('rank=co2&rank=co2')).toEqual({ ok: false, message: 'Give rank only once.' });
	});
});
