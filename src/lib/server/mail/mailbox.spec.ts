import { mkdtemp, readdir, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import MailComposer from 'nodemailer/lib/mail-composer';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { isMessageId, listMessages, readMessage, saveMessage } from './mailbox';

let dir: string;
beforeAll(async () => {
	dir = await mkdtemp(join(tmpdir(), 'steamwisp-mailbox-'));
});
afterAll(() => rm(dir, { recursive: true, force: true }));

const build = (subject: string, firm?: string): Promise<Buffer> =>
	new MailComposer({
		from: 'no-reply@steamwisp.invalid',
		to: 'x@example.test',
		subject,
		text: `body of ${subject}`,
		headers: firm ? { 'X-Steamwisp-Firm': firm } : {}
	})
		.compile()
		.build();

describe('the fake mailbox on disk', () => {
	it('keeps each message with its envelope and reads it back', async () => {
		const envelope = { mailFrom: 'no-reply@steamwisp.invalid', rcptTo: ['x@example.test'] };
		const a = await saveMessage(dir, await build('first', 'firm-a'), envelope, new Date(1_000));
		const b = await saveMessage(dir, await build('second', 'firm-b'), envelope, new Date(2_000));
		expect(a).toMatchObject({ subject: 'first', firmId: 'firm-a', rcptTo: ['x@example.test'] });

		expect((await listMessages(dir)).map((m) => m.id)).toEqual([b.id, a.id]);
		expect((await listMessages(dir, 'firm-a')).map((m) => m.subject)).toEqual(['first']);

		const read = await readMessage(dir, b.id);
		expect(read?.message.text).toBe('body of second\n');
		expect(read?.message.subject).toBe('second');
		expect(read?.meta.firmId).toBe('firm-b');
		expect((await readdir(dir)).filter((n) => n.endsWith('.tmp'))).toEqual([]);
	});

	it('refuses ids that could walk out of the mailbox', async () => {
		expect(isMessageId('../../etc/passwd')).toBe(false);
		expect(await readMessage(dir, '../mailbox/1000-abcdef01')).toBeNull();
		expect(await readMessage(dir, '9999999999999-00000000')).toBeNull();
	});

	it('reads an empty list from a mailbox that does not exist yet', async () => {
		expect(await listMessages(join(dir, 'nothing-here'))).toEqual([]);
	});
});
