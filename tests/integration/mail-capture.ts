/**
 * A private SMTP fake for one integration test file: smtp-server on a loopback port the OS
 * picks, keeping what it receives in a temporary mailbox exactly as scripts/mail-fake.ts does,
 * with the app's mail settings pointed at it (development mailbox on). Each test file runs in
 * its own module graph, so the app's mail transport is made against this fake.
 */
import { mkdtemp, rm } from 'node:fs/promises';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { SMTPServer } from 'smtp-server';
import { expect } from 'vitest';
import { env } from '$env/dynamic/private';
import { listMessages, readMessage, saveMessage } from '../../src/lib/server/mail/mailbox';

export interface MailCapture {
	dir: string;
	/** Every message to `to` so far, newest first. */
	to(to: string): ReturnType<typeof listMessages>;
	/** Waits for the first message to `to` whose subject matches; returns it read. */
	waitFor(
		to: string,
		subject: RegExp
	): Promise<NonNullable<Awaited<ReturnType<typeof readMessage>>>>;
	close(): Promise<void>;
}

export async function captureMail(): Promise<MailCapture> {
	const dir = await mkdtemp(join(tmpdir(), 'steamwisp-capture-'));
	const server = new SMTPServer({
		disabledCommands: ['STARTTLS'],
		authOptional: true,
		logger: false,
		onData(stream, session, callback) {
			const chunks: Buffer[] = [];
			stream.on('data', (c: Buffer) => chunks.push(c));
			stream.on('end', () => {
				const envelope = {
					mailFrom: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
					rcptTo: session.envelope.rcptTo.map((r) => r.address)
				};
				saveMessage(dir, Buffer.concat(chunks), envelope).then(
					() => callback(null),
					(e: Error) => callback(e)
				);
			});
		}
	});
	await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
	const { port } = server.server.address() as AddressInfo;
	delete env.STEAMWISP_SMTP_URL;
	env.STEAMWISP_DEV_MAILBOX = '1';
	env.STEAMWISP_MAIL_PORT = String(port);
	env.STEAMWISP_MAILBOX_DIR = dir;
	const to = async (address: string) =>
		(await listMessages(dir)).filter((m) => m.rcptTo.includes(address));
	return {
		dir,
		to,
		async waitFor(address, subject) {
			let id: string | undefined;
			await expect
				.poll(async () => (id = (await to(address)).find((m) => subject.test(m.subject))?.id), {
					timeout: 10_000,
					message: `a message to ${address} matching ${subject}`
				})
				.toBeDefined();
			return (await readMessage(dir, id!))!;
		},
		async close() {
			await new Promise<void>((resolve) => server.close(() => resolve()));
			await rm(dir, { recursive: true, force: true });
		}
	};
}

/** The first link in a message's text that contains `part`. */
export function linkIn(text: string | null, part: string): string {
	const link = (text ?? '').match(/https?:\/\/\S+/g)?.find((u) => u.includes(part));
	if (!link) throw new Error(`no ${part} link in: ${text}`);
	return link;
}
