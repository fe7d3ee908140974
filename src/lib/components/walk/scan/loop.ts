/**
 * Reading the camera's picture a few times a second. Each look starts only after the last has
 * finished (a slow phone never piles up work), and stops for good once stopped, even with a
 * look still under way.
 */

export interface ScanLoopOptions {
	/** Raw values seen in the current frame. */
	detect: () => Promise<string[]>;
	/** Called with the codes of a frame that had any; return true to stop scanning. */
	oncodes: (codes: string[]) => boolean;
	/** Called once if looking fails this many times running (the reader is broken). */
	onfail: (error: unknown) => void;
	/** Pause between looks, ms. */
	intervalMs?: number;
	/** Failed looks in a row before giving up. */
	maxFailures?: number;
}

/** Starts looking; returns the function that stops it. */
export function startScanLoop({
	detect,
	oncodes,
	onfail,
	intervalMs = 200,
	maxFailures = 15
}: ScanLoopOptions): () => void {
	let stopped = false;
	let timer: ReturnType<typeof setTimeout> | undefined;
	let failures = 0;

	async function look() {
		if (stopped) return;
		try {
			const codes = await detect();
			failures = 0;
			if (stopped) return;
			if (codes.length > 0 && oncodes(codes)) {
				stopped = true;
				return;
			}
		} catch (error) {
			// A single frame can fail (the picture not ready yet); only a run of failures counts.
			failures += 1;
			if (failures >= maxFailures && !stopped) {
				stopped = true;
				onfail(error);
				return;
			}
		}
		if (!stopped) timer = setTimeout(() => void look(), intervalMs);
	}

	timer = setTimeout(() => void look(), 0);
	return () => {
		stopped = true;
		clearTimeout(timer);
	};
}
