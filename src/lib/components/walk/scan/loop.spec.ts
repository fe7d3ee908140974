import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { startScanLoop } from './loop';

beforeEach(() => {
	vi.useFakeTimers();
});
afterEach(() => {
	vi.useRealTimers();
});

describe('startScanLoop', () => {
	it('looks again only after the last look has finished', async () => {
		let running = 0;
		let most = 0;
		let looks = 0;
		const detect = vi.fn(async () => {
			running += 1;
			most = Math.max(most, running);
			looks += 1;
			await new Promise((r) => setTimeout(r, 500));
			running -= 1;
			return [];
		});
		const stop = startScanLoop({ detect, oncodes: () => false, onfail: () => {} });
		await vi.advanceTimersByTimeAsync(3000);
		stop();
		expect(most).toBe(1);
		// 3 s of 500 ms looks with 200 ms pauses between: begun at 0, 0.7, 1.4, 2.1 and 2.8 s.
		expect(looks).toBe(5);
	});

	it('stops when the codes are accepted, and not before', async () => {
		const frames = [[], ['not-it'], ['ST-1']];
		const seen: string[][] = [];
		const detect = vi.fn(async () => frames.shift() ?? ['again']);
		startScanLoop({
			detect,
			oncodes: (codes) => {
				seen.push(codes);
				return codes[0] === 'ST-1';
			},
			onfail: () => {}
		});
		await vi.advanceTimersByTimeAsync(5000);
		expect(seen).toEqual([['not-it'], ['ST-1']]);
		expect(detect).toHaveBeenCalledTimes(3);
	});

	it('gives up after a run of failures, and forgives a failure followed by success', async () => {
		const onfail = vi.fn();
		let calls = 0;
		const detect = async () => {
			calls += 1;
			if (calls === 1) throw new Error('not ready');
			if (calls === 2) return [];
			throw new Error('broken');
		};
		startScanLoop({ detect, oncodes: () => false, onfail, maxFailures: 3 });
		await vi.advanceTimersByTimeAsync(10_000);
		expect(onfail).toHaveBeenCalledTimes(1);
		expect((onfail.mock.calls[0][0] as Error).message).toBe('broken');
		// One failure, one success, then three failures in a row.
		expect(calls).toBe(5);
	});

	it('reports nothing once stopped, even with a look under way', async () => {
		const oncodes = vi.fn(() => false);
		const stop = startScanLoop({
			detect: () => new Promise((r) => setTimeout(() => r(['ST-1']), 100)),
			oncodes,
			onfail: () => {}
		});
		await vi.advanceTimersByTimeAsync(50);
		stop();
		await vi.advanceTimersByTimeAsync(1000);
		expect(oncodes).not.toHaveBeenCalled();
	});
});
