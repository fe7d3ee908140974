import { z } from 'zod';
import type { Role } from './roles';

export const signInSchema = z.object({
	email: z
		.string({ error: 'Enter your e-mail address.' })
		.trim()
		.toLowerCase()
		.max(254, 'That e-mail address is too long.')
		.pipe(z.email({ error: 'Enter a valid e-mail address.' })),
	password: z
		.string({ error: 'Enter your password.' })
		.min(1, 'Enter your password.')
		.max(512, 'That password is too long.'),
	next: z.string().max(512).optional()
});
export type SignIn = z.infer<typeof signInSchema>;

/** Where each role starts after signing in. */
export const homeFor: Record<Role, string> = {
	admin: '/desk',
	consultant: '/desk',
	auditor: '/walk',
	client: '/ladder'
};

/** A same-site path to return to after sign-in, or null (never an open redirect). */
export function safeNext(next: string | null | undefined): string | null {
	if (!next || !next.startsWith('/') || next.startsWith('//') || next.includes('\\')) return null;
	return next;
}
