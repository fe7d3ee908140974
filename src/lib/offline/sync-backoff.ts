/**
 * How long to wait before the next try after a retryable problem: exponential from 1 s, capped
 * at 5 min, with full jitter (anywhere between 1 s and the step), so many phones coming back
 * into signal at a shift change do not all knock at the same instant. The floor of 1 s keeps a
 * dead connection from being tried in a tight loop.
 */
export const FIRST_RETRY_MS = 1_000;
export const LAST_RETRY_MS = 5 * 60_000;

/** Delay before try number `failures + 1` (failures ≥ 1), ms, for `random` in [0, 1). */
export function retryDelay(failures: number, random: number): number {
	const step = Math.min(LAST_RETRY_MS, FIRST_RETRY_MS * 2 ** Math.max(0, failures));
	return Math.round(FIRST_RETRY_MS + random * (step - FIRST_RETRY_MS));
}
