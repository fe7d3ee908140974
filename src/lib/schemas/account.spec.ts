import { describe, expect, it } from 'vitest';
import {
	acceptInvitationSchema,
	changePasswordSchema,
	newPasswordSchema,
	safeNext,
	setPasswordSchema,
	signInSchema
} from './account';

describe('sign-in form', () => {
	it('normalises the e-mail address', () => {
		const r = signInSchema.parse({ email: '  Admin@Example.COM ', password: 'x' });
		expect(r.email).toBe('admin@example.com');
	});

	it('says what is wrong in words', () => {
		const r = signInSchema.safeParse({ email: 'not-an-address', password: '' });
		expect(r.success).toBe(false);
		const messages = r.error!.issues.map((i) => i.message);
		expect(messages).toContain('Enter a valid e-mail address.');
		expect(messages).toContain('Enter your password.');
	});
});

describe('return path after sign-in', () => {
	it.each([
		['/desk', '/desk'],
		['/walk?survey=1', '/walk?survey=1'],
		['//evil.example/', null],
		['https://evil.example/', null],
		['/\\evil.example', null],
		['/\t/evil.example', null],
		['/\n/evil.example', null],
		['/ /evil.example', null],
		[null, null]
	])('%s → %s', (input, expected) => {
		expect(safeNext(input)).toBe(expected);
	});
});

describe('new passwords', () => {
	it('need at least 12 characters and say so', () => {
		const r = setPasswordSchema.safeParse({ password: 'eleven char', confirm: 'eleven char' });
		expect(r.error!.issues[0].message).toBe(
			'Use at least 12 characters; a few words in a row work well.'
		);
		expect(
			setPasswordSchema.safeParse({ password: 'twelve chars', confirm: 'twelve chars' }).success
		).toBe(true);
	});

	it('refuse only spaces and overlong ones', () => {
		expect(newPasswordSchema.safeParse(' '.repeat(20)).success).toBe(false);
		expect(newPasswordSchema.safeParse('x'.repeat(257)).success).toBe(false);
		expect(newPasswordSchema.safeParse('x'.repeat(256)).success).toBe(true);
	});

	it('must be typed the same twice', () => {
		const r = setPasswordSchema.safeParse({
			password: 'a long password',
			confirm: 'a long passw0rd'
		});
		expect(r.error!.issues[0]).toMatchObject({
			path: ['confirm'],
			message: 'The two passwords differ. Type the same one twice.'
		});
	});

	it('must differ from the current one when changing', () => {
		const same = 'the same long password';
		const r = changePasswordSchema.safeParse({ current: same, password: same, confirm: same });
		expect(r.error!.issues[0].path).toEqual(['password']);
	});

	it('come with a trimmed name on invitation', () => {
		const r = acceptInvitationSchema.parse({
			name: '  Noor Castellanos ',
			password: 'a long password',
			confirm: 'a long password'
		});
		expect(r.name).toBe('Noor Castellanos');
		const twoLines = {
			name: 'Noor\nBcc: x@example.test',
			password: 'a long password',
			confirm: 'a long password'
		};
		expect(acceptInvitationSchema.safeParse(twoLines).error!.issues[0].message).toBe(
			'Your name holds a hidden character (U+000A) that breaks the line or turns the text around; type it on one line, as it reads'
		);
		expect(
			acceptInvitationSchema.safeParse({
				name: ' ',
				password: 'a long password',
				confirm: 'a long password'
			}).success
		).toBe(false);
	});
});
