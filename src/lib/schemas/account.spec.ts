import { describe, expect, it } from 'vitest';
import { safeNext, signInSchema } from './account';

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
		[null, null]
	])('%s → %s', (input, expected) => {
		expect(safeNext(input)).toBe(expected);
	});
});
