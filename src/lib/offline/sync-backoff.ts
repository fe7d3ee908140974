/**
 * How long to wait before the next try after a retryable problem: exponential from 1 s, capped
 * at 5 min, with "equal jitter" (half the step fixed, half random), so many phones coming back
 * into signal at a shift change do not all knock at the same instant.
 */
export const FIRST_RETRY_MS = 1_000;
export const LAST_RETRY_MS = 5 * 60_000;

/** Delay before try number `failures + 1` (failures ≥ 1), for `random` in [0, 1). */
export function retryDelay(failures: number, random: number): number {
	const step = Math.min(LAST_RETRY_MS, FIRST_RETRY_MS * 2 ** Math.max(0, failures - 1));
	return Math.round(step / 2 + (random * step) / 2);
}
