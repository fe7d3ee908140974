/**
 * One finding's repair cost and where it came from (docs/costs.md): the library's figure, a
 * consultant's edited figure (with a reason, if they give one), a quote (with its reference),
 * or none. The publication lock is read first; the payback moves with the cost in the same
 * statement; the firm's change counter moves and one audit row is written.
 */
import { and, eq, isNull, sql } from 'drizzle-orm';
import { matchFinding, priceMatch, NO_MATCH_REASONS } from '../../costs/match';
import { toMinorUnits } from '../../steam/losses/money';
import { recordChange } from '../audit';
import { findings } from '../db/schema';
import type { Db } from '../db/types';
import { findingsFrozen } from '../publish/lock';
import { touchFirm } from '../sync/counter';
import { PAYBACK_SQL, entriesByKey, surveyCurrency, writeLibraryCosts } from './apply';

export type CostChoice =
	| { source: 'edited' | 'quote'; amount: string; note: string | null }
	| { source: 'library' }
	| { source: 'none' };

export type CostOutcome =
	| { kind: 'saved'; costMinor: number | null }
	| { kind: 'frozen' }
	| { kind: 'missing' }
	/** The library has no figure for it: why, in words. */
	| { kind: 'unmatched'; message: string };

export async function setFindingCost(
	db: Db,
	target: { firmId: string; actorId: string; surveyId: string; findingId: string },
	choice: CostChoice
): Promise<CostOutcome> {
	return db.transaction(async (tx) => {
		if (await findingsFrozen(tx, target.surveyId)) return { kind: 'frozen' as const };
		const currency = await surveyCurrency(tx, target.firmId, target.surveyId);
		if (!currency) return { kind: 'missing' as const };
		const [row] = await tx
			.select({
				id: findings.id,
				kind: findings.kind,
				inputs: findings.inputs,
				repairCost: findings.repairCost,
				source: findings.repairCostSource,
				note: findings.repairCostNote
			})
			.from(findings)
			.where(
				and(
					eq(findings.id, target.findingId),
					eq(findings.surveyId, target.surveyId),
					isNull(findings.deletedAt)
				)
			)
			.for('update');
		if (!row) return { kind: 'missing' as const };
		let costMinor: number | null = null;
		if (choice.source === 'library') {
			const priced = priceMatch(matchFinding(row), await entriesByKey(tx, target.firmId), currency);
			if (!priced.ok) {
				return {
					kind: 'unmatched' as const,
					message: `This finding ${NO_MATCH_REASONS[priced.reason]}: nothing was changed.`
				};
			}
			costMinor = priced.costMinor;
			await writeLibraryCosts(tx, [
				{ id: row.id, costMinor, entryId: priced.entry.id, entryVersion: priced.entry.version }
			]);
		} else {
			costMinor = choice.source === 'none' ? null : toMinorUnits(Number(choice.amount), currency);
			const note = choice.source === 'none' ? null : choice.note;
			await tx.execute(
				sql`UPDATE findings f SET f.repair_cost_minor = ${costMinor},
					f.repair_cost_source = ${choice.source === 'none' ? null : choice.source},
					f.repair_cost_note = ${note}, f.cost_entry_id = NULL, f.cost_entry_version = NULL,
					f.payback_years = ${sql.raw(PAYBACK_SQL(costMinor === null ? 'NULL' : String(costMinor)))}
					WHERE f.id = ${row.id}`
			);
		}
		await touchFirm(tx, target.firmId);
		await recordChange(tx, {
			firmId: target.firmId,
			actorId: target.actorId,
			entity: 'finding',
			entityId: row.id,
			action: 'repair-cost',
			before: { repairCost: row.repairCost, source: row.source, note: row.note },
			after: { repairCost: costMinor, source: choice.source === 'none' ? null : choice.source }
		});
		return { kind: 'saved' as const, costMinor };
	});
}
