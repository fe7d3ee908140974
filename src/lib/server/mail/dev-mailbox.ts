/**
 * The development mailbox as Desk shows it: only while mail goes to the local fake (never with
 * STEAMWISP_SMTP_URL set), and only the messages the app tagged with the reader's firm, since
 * invitation and reset links are as good as passwords.
 */
import { currentMailConfig } from './send';
import { listMessages, readMessage } from './mailbox';

export function mailboxAvailable(): boolean {
	return currentMailConfig().mode === 'fake';
}

function dir(): string | null {
	const config = currentMailConfig();
	return config.mode === 'fake' ? config.mailboxDir : null;
}

export async function firmMailbox(firmId: string) {
	const d = dir();
	return d ? (await listMessages(d, firmId)).slice(0, 200) : [];
}

/** One message of the firm's, or null (another firm's, unknown, or no mailbox here). */
export async function firmMessage(firmId: string, id: string) {
	const d = dir();
	if (!d) return null;
	const found = await readMessage(d, id);
	return found && found.meta.firmId === firmId ? found : null;
}
