/**
 * A JSON request body read with a byte limit enforced while reading: an oversized body is
 * refused (413) without being held in memory, a broken one answered 400 in plain words.
 */
import { error } from '@sveltejs/kit';

export async function readJsonBody(request: Request, maxBytes: number): Promise<unknown> {
	const tooBig = () =>
		error(413, `This request is larger than ${Math.round(maxBytes / 1024)} kB: send fewer changes`);
	const declared = Number(request.headers.get('content-length') ?? NaN);
	if (Number.isFinite(declared) && declared > maxBytes) tooBig();
	if (!request.body) error(400, 'The request has no body: send the changes as JSON');
	const reader = request.body.getReader();
	const chunks: Uint8Array[] = [];
	let total = 0;
	for (;;) {
		const { done, value } = await reader.read();
		if (done) break;
		total += value.byteLength;
		if (total > maxBytes) {
			await reader.cancel();
			tooBig();
		}
		chunks.push(value);
	}
	const text = new TextDecoder().decode(Buffer.concat(chunks));
	try {
		return JSON.parse(text);
	} catch {
		error(400, 'The request is not valid JSON: nothing was changed');
	}
}
