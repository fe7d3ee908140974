/**
 * Reads the messages the local SMTP fake keeps, with mailparser (the parser of the authors of
 * nodemailer and smtp-server): encoded words in any charset, folded headers, multipart bodies,
 * quoted-printable and base64. Node-only, no framework: scripts/mail-fake.ts imports it too.
 */
import { simpleParser, type AddressObject } from 'mailparser';

/** Set by the app on every message it hands to the fake, so Desk shows a firm only its own mail. */
export const FIRM_HEADER = 'X-Steamwisp-Firm';

export interface ParsedMessage {
	subject: string;
	from: string;
	to: string;
	text: string | null;
	html: string | null;
	/** The firm the app tagged the message with (FIRM_HEADER), or null. */
	firmId: string | null;
}

export async function parseMessage(raw: Buffer): Promise<ParsedMessage> {
	// Attachments are not shown anywhere; skipping them keeps a large one from being buffered.
	const mail = await simpleParser(raw, { skipImageLinks: true, skipTextLinks: true });
	const firm = mail.headers.get(FIRM_HEADER.toLowerCase());
	return {
		subject: mail.subject ?? '',
		from: addresses(mail.from),
		to: addresses(mail.to),
		text: mail.text ?? null,
		html: typeof mail.html === 'string' ? mail.html : null,
		firmId: typeof firm === 'string' && firm ? firm : null
	};
}

function addresses(value: AddressObject | AddressObject[] | undefined): string {
	if (!value) return '';
	return (Array.isArray(value) ? value : [value]).map((a) => a.text).join(', ');
}
