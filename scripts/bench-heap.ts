/**
 * A brief look at memory: heap held per state object, and whether a long run leaves the heap
 * larger than it found it (a cache or leak growing with use would show here).
 */
import { setFlagsFromString } from 'node:v8';
import { runInNewContext } from 'node:vm';
import { stateFromPT } from '../src/lib/steam/index';

const STATES = 100_000;

// Expose V8's collector without a command-line flag, so `npm run bench` stays a plain tsx run.
setFlagsFromString('--expose-gc');
const collect = runInNewContext('gc') as () => void;

/** Heap in use after a full collection, in bytes. */
export function heapUsed(): number {
	collect();
	collect();
	return process.memoryUsage().heapUsed;
}

/** Lines describing memory, to print after the timings; startHeap was taken before them. */
export function heapFigures(startHeap: number): string[] {
	const afterRun = heapUsed();
	const held: unknown[] = new Array(STATES);
	const before = heapUsed();
	for (let i = 0; i < STATES; i++) held[i] = stateFromPT(0.1 + (i % 200) * 0.1, 300 + (i % 50));
	const perState = (heapUsed() - before) / STATES;
	return [
		`heap used after the timed runs minus before them (JIT code and feedback included): ${((afterRun - startHeap) / 1024).toFixed(0)} KiB`,
		`heap held per returned state object: ${perState.toFixed(0)} bytes (${held.length} kept alive)`
	];
}
