import { fail, redirect } from '@sveltejs/kit';
import { eq } from 'drizzle-orm';
import { homeFor, safeNext, signInSchema } from '$lib/schemas/account';
import { lucia } from '$lib/server/auth/lucia';
import { verifyPassword } from '$lib/server/auth/password';
import { db } from '$lib/server/db';
import { users } from '$lib/server/db/schema';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = ({ locals, url }) => {
	if (locals.user)
		redirect(303, safeNext(url.searchParams.get('next')) ?? homeFor[locals.user.role]);
	return { next: safeNext(url.searchParams.get('next')) };
};

// Verifying against a real hash when the account does not exist keeps the answer's timing alike.
const decoyHash =
	'$argon2id$v=19$m=19456,t=2,p=1$SfeMs8BjhbrBZdm5ze/uBQ$YM8C/Ol3WvA3f0oP1z+GM1r80PaDEgZEMmImT9X1yeE';

export const actions: Actions = {
	default: async ({ request, cookies }) => {
		const form = Object.fromEntries(await request.formData());
		const parsed = signInSchema.safeParse(form);
		if (!parsed.success) {
			return fail(400, { email: String(form.email ?? ''), error: parsed.error.issues[0].message });
		}
		const { email, password, next } = parsed.data;
		const [user] = await db.select().from(users).where(eq(users.email, email)).limit(1);
		const ok = await verifyPassword(user?.passwordHash ?? decoyHash, password);
		if (!user || !ok || user.disabledAt) {
			return fail(400, {
				email,
				error: 'That e-mail address and password do not match an active account.'
			});
		}
		const session = await lucia.createSession(user.id, {
			userAgent: request.headers.get('user-agent')?.slice(0, 255) ?? null
		});
		const cookie = lucia.createSessionCookie(session.id);
		cookies.set(cookie.name, cookie.value, { path: '.', ...cookie.attributes });
		await db.update(users).set({ lastSignInAt: new Date() }).where(eq(users.id, user.id));
		redirect(303, safeNext(next) ?? homeFor[user.role as keyof typeof homeFor]);
	}
};
