/** The seeded demo people as the app sees a signed-in person (SessionUser), by role and firm. */
import { demoUsers } from '../../src/lib/server/seed/demo';

export function demoPerson(email: string): SessionUser {
	const u = demoUsers.find((d) => d.email === email);
	if (!u) throw new Error(`No demo person ${email}`);
	return { ...u, clientCompanyId: u.clientCompanyId ?? null };
}

export const adminA = demoPerson('admin@cinderbrook.example');
export const consultantA = demoPerson('consultant@cinderbrook.example');
export const auditorA = demoPerson('auditor@cinderbrook.example');
export const clientA = demoPerson('plant.manager@larkspindle-dairy.example');
export const adminB = demoPerson('admin@northgale.example');
export const consultantB = demoPerson('consultant@northgale.example');
export const auditorB = demoPerson('auditor@northgale.example');
export const clientB = demoPerson('mill.manager@tarnwhistle-paper.example');
