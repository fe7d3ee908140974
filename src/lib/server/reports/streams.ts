/**
 * Report bodies as web streams: a pull-driven ReadableStream over an async source of chunks,
 * so a slow or cancelled download stops the reading of rows (nothing runs ahead of the
 * reader), and a Node stream (pdfkit, exceljs) turned into one.
 */
import { PassThrough, Readable, type Writable } from 'node:stream';

const encoder = new TextEncoder();

/** A body that asks `source` for its next chunk only when the reader wants one. */
export function pullStream(source: AsyncIterator<string | Uint8Array>): ReadableStream<Uint8Array> {
	return new ReadableStream<Uint8Array>(
		{
			async pull(controller) {
				try {
					const next = await source.next();
					if (next.done) controller.close();
					else
						controller.enqueue(
							typeof next.value === 'string' ? encoder.encode(next.value) : next.value
						);
				} catch (e) {
					controller.error(e);
				}
			},
			async cancel() {
				await source.return?.();
			}
		},
		{ highWaterMark: 1 }
	);
}

/**
 * A body written by `write` into a Node stream (a PassThrough with back-pressure), read as a
 * web stream. A failure while writing ends the body with that error.
 */
export function nodeBody(write: (out: PassThrough) => Promise<void>): ReadableStream<Uint8Array> {
	const out = new PassThrough({ highWaterMark: 4 * 1024 * 1024 });
	write(out).catch((e: unknown) => out.destroy(e instanceof Error ? e : new Error(String(e))));
	return Readable.toWeb(out) as unknown as ReadableStream<Uint8Array>;
}

/**
 * Waits while the download is behind (its buffer full), so a writer that cannot wait by
 * itself — pdfkit, exceljs — runs no further ahead of the reader than one page or a few rows;
 * throws when the download was cancelled, which ends the writing.
 */
export async function pace(out: Writable): Promise<void> {
	while (!out.destroyed && out.writableNeedDrain) {
		await new Promise<void>((resolve) => {
			const done = () => {
				out.off('drain', done);
				out.off('close', done);
				resolve();
			};
			out.once('drain', done);
			out.once('close', done);
		});
	}
	if (out.destroyed) throw new Error('The download was cancelled.');
}
