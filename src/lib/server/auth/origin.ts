import { currentMailConfig } from '../mail/send';
import { linkOrigin } from '../mail/config';

/** Where e-mailed links point: the configured public URL, never a caller's Host header. */
export function mailLinkOrigin(url: URL): string {
	return linkOrigin(currentMailConfig(), url.origin);
}
