/**
 * A request body read as a stream with a byte limit enforced while reading (never more than
 * the limit held in memory, also when no Content-Length was sent). The app runs with a large
 * BODY_SIZE_LIMIT for photos, so each kind of request sets its own limit here.
 */
import { error } from '@sveltejs/kit';

export interface BodyWords {
	/** Said with 413 when the body is over the limit. */
	tooLarge: string;
	/** Said with 400 when there is no body; absent, an empty body is fine. */
	empty?: string;
	/** Said with 400 when the body broke off before its end. */
	cut: string;
	/**
	 * Read a refused body to its end (up to 32 MiB) before answering, so a browser sees the 413
	 * rather than a reset connection: for pages' forms. The API's clients are our own device,
	 * so there an oversized body is cut off at once.
	 */
	drain?: boolean;
}

/** Beyond this a refused body is not read to its end: the connection is simply dropped. */
const DRAIN_AT_MOST = 32 * 1024 * 1024;

/**
 * Reads and drops the rest of a refused body, so the sender finishes sending and reads the
 * answer (a server that answers mid-upload and closes makes clients see a reset instead).
 */
async function drain(reader: ReadableStreamDefaultReader<Uint8Array>, already: number) {
	let seen = already;
	try {
		while (seen <= DRAIN_AT_MOST) {
			const { done, value } = await reader.read();
			if (done) return;
			seen += value.byteLength;
		}
		await reader.cancel();
	} catch {
		// The sender went away: nothing left to drain.
	}
}

export async function readLimitedBody(
	request: Request,
	maxBytes: number,
	words: BodyWords
): Promise<Buffer> {
	const declared = Number(request.headers.get('content-length') ?? NaN);
	if (Number.isFinite(declared) && declared > maxBytes) {
		if (words.drain && request.body && declared <= DRAIN_AT_MOST) {
			await drain(request.body.getReader(), 0);
		}
		error(413, words.tooLarge);
	}
	if (!request.body) {
		if (words.empty) error(400, words.empty);
		return Buffer.alloc(0);
	}
	const reader = request.body.getReader();
	const chunks: Uint8Array[] = [];
	let total = 0;
	try {
		for (;;) {
			const { done, value } = await reader.read();
			if (done) break;
			total += value.byteLength;
			if (total > maxBytes) {
				if (words.drain) await drain(reader, total);
				else await reader.cancel().catch(() => undefined);
				error(413, words.tooLarge);
			}
			chunks.push(value);
		}
	} catch (e) {
		if ((e as { status?: number }).status === 413) throw e;
		error(400, words.cut);
	}
	if (total === 0 && words.empty) error(400, words.empty);
	return Buffer.concat(chunks, total);
}
