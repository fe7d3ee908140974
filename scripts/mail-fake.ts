/**
 * The local SMTP fake for development and tests: accepts every message on 127.0.0.1 (never
 * another interface), delivers nothing anywhere, and keeps each one in the mailbox directory
 * (.eml + .json, see src/lib/server/mail/mailbox.ts) where Desk's mailbox page and the tests
 * read it. STEAMWISP_MAIL_PORT (default 2525), STEAMWISP_MAILBOX_DIR (default .data/mailbox).
 * `--fresh` empties the mailbox first (the browser tests start from nothing).
 */
import { rm } from 'node:fs/promises';
import { SMTPServer } from 'smtp-server';
import { mailboxDir, mailPort } from '../src/lib/server/mail/config.ts';
import { saveMessage } from '../src/lib/server/mail/mailbox.ts';

const dir = mailboxDir(process.env);
const port = mailPort(process.env);
const maxBytes = 10 * 1024 * 1024;

if (process.argv.includes('--fresh')) await rm(dir, { recursive: true, force: true });

const server = new SMTPServer({
	// smtp-server's bundled certificate has expired; a loopback fake needs no TLS anyway.
	disabledCommands: ['STARTTLS'],
	authOptional: true,
	size: maxBytes,
	banner: 'Steamwisp local mail fake (nothing leaves this machine)',
	logger: false,
	onData(stream, session, callback) {
		const chunks: Buffer[] = [];
		stream.on('data', (chunk: Buffer) => chunks.push(chunk));
		stream.on('end', () => {
			if (stream.sizeExceeded) {
				callback(Object.assign(new Error('Message too large'), { responseCode: 552 }));
				return;
			}
			const envelope = {
				mailFrom: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
				rcptTo: session.envelope.rcptTo.map((r) => r.address)
			};
			saveMessage(dir, Buffer.concat(chunks), envelope).then(
				(meta) => {
					console.log(`mail-fake: kept "${meta.subject}" for ${envelope.rcptTo.join(', ')}`);
					callback(null, `Kept as ${meta.id}`);
				},
				(e: Error) => callback(e)
			);
		});
	}
});

server.on('error', (e: NodeJS.ErrnoException) => {
	console.error(
		e.code === 'EADDRINUSE'
			? `mail-fake: port ${port} is busy (another mail fake running?); set STEAMWISP_MAIL_PORT`
			: `mail-fake: ${e.message}`
	);
	process.exit(1);
});

server.listen(port, '127.0.0.1', () => {
	console.log(`mail-fake: listening on 127.0.0.1:${port}, keeping mail in ${dir}`);
});

for (const signal of ['SIGINT', 'SIGTERM'] as const) {
	process.on(signal, () => server.close(() => process.exit(0)));
}
