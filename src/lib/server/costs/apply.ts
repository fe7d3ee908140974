/**
 * Pricing a survey's repairs from the firm's cost library (docs/costs.md). One transaction:
 * the survey's publication lock read first (a published survey is refused, nothing written),
 * its findings read in one statement and matched in memory ($lib/costs/match), the new costs
 * written in batches through a temporary table and one UPDATE … JOIN (never a round trip per
 * finding), the payback recomputed in the same statement, the firm's change counter moved and
 * one audit row. Costs a consultant edited or took from a quote are kept unless `overwrite`.
 */
import { and, eq, isNull, sql } from 'drizzle-orm';
import { format } from 'mysql2';
import { matchFinding, priceMatch, type NoMatchReason, type PricedEntry } from '../../costs/match';
import { recordChange } from '../audit';
import { costEntries, findings, sites, surveys } from '../db/schema';
import type { Db, Executor, Tx } from '../db/types';
import { findingsFrozen } from '../publish/lock';
import { touchFirm } from '../sync/counter';

/** Rows per INSERT into the batch table. */
export const COST_BATCH = 2000;

/** Simple payback from the stored annual saving, as the engine's simplePayback gives it. */
export const PAYBACK_SQL = (repair: string) =>
	`CASE WHEN f.kind = 'header' OR ${repair} IS NULL OR f.cost_minor IS NULL THEN NULL ` +
	`WHEN f.cost_minor = 0 THEN CASE WHEN ${repair} = 0 THEN 0 ELSE NULL END ` +
	`ELSE ${repair} / f.cost_minor END`;

export interface ApplySummary {
	/** Findings given a library cost now. */
	priced: number;
	/** Kept as they were: a consultant's edited figure, or a quote. */
	keptEdited: number;
	keptQuote: number;
	/** No library cost, by reason ($lib/costs/match NO_MATCH_REASONS). */
	unmatched: Partial<Record<NoMatchReason, number>>;
}

export type ApplyOutcome =
	{ kind: 'applied'; summary: ApplySummary } | { kind: 'frozen' } | { kind: 'missing' };

/** The site currency of a firm's survey, or null (another firm's, or gone). */
export async function surveyCurrency(db: Executor, firmId: string, surveyId: string) {
	const [row] = await db
		.select({ currency: sites.currency })
		.from(surveys)
		.innerJoin(sites, eq(sites.id, surveys.siteId))
		.where(and(eq(surveys.id, surveyId), eq(surveys.firmId, firmId)))
		.limit(1);
	return row?.currency ?? null;
}

/** The firm's live entries by key, as pricing reads them. */
export async function entriesByKey(
	db: Executor,
	firmId: string
): Promise<Map<string, PricedEntry>> {
	const rows = await db
		.select({
			key: costEntries.entryKey,
			id: costEntries.id,
			version: costEntries.version,
			currency: costEntries.currency,
			unitCost: costEntries.unitCost,
			labourHours: costEntries.labourHours
		})
		.from(costEntries)
		.where(and(eq(costEntries.firmId, firmId), isNull(costEntries.deletedAt)));
	return new Map(rows.map(({ key, ...entry }) => [key, entry]));
}

export interface LibraryCost {
	id: string;
	costMinor: number;
	entryId: string;
	entryVersion: number;
}

/** Writes library costs (and the payback they give) to findings, in batches. */
export async function writeLibraryCosts(tx: Tx, rows: LibraryCost[]): Promise<void> {
	if (rows.length === 0) return;
	await tx.execute(
		sql.raw(
			'CREATE TEMPORARY TABLE IF NOT EXISTS cost_batch (id varchar(36) PRIMARY KEY, ' +
				'cost bigint NOT NULL, entry_id varchar(36) NOT NULL, entry_version int NOT NULL)'
		)
	);
	await tx.execute(sql.raw('DELETE FROM cost_batch'));
	for (let at = 0; at < rows.length; at += COST_BATCH) {
		const values = rows
			.slice(at, at + COST_BATCH)
			.map((r) => format('(?, ?, ?, ?)', [r.id, r.costMinor, r.entryId, r.entryVersion]))
			.join(', ');
		await tx.execute(
			sql.raw(`INSERT INTO cost_batch (id, cost, entry_id, entry_version) VALUES ${values}`)
		);
	}
	await tx.execute(
		sql.raw(
			'UPDATE findings f JOIN cost_batch t ON t.id = f.id SET ' +
				"f.repair_cost_minor = t.cost, f.repair_cost_source = 'library', f.repair_cost_note = NULL, " +
				'f.cost_entry_id = t.entry_id, f.cost_entry_version = t.entry_version, ' +
				`f.payback_years = ${PAYBACK_SQL('t.cost')}`
		)
	);
}

/** Prices the survey's findings from the library; `overwrite` replaces edited and quoted costs too. */
export async function applyLibraryCosts(
	db: Db,
	firmId: string,
	actorId: string,
	surveyId: string,
	overwrite = false
): Promise<ApplyOutcome> {
	return db.transaction(async (tx) => {
		// The survey row before the findings', in the order a publication takes them.
		if (await findingsFrozen(tx, surveyId)) return { kind: 'frozen' as const };
		const currency = await surveyCurrency(tx, firmId, surveyId);
		if (!currency) return { kind: 'missing' as const };
		const [rows, entries] = await Promise.all([
			tx
				.select({
					id: findings.id,
					kind: findings.kind,
					inputs: findings.inputs,
					source: findings.repairCostSource
				})
				.from(findings)
				.where(and(eq(findings.surveyId, surveyId), isNull(findings.deletedAt)))
				.for('update'),
			entriesByKey(tx, firmId)
		]);
		const summary: ApplySummary = { priced: 0, keptEdited: 0, keptQuote: 0, unmatched: {} };
		const writes: LibraryCost[] = [];
		for (const row of rows) {
			if (!overwrite && row.source === 'edited') {
				summary.keptEdited++;
				continue;
			}
			if (!overwrite && row.source === 'quote') {
				summary.keptQuote++;
				continue;
			}
			const priced = priceMatch(matchFinding(row), entries, currency);
			if (!priced.ok) {
				summary.unmatched[priced.reason] = (summary.unmatched[priced.reason] ?? 0) + 1;
				continue;
			}
			writes.push({
				id: row.id,
				costMinor: priced.costMinor,
				entryId: priced.entry.id,
				entryVersion: priced.entry.version
			});
		}
		summary.priced = writes.length;
		await writeLibraryCosts(tx, writes);
		await touchFirm(tx, firmId);
		await recordChange(tx, {
			firmId,
			actorId,
			entity: 'survey',
			entityId: surveyId,
			action: 'price-repairs',
			after: { overwrite, ...summary }
		});
		return { kind: 'applied' as const, summary };
	});
}
