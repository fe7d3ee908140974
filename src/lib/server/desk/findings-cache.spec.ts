/**
 * The review table's view cache (findings-cache): one load for every caller waiting on a key,
 * the answer kept for the next, a failed load kept for nobody, and keys kept apart.
 */
import { describe, expect, it } from 'vitest';
import { viewCache } from './findings-cache';

describe('viewCache', () => {
	it('runs one load for concurrent callers of a key and keeps its answer', async () => {
		const get = viewCache<string[]>({ max: 10 });
		let loads = 0;
		let release!: () => void;
		const gate = new Promise<void>((r) => (release = r));
		const load = async () => {
			loads++;
			await gate;
			return ['a', 'b'];
		};
		const waiting = Promise.all([get('k', load), get('k', load), get('k', load)]);
		release();
		const answers = await waiting;
		expect(loads).toBe(1);
		expect(answers.every((a) => a === answers[0])).toBe(true);
		expect(await get('k', load)).toBe(answers[0]);
		expect(loads).toBe(1);
	});

	it('keeps different keys apart', async () => {
		const get = viewCache<{ n: number }>({ max: 10 });
		expect(await get('one', async () => ({ n: 1 }))).toEqual({ n: 1 });
		expect(await get('two', async () => ({ n: 2 }))).toEqual({ n: 2 });
		expect(await get('one', async () => ({ n: 99 }))).toEqual({ n: 1 });
	});

	it('keeps nothing from a failed load: the next caller loads again', async () => {
		const get = viewCache<{ n: number }>({ max: 10 });
		await expect(
			get('k', async () => {
				throw new Error('database went away');
			})
		).rejects.toThrow('database went away');
		expect(await get('k', async () => ({ n: 2 }))).toEqual({ n: 2 });
	});

	it('drops the least recently used lists past its size bound', async () => {
		const get = viewCache<string[]>({ maxSize: 5, size: (ids) => ids.length });
		let loads = 0;
		const load = (ids: string[]) => async () => {
			loads++;
			return ids;
		};
		await get('a', load(['1', '2', '3']));
		await get('b', load(['4', '5', '6'])); // 6 > 5: 'a' goes
		expect(loads).toBe(2);
		await get('b', load(['x']));
		expect(loads).toBe(2);
		await get('a', load(['1', '2', '3']));
		expect(loads).toBe(3);
	});
});
