/**
 * A finding's physics as stored: the flows its money is priced from apart from the rest, so a
 * site re-prices by reading a few numbers per finding rather than every finding's notes.
 */
import type { FindingPhysics, PhysicsFlows } from '../../steam/index';

/** The physics without its flows (and without the finding id, which is the row's). */
export type PhysicsDetail = Omit<FindingPhysics, keyof PhysicsFlows | 'findingId'>;

export function splitPhysics(physics: FindingPhysics): {
	flows: PhysicsFlows;
	physics: PhysicsDetail;
} {
	const {
		findingId: _id,
		kind,
		steamFlow,
		steamEnthalpy,
		returnable,
		condensateFlow,
		condensateEnthalpy,
		surfaceHeat,
		hours,
		...detail
	} = physics;
	const flows = {
		kind,
		steamFlow,
		steamEnthalpy,
		returnable,
		condensateFlow,
		condensateEnthalpy,
		surfaceHeat,
		hours
	};
	// Through JSON once, as the database will hand it back (no undefined, no class instances).
	return JSON.parse(JSON.stringify({ flows, physics: detail }));
}

export function joinPhysics(
	findingId: string,
	flows: PhysicsFlows,
	detail: PhysicsDetail
): FindingPhysics {
	return { ...detail, ...flows, findingId };
}
