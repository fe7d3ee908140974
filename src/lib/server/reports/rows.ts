/**
 * A report's ranked rows, paged from SQL by keyset (annual saving biggest first, ties by id —
 * the savings list's `savings` order), so a survey of 100,000 findings is read a page at a
 * time and a page's connection goes back to the pool before the next is asked for: an export
 * holds one page in memory, never the survey. The running sums are added up as the rows pass
 * (the order is total, so they equal the savings list's window sums).
 *
 * Live figures come from `findings` (the savings list's rule: live, current, saving); a
 * revision's from its frozen snapshot `survey_revision_findings`.
 */
import { and, asc, desc, eq, gt, lt, sql, type AnyColumn } from 'drizzle-orm';
import { areas, assets, findings as F, headers, surveyRevisionFindings as S } from '../db/schema';
import type { Executor } from '../db/types';
import type { SavingsItem } from '../savings/ranked-list';
import { savingFindingSql, savingsItem, type ItemColumns } from '../savings/ranked-list';
import type { ReportContent } from './content';
import { savingSnapshotSql } from '../publish/snapshot';
import { liveItemColumns, snapshotItemColumns } from '../item-columns';

/** One ranked row of a report: the savings list's item, and the version it was published at. */
export interface ReportRow extends SavingsItem {
	/** The finding's version in the revision's snapshot; null for live figures. */
	publishedVersion: number | null;
}

/** Rows read per statement. */
export const REPORT_PAGE_ROWS = 10_000;

type Raw = ItemColumns & { publishedVersion: number | null };

/**
 * Where a page starts. The ranking is cost DESC, id ASC, but an index on (survey, cost) read
 * backwards gives equal costs in id DESC, and sorting the rest of the survey for every page
 * reads every remaining row each time (seconds a page at 100,000 findings). So a page is read
 * in index order only: `below` a cost, biggest first — its lowest cost's rows may go on past the
 * page, so those are left for a `tie` page, that cost's rows in id order after `after`.
 */
type Cursor = { kind: 'below'; cost: number | null } | { kind: 'tie'; cost: number; after: string };

const where = (cost: AnyColumn, id: AnyColumn, c: Cursor) =>
	c.kind === 'below'
		? c.cost === null
			? undefined
			: lt(cost, c.cost)
		: and(eq(cost, c.cost), gt(id, c.after));
const order = (cost: AnyColumn, id: AnyColumn, c: Cursor) =>
	c.kind === 'below' ? [desc(cost)] : [asc(id)];

function livePage(
	db: Executor,
	content: ReportContent,
	c: Cursor,
	size: number,
	measureId: string | null
) {
	return db
		.select({ ...liveItemColumns, publishedVersion: sql<number | null>`NULL` })
		.from(F)
		.leftJoin(assets, eq(assets.id, F.assetId))
		.leftJoin(areas, eq(areas.id, F.areaId))
		.leftJoin(headers, eq(headers.id, F.headerId))
		.where(
			and(
				savingFindingSql(content.survey.id, content.basisId),
				measureId === null ? undefined : eq(F.measureId, measureId),
				where(F.cost, F.id, c)
			)
		)
		.orderBy(...order(F.cost, F.id, c))
		.limit(size);
}

function revisionPage(
	db: Executor,
	revisionId: string,
	c: Cursor,
	size: number,
	measureId: string | null
) {
	return db
		.select({ ...snapshotItemColumns, publishedVersion: S.findingVersion })
		.from(S)
		.where(
			and(
				savingSnapshotSql(revisionId),
				measureId === null ? undefined : eq(S.measureId, measureId),
				where(S.cost, S.findingId, c)
			)
		)
		.orderBy(...order(S.cost, S.findingId, c))
		.limit(size);
}

/**
 * The report's rows in rank order, `limit` at most (all by default), a page per statement.
 * Stops reading when the consumer stops (an export whose download was cancelled).
 */
export async function* reportRows(
	db: Executor,
	content: ReportContent,
	{
		limit = Infinity,
		pageRows = REPORT_PAGE_ROWS,
		measureId = null
	}: {
		limit?: number;
		pageRows?: number;
		/** Only the findings of this measure (ranked among themselves). */
		measureId?: string | null;
	} = {}
): AsyncGenerator<ReportRow> {
	let rank = 0;
	let saving = 0;
	let repair = 0;
	const row = (r: Raw): ReportRow => {
		rank += 1;
		saving += Number(r.costMinor);
		repair += r.repairCostMinor === null ? 0 : Number(r.repairCostMinor);
		return {
			...savingsItem(r, content.currency, { rank, saving, repair }),
			publishedVersion: r.publishedVersion === null ? null : Number(r.publishedVersion)
		};
	};
	let cursor: Cursor = { kind: 'below', cost: null };
	while (rank < limit) {
		const size = Math.min(pageRows, limit - rank);
		const page: Raw[] = content.revision
			? await revisionPage(db, content.revision.id, cursor, size, measureId)
			: await livePage(db, content, cursor, size, measureId);
		if (cursor.kind === 'tie') {
			for (const r of page) yield row(r);
			cursor =
				page.length < size
					? { kind: 'below', cost: cursor.cost }
					: { kind: 'tie', cost: cursor.cost, after: page[page.length - 1].id };
			continue;
		}
		page.sort(ranked);
		if (page.length < size) {
			for (const r of page) if (rank < limit) yield row(r);
			return;
		}
		// The lowest cost on the page may have more rows past it: those come in id order next.
		const lowest = Number(page[page.length - 1].costMinor);
		for (const r of page) if (Number(r.costMinor) > lowest) yield row(r);
		cursor = { kind: 'tie', cost: lowest, after: '' };
	}
}

/** The ranking's order: cost DESC, then id ASC (ids are lower-case ASCII, so code-unit order). */
const ranked = (a: Raw, b: Raw) =>
	Number(b.costMinor) - Number(a.costMinor) || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0);
