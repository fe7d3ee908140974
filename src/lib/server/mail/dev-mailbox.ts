/**
 * The development mailbox as Desk shows it: only with STEAMWISP_DEV_MAILBOX=1 and no real mail
 * server (./config.ts), only the messages the app tagged with the reader's firm, and never one
 * to a person of another firm (an address may have joined another firm since it was invited,
 * or a message about an existing account went to its owner): invitation and reset links are as
 * good as passwords, and who works where is each firm's own business.
 */
import { and, inArray, ne } from 'drizzle-orm';
import { db } from '../db';
import { users } from '../db/schema';
import { currentMailConfig } from './send';
import { listMessages, readMessage, type StoredMessage } from './mailbox';

export function mailboxAvailable(): boolean {
	return currentMailConfig().mode === 'fake';
}

function dir(): string | null {
	const config = currentMailConfig();
	return config.mode === 'fake' ? config.mailboxDir : null;
}

const SHOWN = 200;

export async function firmMailbox(firmId: string): Promise<StoredMessage[]> {
	const d = dir();
	if (!d) return [];
	const shown: StoredMessage[] = [];
	const tagged = await listMessages(d, firmId);
	// In slices, so one firm's long history costs a few small queries, not one huge one.
	for (let i = 0; i < tagged.length && shown.length < SHOWN; i += SHOWN) {
		const slice = tagged.slice(i, i + SHOWN);
		const outsiders = await othersPeople(
			firmId,
			slice.flatMap((m) => m.rcptTo)
		);
		shown.push(...slice.filter((m) => !m.rcptTo.some((r) => outsiders.has(r.toLowerCase()))));
	}
	return shown.slice(0, SHOWN);
}

/** One message of the firm's, or null (another firm's or its people's, unknown, or no mailbox). */
export async function firmMessage(firmId: string, id: string) {
	const d = dir();
	if (!d) return null;
	const found = await readMessage(d, id);
	if (!found || found.meta.firmId !== firmId) return null;
	const outsiders = await othersPeople(firmId, found.meta.rcptTo);
	return found.meta.rcptTo.some((r) => outsiders.has(r.toLowerCase())) ? null : found;
}

/** Which of these addresses belong to people of other firms (lower case). */
async function othersPeople(firmId: string, addresses: string[]): Promise<Set<string>> {
	const wanted = [...new Set(addresses.map((a) => a.toLowerCase()))];
	if (wanted.length === 0) return new Set();
	const rows = await db
		.select({ email: users.email })
		.from(users)
		.where(and(inArray(users.email, wanted), ne(users.firmId, firmId)));
	return new Set(rows.map((r) => r.email.toLowerCase()));
}
