/**
 * The local SMTP fake's mailbox on disk: one `<id>.eml` (the message as received) and one
 * `<id>.json` (envelope and headers) per message, so the fake, any number of app processes and
 * the tests read it without sharing memory. The JSON is written last, by rename, so a reader
 * never sees half a message. Node-only, no framework: scripts/mail-fake.ts imports it too.
 */
import { randomBytes } from 'node:crypto';
import { mkdir, readFile, readdir, rename, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { parseMessage, type ParsedMessage } from './parse';

export { FIRM_HEADER } from './parse';

export interface StoredMessage {
	id: string;
	receivedAt: string;
	/** Envelope sender and recipients (what the SMTP session said). */
	mailFrom: string;
	rcptTo: string[];
	subject: string;
	firmId: string | null;
	bytes: number;
}

const ID_PATTERN = /^\d{13}-[0-9a-f]{8}$/;

export function isMessageId(id: string): boolean {
	return ID_PATTERN.test(id);
}

export async function saveMessage(
	dir: string,
	raw: Buffer,
	envelope: { mailFrom: string; rcptTo: string[] },
	now = new Date()
): Promise<StoredMessage> {
	await mkdir(dir, { recursive: true });
	const id = `${String(now.getTime()).padStart(13, '0')}-${randomBytes(4).toString('hex')}`;
	const parsed = await parseMessage(raw);
	const meta: StoredMessage = {
		id,
		receivedAt: now.toISOString(),
		mailFrom: envelope.mailFrom,
		rcptTo: envelope.rcptTo,
		subject: parsed.subject,
		firmId: parsed.firmId,
		bytes: raw.length
	};
	await writeFile(join(dir, `${id}.eml`), raw);
	const temp = join(dir, `.${id}.json.tmp`);
	await writeFile(temp, JSON.stringify(meta));
	await rename(temp, join(dir, `${id}.json`));
	return meta;
}

/** Messages, newest first; only one firm's when `firmId` is given. */
export async function listMessages(dir: string, firmId?: string): Promise<StoredMessage[]> {
	let names: string[];
	try {
		names = await readdir(dir);
	} catch (e) {
		if ((e as NodeJS.ErrnoException).code === 'ENOENT') return [];
		throw e;
	}
	const ids = names
		.filter((n) => n.endsWith('.json') && isMessageId(n.slice(0, -5)))
		.map((n) => n.slice(0, -5))
		.sort()
		.reverse();
	const all = await Promise.all(ids.map((id) => readMeta(dir, id)));
	return all.filter((m): m is StoredMessage => m !== null && (!firmId || m.firmId === firmId));
}

/** One message with its bodies, or null (unknown id, or not a well-formed id at all). */
export async function readMessage(
	dir: string,
	id: string
): Promise<{ meta: StoredMessage; message: ParsedMessage } | null> {
	if (!isMessageId(id)) return null;
	const meta = await readMeta(dir, id);
	if (!meta) return null;
	const raw = await readFile(join(dir, `${id}.eml`));
	return { meta, message: await parseMessage(raw) };
}

async function readMeta(dir: string, id: string): Promise<StoredMessage | null> {
	try {
		return JSON.parse(await readFile(join(dir, `${id}.json`), 'utf8')) as StoredMessage;
	} catch {
		return null;
	}
}
