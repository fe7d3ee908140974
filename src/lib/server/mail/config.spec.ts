import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { defaultFrom, linkOrigin, mailConfig } from './config';

describe('mail configuration', () => {
	it('sends nothing, and keeps no mailbox, when neither SMTP nor the dev mailbox is set', () => {
		expect(mailConfig({ STEAMWISP_DATA_DIR: '/tmp/sw' })).toEqual({
			mode: 'off',
			from: defaultFrom,
			publicUrl: null
		});
		expect(mailConfig({ STEAMWISP_DEV_MAILBOX: '0' }).mode).toBe('off');
		expect(mailConfig({ STEAMWISP_DEV_MAILBOX: '' }).mode).toBe('off');
	});

	it('uses the local fake only with STEAMWISP_DEV_MAILBOX=1', () => {
		const c = mailConfig({ STEAMWISP_DATA_DIR: '/tmp/sw', STEAMWISP_DEV_MAILBOX: '1' });
		expect(c).toEqual({
			mode: 'fake',
			port: 2525,
			mailboxDir: '/tmp/sw/mailbox',
			from: defaultFrom,
			publicUrl: null
		});
	});

	it('takes the fake port and mailbox from the environment', () => {
		const c = mailConfig({
			STEAMWISP_DEV_MAILBOX: 'true',
			STEAMWISP_MAIL_PORT: '2600',
			STEAMWISP_MAILBOX_DIR: 'x/box'
		});
		expect(c).toMatchObject({ mode: 'fake', port: 2600, mailboxDir: resolve('x/box') });
	});

	it('refuses a port that is not a port', () => {
		expect(() => mailConfig({ STEAMWISP_DEV_MAILBOX: '1', STEAMWISP_MAIL_PORT: '70000' })).toThrow(
			/TCP port/
		);
	});

	it('sends through the configured server in production, dev mailbox or not', () => {
		const c = mailConfig({
			STEAMWISP_SMTP_URL: 'smtps://u:p@mail.example.com:465',
			STEAMWISP_DEV_MAILBOX: '1',
			ORIGIN: 'https://audits.example.com/'
		});
		expect(c).toEqual({
			mode: 'smtp',
			url: 'smtps://u:p@mail.example.com:465',
			from: defaultFrom,
			publicUrl: 'https://audits.example.com'
		});
	});

	it('never builds production links from the request host', () => {
		const c = mailConfig({ STEAMWISP_SMTP_URL: 'smtp://mail.example.com' });
		expect(() => linkOrigin(c, 'https://attacker.example')).toThrow(/STEAMWISP_PUBLIC_URL/);
		const configured = mailConfig({
			STEAMWISP_SMTP_URL: 'smtp://mail.example.com',
			STEAMWISP_PUBLIC_URL: 'https://audits.example.com'
		});
		expect(linkOrigin(configured, 'https://attacker.example')).toBe('https://audits.example.com');
	});

	it('uses the request origin only without a real mail server and nothing configured', () => {
		const fake = mailConfig({ STEAMWISP_DEV_MAILBOX: '1' });
		expect(linkOrigin(fake, 'http://127.0.0.1:4180')).toBe('http://127.0.0.1:4180');
		expect(linkOrigin(mailConfig({}), 'http://127.0.0.1:4180')).toBe('http://127.0.0.1:4180');
	});
});
