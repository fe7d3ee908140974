/**
 * Running one mutation's transaction again when MariaDB gave it up for a reason a second try
 * cures: a deadlock or lock wait between two pushes on the same rows, or a duplicate key when
 * a concurrent push inserted the same mutation or finding first (the retry then sees it).
 */
const RETRYABLE = new Set([
	1213, // ER_LOCK_DEADLOCK
	1205, // ER_LOCK_WAIT_TIMEOUT
	1062 // ER_DUP_ENTRY
]);

function errnoOf(e: unknown): number | undefined {
	for (let at: unknown = e, depth = 0; at && depth < 4; depth++) {
		const errno = (at as { errno?: unknown }).errno;
		if (typeof errno === 'number') return errno;
		at = (at as { cause?: unknown }).cause;
	}
	return undefined;
}

export async function withRetry<T>(run: () => Promise<T>, attempts = 4): Promise<T> {
	for (let i = 1; ; i++) {
		try {
			return await run();
		} catch (e) {
			const errno = errnoOf(e);
			if (i >= attempts || errno === undefined || !RETRYABLE.has(errno)) throw e;
			await new Promise((r) => setTimeout(r, 5 * i + Math.random() * 10));
		}
	}
}
