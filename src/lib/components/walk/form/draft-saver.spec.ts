import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { draftSaver } from './draft-saver';

describe('draftSaver', () => {
	beforeEach(() => vi.useFakeTimers());
	afterEach(() => vi.useRealTimers());

	it('writes the newest values once, after the typing pauses', async () => {
		const written: string[] = [];
		const saver = draftSaver(async (v) => void written.push(v.tag), 300);
		saver.schedule({ tag: 'S' });
		saver.schedule({ tag: 'ST' });
		saver.schedule({ tag: 'ST-1' });
		await vi.advanceTimersByTimeAsync(299);
		expect(written).toEqual([]);
		await vi.advanceTimersByTimeAsync(1);
		expect(written).toEqual(['ST-1']);
	});

	it('flush writes at once (page hidden or closing)', async () => {
		const written: string[] = [];
		const saver = draftSaver(async (v) => void written.push(v.tag), 300);
		saver.schedule({ tag: 'ST-9' });
		await saver.flush();
		expect(written).toEqual(['ST-9']);
		await vi.advanceTimersByTimeAsync(1000);
		expect(written).toEqual(['ST-9']);
	});

	it('keeps values typed while a write is in flight and writes them after it', async () => {
		const written: string[] = [];
		let release: () => void = () => {};
		const saver = draftSaver(async (v) => {
			if (written.length === 0) await new Promise<void>((r) => (release = r));
			written.push(v.tag);
		}, 10);
		saver.schedule({ tag: 'one' });
		await vi.advanceTimersByTimeAsync(10);
		saver.schedule({ tag: 'two' });
		const done = saver.flush();
		release();
		await done;
		expect(written).toEqual(['one', 'two']);
	});

	it('cancel drops what waits; a failed write is reported and the next one still goes', async () => {
		const errors: unknown[] = [];
		let fail = true;
		const written: string[] = [];
		const saver = draftSaver(
			async (v) => {
				if (fail) throw new Error('quota');
				written.push(v.tag);
			},
			10,
			(e) => errors.push(e)
		);
		saver.schedule({ tag: 'dropped' });
		saver.cancel();
		await vi.advanceTimersByTimeAsync(50);
		saver.schedule({ tag: 'fails' });
		await saver.flush();
		fail = false;
		saver.schedule({ tag: 'kept' });
		await saver.flush();
		expect(written).toEqual(['kept']);
		expect(errors).toHaveLength(1);
	});
});
