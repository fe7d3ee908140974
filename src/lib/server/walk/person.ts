/** Who is signed in, as the Walk's shell reads it from `GET /api/me`. */
import { eq } from 'drizzle-orm';
import { unitSystems, type UnitSystemId } from '../../schemas/roles';
import { walkPersonSchema, type WalkPerson } from '../../schemas/snapshot';
import { firms, users } from '../db/schema';
import type { Executor } from '../db/types';

const isUnitSystem = (v: string | null): v is UnitSystemId =>
	v !== null && (unitSystems as readonly string[]).includes(v);

/** The person's own unit system, else their firm's default, else SI. */
export async function unitSystemOf(tx: Executor, userId: string): Promise<UnitSystemId> {
	const [row] = await tx
		.select({ own: users.unitSystem, firm: firms.defaultUnitSystem })
		.from(users)
		.innerJoin(firms, eq(firms.id, users.firmId))
		.where(eq(users.id, userId))
		.limit(1);
	if (isUnitSystem(row?.own ?? null)) return row!.own as UnitSystemId;
	if (isUnitSystem(row?.firm ?? null)) return row!.firm as UnitSystemId;
	return 'SI';
}

export async function walkPerson(tx: Executor, user: SessionUser): Promise<WalkPerson> {
	return walkPersonSchema.parse({
		id: user.id,
		name: user.name,
		email: user.email,
		role: user.role,
		unitSystem: await unitSystemOf(tx, user.id)
	});
}
