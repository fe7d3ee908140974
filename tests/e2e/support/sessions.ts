/** Signing demo people in through the real sign-in form, as API clients with their own cookies. */
import { expect, request, type APIRequestContext } from '@playwright/test';
import { demoPassword } from '../../../src/lib/server/seed/demo';
import { appOrigin } from './servers';

/** Headers a browser sends with a plain (not enhanced) form post from our own page. */
export const formHeaders = (origin = appOrigin) => ({
	origin,
	accept: 'text/html'
});

export async function signedIn(
	email: string,
	password = demoPassword,
	origin = appOrigin
): Promise<APIRequestContext> {
	const context = await request.newContext({ baseURL: origin });
	const res = await context.post('/signin', {
		form: { email, password },
		headers: formHeaders(origin),
		maxRedirects: 0
	});
	expect(res.status(), `sign-in of ${email}`).toBe(303);
	return context;
}

export async function anonymous(origin = appOrigin): Promise<APIRequestContext> {
	return request.newContext({ baseURL: origin });
}
