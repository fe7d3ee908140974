/// <reference types="vite-plugin-pwa/client" />
/// <reference types="vite-plugin-pwa/svelte" />
/// <reference types="vite-plugin-pwa/info" />
import type { Role } from '$lib/schemas/roles';

declare global {
	namespace App {
		interface Error {
			message: string;
			/** Which fields of a request failed their checks (API answers to bad input). */
			issues?: { path: string; message: string }[];
		}
		interface Locals {
			user: SessionUser | null;
			session: { id: string; expiresAt: Date; fresh: boolean } | null;
		}
	}

	/** The signed-in person as the app sees them (never a password hash or token). */
	interface SessionUser {
		id: string;
		firmId: string;
		email: string;
		name: string;
		role: Role;
		clientCompanyId: string | null;
	}
}

export {};
