import { currentMailConfig } from '../mail/send';
import { linkOrigin } from '../mail/config';

/** Where e-mailed links point: the configured public URL, never a caller's Host header. */
export function mailLinkOrigin(url: URL): string {
	return linkOrigin(currentMailConfig(), url.origin);
}

/**
 * Whether a request that changes something was sent by one of this app's own pages. SvelteKit
 * refuses cross-site posts of form content types only, so an endpoint that acts on a POST
 * without a body (sign-out) checks for itself: an Origin header must be this app's origin
 * (`null`, sent from sandboxed frames and some redirects, never is); without one (older
 * browsers), Sec-Fetch-Site must say same-origin when sent. A request with neither did not come
 * from a web page at all, which is what a cross-site forgery needs.
 */
export function fromOwnPages(request: Request, url: URL): boolean {
	const origin = request.headers.get('origin');
	if (origin !== null) return origin === url.origin;
	const site = request.headers.get('sec-fetch-site');
	return site === null || site === 'same-origin';
}
