/**
 * Sends one message through nodemailer: to STEAMWISP_SMTP_URL in production, to the local SMTP
 * fake with STEAMWISP_DEV_MAILBOX=1, nowhere with neither (see ./config.ts). The transport is
 * made once per process.
 */
import nodemailer, { type Transporter } from 'nodemailer';
import { env } from '$env/dynamic/private';
import { FIRM_HEADER } from './parse';
import { mailConfig, type MailConfig } from './config';
import type { RenderedMessage } from './templates/render';

type Sending = Exclude<MailConfig, { mode: 'off' }>;
let cached: { config: Sending; transport: Transporter } | null = null;

export function currentMailConfig(): MailConfig {
	return mailConfig(env);
}

/** Thrown by sendMail when this server has no way to send mail (no SMTP, no dev mailbox). */
export class MailOffError extends Error {
	constructor() {
		super('no mail is sent: set STEAMWISP_SMTP_URL (or STEAMWISP_DEV_MAILBOX=1 in development)');
	}
}

/** Whether this server sends mail at all. */
export function mailOn(): boolean {
	return currentMailConfig().mode !== 'off';
}

function transport(): { config: Sending; transport: Transporter } {
	if (cached) return cached;
	const config = currentMailConfig();
	if (config.mode === 'off') throw new MailOffError();
	const t =
		config.mode === 'smtp'
			? nodemailer.createTransport(config.url)
			: nodemailer.createTransport({
					host: '127.0.0.1',
					port: config.port,
					secure: false,
					// The fake offers no TLS (smtp-server's bundled certificate has expired).
					ignoreTLS: true,
					connectionTimeout: 5000
				});
	cached = { config, transport: t };
	return cached;
}

export interface Outgoing {
	to: string;
	message: RenderedMessage;
	/** The firm the message belongs to; tags it for the development mailbox. */
	firmId: string;
}

export async function sendMail({ to, message, firmId }: Outgoing): Promise<void> {
	const { config, transport: t } = transport();
	await t.sendMail({
		from: config.from,
		to,
		subject: message.subject,
		text: message.text,
		html: message.html,
		headers: config.mode === 'fake' ? { [FIRM_HEADER]: firmId } : {}
	});
}

/**
 * Sends without making the caller wait (or learn anything from how long it took): used where
 * the answer must not reveal whether an account exists. Failures are logged, not thrown.
 */
export function sendMailLater(outgoing: Outgoing): void {
	sendMail(outgoing).catch((e: unknown) => {
		console.error(
			`steamwisp: could not send "${outgoing.message.subject}": ${(e as Error).message}`
		);
	});
}
