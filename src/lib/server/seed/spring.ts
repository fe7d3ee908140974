/**
 * The spring survey's trap tests: one per trap of the register, in the order the auditor
 * walked the plant (boiler house and evaporators on the first day, dryer and CIP on the
 * second, reception and packing on the third). Published with the survey; failed traps carry
 * a repair cost (invented: a fitted replacement trap by size).
 */
import type { DemoFinding } from './demo-finding';
import { findingId } from './demo-finding';
import { creameryAreas, type CreameryArea } from './areas';
import { springResults, testMethodFor, trapRegister } from './traps';

export const publishedSurveyId = '5e7a0006-0000-4000-8000-000000000003';

const dayOf: Record<CreameryArea, string> = {
	boilerHouse: '2026-04-13',
	evaporatorHall: '2026-04-13',
	dryerTower: '2026-04-14',
	cipRoom: '2026-04-14',
	milkReception: '2026-04-15',
	packing: '2026-04-15'
};

/** The first seed's three spring trap tests keep their ids and repair costs. */
const fixed: Record<string, { id: string; repairCost: number }> = {
	'ST-E1-04': { id: findingId(1), repairCost: 48_000 },
	'ST-BH-11': { id: findingId(2), repairCost: 52_000 },
	'ST-CIP-02': { id: findingId(3), repairCost: 36_000 }
};

const minutesIntoDay = new Map<string, number>();

export const springTrapFindings: DemoFinding[] = trapRegister.map((trap, index) => {
	const condition = springResults[trap.tag] ?? 'working';
	const day = dayOf[trap.area];
	const minutes = minutesIntoDay.get(day) ?? 0;
	minutesIntoDay.set(day, minutes + 11);
	const at = new Date(Date.parse(`${day}T07:30:00Z`) + minutes * 60_000).toISOString();
	const failed =
		condition === 'failed-open' || condition === 'leaking' || condition === 'failed-closed';
	const testMethod = testMethodFor(condition);
	return {
		id: fixed[trap.tag]?.id ?? findingId(1000 + index),
		surveyId: publishedSurveyId,
		kind: 'trap',
		headerId: trap.headerId,
		areaId: creameryAreas[trap.area].id,
		assetTag: trap.tag,
		location: trap.location,
		notes: condition === 'not-accessible' ? 'Could not be reached safely without a lift.' : '',
		photoIds: [],
		createdAt: at,
		updatedAt: at,
		inputs: { ...trap.details, condition, ...(testMethod ? { testMethod } : {}) },
		status: 'published',
		...(failed
			? { repairCost: fixed[trap.tag]?.repairCost ?? 30_000 + trap.details.dn * 600 }
			: {}),
		reviewed: true,
		version: 1,
		deleted: false
	};
});
