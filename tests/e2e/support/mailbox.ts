/** Reading what the tests' SMTP fake kept (files in the e2e mailbox directory). */
import { expect } from '@playwright/test';
import { listMessages, readMessage } from '../../../src/lib/server/mail/mailbox';
import { e2eMail } from './servers';

const dir = e2eMail.STEAMWISP_MAILBOX_DIR;

/** Waits for a message to `to` whose subject matches, received after `since`; returns its text. */
export async function waitForMail(to: string, subject: RegExp, since = new Date(0)) {
	let found: Awaited<ReturnType<typeof readMessage>> = null;
	await expect
		.poll(
			async () => {
				const all = await listMessages(dir);
				const meta = all.find(
					(m) => m.rcptTo.includes(to) && subject.test(m.subject) && new Date(m.receivedAt) >= since
				);
				found = meta ? await readMessage(dir, meta.id) : null;
				return found !== null;
			},
			{ message: `a message to ${to} matching ${subject}`, timeout: 10_000 }
		)
		.toBe(true);
	return found!;
}

/** Every message to `to` so far. */
export async function mailTo(to: string) {
	return (await listMessages(dir)).filter((m) => m.rcptTo.includes(to));
}

/** The first link in a message's text that starts with `prefix`. */
export function linkIn(text: string | null, prefix: string): string {
	const match = (text ?? '').match(/https?:\/\/\S+/g)?.find((u) => u.includes(prefix));
	if (!match) throw new Error(`no ${prefix} link in: ${text}`);
	return match;
}
