import { z } from 'zod';
import { nameSchema } from './names';
import type { Role } from './roles';

/** An e-mail address as we store it: trimmed, lower case, at most 254 characters (RFC 5321). */
export const emailSchema = z
	.string({ error: 'Enter your e-mail address.' })
	.trim()
	.toLowerCase()
	.min(1, 'Enter your e-mail address.')
	.max(254, 'That e-mail address is too long.')
	.pipe(z.email({ error: 'Enter a valid e-mail address.' }));

export const signInSchema = z.object({
	email: emailSchema,
	password: z
		.string({ error: 'Enter your password.' })
		.min(1, 'Enter your password.')
		.max(512, 'That password is too long.'),
	next: z.string().max(512).optional()
});
export type SignIn = z.infer<typeof signInSchema>;

/**
 * A new password: long rather than clever (length is what resists guessing; no composition
 * rules, as NIST SP 800-63B advises), with a ceiling that keeps hashing cheap for the server.
 */
export const PASSWORD_MIN = 12;
export const PASSWORD_MAX = 256;
export const newPasswordSchema = z
	.string({ error: 'Choose a password.' })
	.min(PASSWORD_MIN, `Use at least ${PASSWORD_MIN} characters; a few words in a row work well.`)
	.max(PASSWORD_MAX, `Use at most ${PASSWORD_MAX} characters.`)
	.refine((p) => p.trim().length > 0, 'A password cannot be only spaces.');

const confirmed = <T extends { password: string; confirm: string }>(v: T) =>
	v.password === v.confirm;
const confirmError = {
	error: 'The two passwords differ. Type the same one twice.',
	path: ['confirm']
};

export const setPasswordSchema = z
	.object({ password: newPasswordSchema, confirm: z.string().max(PASSWORD_MAX) })
	.refine(confirmed, confirmError);

export const acceptInvitationSchema = z
	.object({
		name: nameSchema(160, 'Enter your name.', 'Your name'),
		password: newPasswordSchema,
		confirm: z.string().max(PASSWORD_MAX)
	})
	.refine(confirmed, confirmError);

export const changePasswordSchema = z
	.object({
		current: z
			.string({ error: 'Enter your current password.' })
			.min(1, 'Enter your current password.')
			.max(512, 'That password is too long.'),
		password: newPasswordSchema,
		confirm: z.string().max(PASSWORD_MAX)
	})
	.refine(confirmed, confirmError)
	.refine((v) => v.current !== v.password, {
		error: 'Choose a password different from the current one.',
		path: ['password']
	});

export const forgotPasswordSchema = z.object({ email: emailSchema });

/** Where each role starts after signing in. */
/** The three surfaces' home pages. */
export type SurfaceHome = '/walk' | '/desk' | '/ladder';

export const homeFor: Record<Role, SurfaceHome> = {
	admin: '/desk',
	consultant: '/desk',
	auditor: '/walk',
	client: '/ladder'
};

/**
 * A same-site path to return to after sign-in, or null (never an open redirect). Browsers drop
 * tabs and line breaks from URLs, so "/\t/evil.example" would become "//evil.example": any
 * control character or white space disqualifies a path.
 */
export function safeNext(next: string | null | undefined): string | null {
	if (!next || !next.startsWith('/') || next.startsWith('//') || next.includes('\\')) return null;
	if (hasControl(next) || /\s/.test(next)) return null;
	return next;
}

/** Whether text holds a control character (C0, DEL or C1): line breaks, tabs, NUL… */
function hasControl(text: string): boolean {
	for (let i = 0; i < text.length; i++) {
		const c = text.charCodeAt(i);
		if (c < 0x20 || (c >= 0x7f && c <= 0x9f)) return true;
	}
	return false;
}
