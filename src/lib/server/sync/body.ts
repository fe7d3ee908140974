/** A push body, size-limited while read, as JSON: 413 beyond the limit, 400 when unreadable. */
import { error } from '@sveltejs/kit';
import { readLimitedBody } from '../body';

export async function readJsonBody(request: Request, maxBytes: number): Promise<unknown> {
	const bytes = await readLimitedBody(request, maxBytes, {
		tooLarge: `This request is larger than ${Math.round(maxBytes / 1024)} kB: send fewer changes`,
		empty: 'The request has no body: send the changes as JSON',
		cut: 'The request did not arrive whole; nothing was changed: send it again'
	});
	try {
		return JSON.parse(bytes.toString('utf8'));
	} catch {
		error(400, 'The request is not valid JSON: nothing was changed');
	}
}
