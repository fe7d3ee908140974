/** A photo body, size-limited while read: 413 beyond the limit, 400 when cut off. */
import { readLimitedBody } from '../body';

export function readPhotoBody(request: Request, maxBytes: number): Promise<Uint8Array> {
	return readLimitedBody(request, maxBytes, {
		tooLarge: `A photo may be at most ${Math.round(maxBytes / 2 ** 20)} MiB: this one is larger`,
		empty: 'The request carries no photo',
		cut: 'The photo did not arrive whole; nothing was stored: send it again'
	});
}
