/**
 * Saves a form's raw values shortly after each change (debounced), and at once when asked —
 * on `visibilitychange` to hidden and on `pagehide`, the last moments a phone gives a page
 * before it is frozen or closed. A save in flight is never lost: the newest values are kept
 * and written after it.
 */
import type { FormValues } from './types';

export interface DraftSaver {
	/** Values changed: save them after the delay. */
	schedule(values: FormValues): void;
	/** Save now what is waiting (resolves once written). */
	flush(): Promise<void>;
	/** Drop what is waiting (after a successful save or a discard). */
	cancel(): void;
}

export function draftSaver(
	write: (values: FormValues) => Promise<unknown>,
	delayMs = 300,
	onError: (error: unknown) => void = () => {}
): DraftSaver {
	let waiting: FormValues | null = null;
	let timer: ReturnType<typeof setTimeout> | null = null;
	let writing: Promise<void> = Promise.resolve();

	function clear() {
		if (timer !== null) clearTimeout(timer);
		timer = null;
	}

	function flush(): Promise<void> {
		clear();
		const values = waiting;
		waiting = null;
		if (values === null) return writing;
		writing = writing
			.then(() => write(values))
			.then(
				() => undefined,
				(error: unknown) => onError(error)
			);
		return writing;
	}

	return {
		schedule(values) {
			waiting = { ...values };
			clear();
			timer = setTimeout(() => void flush(), delayMs);
		},
		flush,
		cancel() {
			clear();
			waiting = null;
		}
	};
}
