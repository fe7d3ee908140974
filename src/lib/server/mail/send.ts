/**
 * Sends one message through nodemailer: to STEAMWISP_SMTP_URL in production, to the local SMTP
 * fake otherwise (see ./config.ts). The transport is made once per process.
 */
import nodemailer, { type Transporter } from 'nodemailer';
import { env } from '$env/dynamic/private';
import { FIRM_HEADER } from './mailbox';
import { mailConfig, type MailConfig } from './config';
import type { RenderedMessage } from './templates/render';

let cached: { config: MailConfig; transport: Transporter } | null = null;

export function currentMailConfig(): MailConfig {
	return mailConfig(env);
}

function transport(): { config: MailConfig; transport: Transporter } {
	if (cached) return cached;
	const config = currentMailConfig();
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
