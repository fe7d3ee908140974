/**
 * Who is using the Walk on this device, and their device database. The shell has no
 * server-rendered data, so the person comes from `GET /api/me` when the server answers, and
 * from the person last signed in on this device when it does not (a plant room without
 * signal). A server that says "signed out" wins over the memory: on a shared phone the next
 * auditor never opens the last one's records.
 */
import { serverFetch } from '$lib/offline/connection.svelte';
import { openDeviceDb, type DeviceDatabase } from '$lib/offline/db';
import { createSyncManager, type SyncManager } from '$lib/offline/sync-manager.svelte';
import { forgetPerson, rememberPerson, rememberedPerson } from '$lib/offline/person';
import { walkPersonSchema, type WalkPerson } from '$lib/schemas/snapshot';

export type WalkSession =
	| { phase: 'opening' }
	| { phase: 'ready'; person: WalkPerson; db: DeviceDatabase; confirmed: boolean }
	| { phase: 'signed-out' }
	| { phase: 'never-signed-in' }
	| { phase: 'no-storage'; problem: string };

export const walk = $state<{ session: WalkSession; sync: SyncManager | null }>({
	session: { phase: 'opening' },
	sync: null
});

let opening: Promise<WalkSession> | null = null;

/** Opens the session once per page load; later callers share the same answer. */
export function openWalk(): Promise<WalkSession> {
	opening ??= open().then((session) => {
		walk.session = session;
		// One sync manager per page load, for the person whose database is open.
		if (session.phase === 'ready') {
			walk.sync = createSyncManager({
				db: session.db,
				fetch: serverFetch as typeof fetch,
				window
			});
		}
		return session;
	});
	return opening;
}

async function askServer(): Promise<WalkPerson | 'signed-out' | 'unreachable'> {
	try {
		const response = await serverFetch('/api/me', { cache: 'no-store' });
		if (response.status === 401) return 'signed-out';
		if (!response.ok) return 'unreachable';
		return walkPersonSchema.parse(await response.json());
	} catch {
		return 'unreachable';
	}
}

async function open(): Promise<WalkSession> {
	const answer = await askServer();
	if (answer === 'signed-out') {
		forgetPerson();
		return { phase: 'signed-out' };
	}
	const person = answer === 'unreachable' ? rememberedPerson() : answer;
	if (person === null) return { phase: 'never-signed-in' };
	if (answer !== 'unreachable') rememberPerson(person);
	try {
		const db = openDeviceDb(person.id);
		await db.open();
		return { phase: 'ready', person, db, confirmed: answer !== 'unreachable' };
	} catch (e) {
		return {
			phase: 'no-storage',
			problem: `This browser would not open its storage (${(e as Error).message}). Recording needs it: leave private browsing or allow site data.`
		};
	}
}
