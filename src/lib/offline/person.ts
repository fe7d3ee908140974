import { walkPersonSchema, type WalkPerson } from '$lib/schemas/snapshot';

/**
 * Who last signed in on this device, so the Walk can open their own database with no signal
 * (it cannot ask `GET /api/me` then). Only the public facts of `GET /api/me`: no session,
 * no secret. Cleared on sign-out.
 */

const KEY = 'steamwisp.walk.person';

function store(): Storage | null {
	try {
		return typeof localStorage === 'undefined' ? null : localStorage;
	} catch {
		// A browser with storage turned off throws on the mere access.
		return null;
	}
}

export function rememberPerson(person: WalkPerson): void {
	store()?.setItem(KEY, JSON.stringify(walkPersonSchema.parse(person)));
}

/** The person remembered here, or null when none is (or what is stored is not readable). */
export function rememberedPerson(): WalkPerson | null {
	const raw = store()?.getItem(KEY);
	if (raw === null || raw === undefined) return null;
	try {
		const parsed = walkPersonSchema.safeParse(JSON.parse(raw));
		return parsed.success ? parsed.data : null;
	} catch {
		return null;
	}
}

export function forgetPerson(): void {
	store()?.removeItem(KEY);
}
