/**
 * A photo body read as a stream with the size limit enforced while reading (never more than
 * the limit held in memory): 413 beyond it, 400 when the upload broke off before its end.
 */
import { error } from '@sveltejs/kit';

export async function readPhotoBody(request: Request, maxBytes: number): Promise<Uint8Array> {
	const tooBig = () =>
		error(413, `A photo may be at most ${Math.round(maxBytes / 2 ** 20)} MiB: this one is larger`);
	const declared = Number(request.headers.get('content-length') ?? NaN);
	if (Number.isFinite(declared) && declared > maxBytes) tooBig();
	if (!request.body) error(400, 'The request carries no photo');
	const reader = request.body.getReader();
	const chunks: Uint8Array[] = [];
	let total = 0;
	try {
		for (;;) {
			const { done, value } = await reader.read();
			if (done) break;
			total += value.byteLength;
			if (total > maxBytes) {
				await reader.cancel().catch(() => undefined);
				tooBig();
			}
			chunks.push(value);
		}
	} catch (e) {
		if ((e as { status?: number }).status === 413) throw e;
		error(400, 'The photo did not arrive whole; nothing was stored: send it again');
	}
	if (total === 0) error(400, 'The request carries no photo');
	return Buffer.concat(chunks, total); // a Buffer is a Uint8Array: no second copy of 8 MiB
}
