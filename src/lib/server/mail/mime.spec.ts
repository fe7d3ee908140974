import MailComposer from 'nodemailer/lib/mail-composer';
import { describe, expect, it } from 'vitest';
import { decodeWords, headerValue, parseHeaders, parseMessage } from './mime';

/** Builds a message exactly as nodemailer would send it, as one char per byte. */
async function compose(mail: ConstructorParameters<typeof MailComposer>[0]): Promise<string> {
	const buffer: Buffer = await new MailComposer(mail).compile().build();
	return buffer.toString('latin1');
}

describe('reading what nodemailer writes', () => {
	it('gets subject, addresses and both bodies of a text + HTML message', async () => {
		const raw = await compose({
			from: 'Steamwisp <no-reply@steamwisp.invalid>',
			to: 'new.person@example.test',
			subject: 'Ines Okafor invited you — Cinderbrook',
			text: 'Hello,\n\nSteam at 10 bar g — 184 °C.\nhttp://127.0.0.1:4180/invitation/abc_DEF-123\n',
			html: '<p>Steam at 10&nbsp;bar&nbsp;g — 184&nbsp;°C</p>',
			headers: { 'X-Steamwisp-Firm': 'firm-1' }
		});
		const m = parseMessage(raw);
		expect(m.subject).toBe('Ines Okafor invited you — Cinderbrook');
		expect(m.to).toBe('new.person@example.test');
		expect(m.from).toBe('Steamwisp <no-reply@steamwisp.invalid>');
		expect(m.text).toBe(
			'Hello,\n\nSteam at 10 bar g — 184 °C.\nhttp://127.0.0.1:4180/invitation/abc_DEF-123\n'
		);
		expect(m.html).toBe('<p>Steam at 10&nbsp;bar&nbsp;g — 184&nbsp;°C</p>');
		expect(headerValue(parseHeaders(raw), 'X-Steamwisp-Firm')).toBe('firm-1');
	});

	it('keeps long lines whole through quoted-printable soft breaks', async () => {
		const long = `${'steam trap '.repeat(30)}— é`;
		const m = parseMessage(await compose({ to: 'a@example.test', text: long }));
		expect(m.text).toBe(long);
	});

	it('decodes base64 bodies', async () => {
		const text = 'Dryness fraction 0.97 · ΔT 12 K';
		const m = parseMessage(await compose({ to: 'a@example.test', text, textEncoding: 'base64' }));
		expect(m.text).toBe(text);
	});

	it('skips attachments', async () => {
		const m = parseMessage(
			await compose({
				to: 'a@example.test',
				text: 'body',
				attachments: [{ filename: 'note.txt', content: 'not the body' }]
			})
		);
		expect(m.text).toBe('body');
	});
});

describe('encoded words (RFC 2047)', () => {
	it.each([
		['=?UTF-8?Q?caf=C3=A9_au_lait?=', 'café au lait'],
		['=?UTF-8?B?wrBD?=', '°C'],
		['=?iso-8859-1?Q?caf=E9?=', 'café'],
		['=?UTF-8?Q?a?= =?UTF-8?Q?b?=', 'ab'],
		['plain words', 'plain words']
	])('%s → %s', (input, output) => expect(decodeWords(input)).toBe(output));
});
