import MailComposer from 'nodemailer/lib/mail-composer';
import { describe, expect, it } from 'vitest';
import { parseMessage } from './parse';

/** Builds a message exactly as nodemailer sends it. */
const compose = (mail: ConstructorParameters<typeof MailComposer>[0]): Promise<Buffer> =>
	new MailComposer(mail).compile().build();

/** A message as another mailer might write it, byte for byte (CRLF line ends). */
const raw = (lines: string[]) => Buffer.from(lines.join('\r\n'), 'latin1');

describe('reading the messages the local fake keeps', () => {
	it('gets subject, addresses, both bodies and the firm tag of what nodemailer writes', async () => {
		const m = await parseMessage(
			await compose({
				from: 'Steamwisp <no-reply@steamwisp.invalid>',
				to: 'new.person@example.test',
				subject: 'Ines Okafor invited you — Cinderbrook',
				text: 'Hello,\n\nSteam at 10 bar g — 184 °C.\nhttp://127.0.0.1:4180/invitation/abc_DEF-123\n',
				html: '<p>Steam at 10&nbsp;bar&nbsp;g — 184&nbsp;°C</p>',
				headers: { 'X-Steamwisp-Firm': 'firm-1' }
			})
		);
		expect(m).toEqual({
			subject: 'Ines Okafor invited you — Cinderbrook',
			from: '"Steamwisp" <no-reply@steamwisp.invalid>',
			to: 'new.person@example.test',
			text: 'Hello,\n\nSteam at 10 bar g — 184 °C.\nhttp://127.0.0.1:4180/invitation/abc_DEF-123\n',
			html: '<p>Steam at 10&nbsp;bar&nbsp;g — 184&nbsp;°C</p>',
			firmId: 'firm-1'
		});
	});

	it('decodes a UTF-8 subject split into encoded words in the middle of a character', async () => {
		// "Druckprüfung Überhitzer – 3 °C" in B and Q words; the ü (C3 BC) is cut across two words,
		// as some mailers do: only a decoder that joins the bytes before decoding reads it right.
		const m = await parseMessage(
			raw([
				'From: =?UTF-8?Q?B=C3=A4rbel_R=C3=B8d?= <baerbel@example.test>',
				'To: a@example.test',
				'Subject: =?UTF-8?Q?Druckpr=C3?= =?UTF-8?Q?=BCfung?=',
				' =?UTF-8?B?IMOcYmVyaGl0emVyIOKAkyAzIMKwQw==?=',
				'MIME-Version: 1.0',
				'Content-Type: text/plain; charset=utf-8',
				'Content-Transfer-Encoding: 7bit',
				'',
				'body',
				''
			])
		);
		expect(m.subject).toBe('Druckprüfung Überhitzer – 3 °C');
		expect(m.from).toBe('"Bärbel Rød" <baerbel@example.test>');
		expect(m.firmId).toBeNull();
	});

	it('decodes a quoted-printable body with soft line breaks and its charset', async () => {
		const m = await parseMessage(
			raw([
				'To: a@example.test',
				'Subject: qp',
				'MIME-Version: 1.0',
				'Content-Type: text/plain; charset=iso-8859-1',
				'Content-Transfer-Encoding: quoted-printable',
				'',
				'Kondensat bei 95 =B0C, Dampf bei 10 bar =FCberdruck; diese Zeile ist l=',
				'ang und wurde umbrochen.=3D',
				''
			])
		);
		expect(m.text).toBe(
			'Kondensat bei 95 °C, Dampf bei 10 bar überdruck; diese Zeile ist lang und wurde umbrochen.=\n'
		);
	});

	it('keeps long lines whole and decodes base64 bodies as nodemailer writes them', async () => {
		const long = `${'steam trap '.repeat(30)}— é`;
		const qp = await compose({ to: 'a@example.test', text: long });
		expect(qp.toString('latin1')).toContain('Content-Transfer-Encoding: quoted-printable');
		// A one-part message's body runs to the line break that ends the message.
		expect((await parseMessage(qp)).text).toBe(`${long}\n`);
		const text = 'Dryness fraction 0.97 · ΔT 12 K';
		const b64 = await compose({ to: 'a@example.test', text, textEncoding: 'base64' });
		expect(b64.toString('latin1')).toContain('Content-Transfer-Encoding: base64');
		expect((await parseMessage(b64)).text).toBe(text);
	});

	it('shows the body, not an attachment', async () => {
		const m = await parseMessage(
			await compose({
				to: 'a@example.test',
				text: 'body',
				attachments: [{ filename: 'note.txt', content: 'not the body' }]
			})
		);
		expect(m.text).toBe('body');
		expect(m.html).toBeNull();
	});
});
