/**
 * A finding or measure as the Ladder's item page shows it (docs/decisions.md): what was found
 * and its figures as the client is shown them — the last published revision's frozen snapshot
 * (survey_revision_findings / survey_revision_measures), or for a survey published before
 * revisions were kept its live findings, frozen by the publication — with its photos, its
 * decisions and its comments. The caller has checked access (policy requireLadderItem).
 */
import { and, asc, desc, eq, isNull, type SQL } from 'drizzle-orm';
import type { Figures } from '../../figures';
import type { ItemRef } from '../../schemas/decisions';
import type { UnitSystemId } from '../../units';
import {
	areas,
	assets,
	findings as F,
	headers,
	measures,
	surveyRevisionFindings as S,
	surveyRevisionMeasures,
	surveyRevisions
} from '../db/schema';
import type { Executor } from '../db/types';
import { photosOf } from '../desk/finding-detail';
import { liveItemColumns, snapshotItemColumns } from '../item-columns';
import { surveyNames } from '../publish/revisions';
import { surveyPricing } from '../desk/findings-query';
import { conditionWords, kindWords } from '../finding-words';
import { revisionMeasures, surveyMeasures, type MeasureRow } from '../measures/sums';
import { unitSystemOf } from '../walk/person';
import type { ItemFacts } from './facts';
import { commentThread, decisionHistory, type CommentEntry, type DecisionEntry } from './read';

/** One finding as shown: its words and its figures. */
export interface ShownFinding extends Figures {
	findingId: string;
	kindWords: string;
	conditionWords: string | null;
	tag: string | null;
	location: string;
	area: string | null;
	header: string | null;
	measureId: string | null;
	/** False when its figures were not current on the survey's cost basis when published. */
	figuresCurrent: boolean;
}

export interface ItemPage {
	kind: ItemRef['kind'];
	survey: { id: string; name: string; site: string; client: string };
	/** The revision shown, or null (a survey published before revisions were kept). */
	revision: { number: number; publishedAt: Date } | null;
	/** The UTC day the survey first went to the client: the earliest day a repair may be marked. */
	publishedOn: string | null;
	unitSystem: UnitSystemId;
	currency: string;
	/** The finding shown (kind finding), or the measure's findings (kind measure). */
	finding: ShownFinding | null;
	measure: MeasureRow | null;
	findings: ShownFinding[];
	/** A finding's measure (name and id) when it is part of one. */
	partOf: { id: string; name: string } | null;
	photos: Awaited<ReturnType<typeof photosOf>>;
	decisions: DecisionEntry[];
	comments: CommentEntry[];
}

const num = (v: unknown) => (v === null || v === undefined ? null : Number(v));

interface RawRow {
	id: string;
	kind: string;
	condition: string | null;
	tag: string | null;
	location: string | null;
	area: string | null;
	header: string | null;
	measureId: string | null;
	figuresCurrent: unknown;
	steamKgH: number | null;
	heatKw: number | null;
	fuelGjYear: number | null;
	costMinor: unknown;
	co2KgYear: number | null;
	waterM3Year: number | null;
	repairCostMinor: unknown;
	paybackYears: number | null;
}

function shown(r: RawRow, currency: string): ShownFinding {
	return {
		findingId: r.id,
		kindWords: kindWords(r.kind),
		conditionWords: conditionWords(r.condition),
		tag: r.tag,
		location: r.location ?? '',
		area: r.area,
		header: r.header,
		measureId: r.measureId,
		figuresCurrent: Number(r.figuresCurrent) === 1,
		steamKgH: r.steamKgH,
		heatKw: r.heatKw,
		fuelGjYear: r.fuelGjYear,
		costMinor: num(r.costMinor),
		co2KgYear: r.co2KgYear,
		waterM3Year: r.waterM3Year,
		repairCostMinor: num(r.repairCostMinor),
		paybackYears: r.paybackYears,
		currency
	};
}

/** Findings of the revision's snapshot matching `where`, biggest saving first. */
function snapshotRows(db: Executor, revisionId: string, where: SQL) {
	return db
		.select({ ...snapshotItemColumns, figuresCurrent: S.figuresCurrent })
		.from(S)
		.where(and(eq(S.revisionId, revisionId), where))
		.orderBy(desc(S.cost), asc(S.findingId));
}

/** Live findings matching `where` (a survey published before revisions were kept). */
function liveRows(db: Executor, where: SQL) {
	return (
		db
			// Locked since it was published, so what it shows is what was published.
			.select({ ...liveItemColumns, figuresCurrent: F.pricedBasisId })
			.from(F)
			.leftJoin(assets, eq(assets.id, F.assetId))
			.leftJoin(areas, eq(areas.id, F.areaId))
			.leftJoin(headers, eq(headers.id, F.headerId))
			.where(and(isNull(F.deletedAt), where))
			.orderBy(desc(F.cost), asc(F.id))
	);
}

async function rowsOf(db: Executor, facts: ItemFacts, revision: boolean, where: 'one' | 'measure') {
	const id = facts.ref.id;
	if (revision) {
		return snapshotRows(
			db,
			facts.revision!.id,
			where === 'one' ? eq(S.findingId, id) : eq(S.measureId, id)
		);
	}
	const rows = await liveRows(
		db,
		and(eq(F.surveyId, facts.surveyId), where === 'one' ? eq(F.id, id) : eq(F.measureId, id))!
	);
	return rows.map((r) => ({ ...r, figuresCurrent: r.figuresCurrent === null ? 0 : 1 }));
}

async function measureOf(db: Executor, facts: ItemFacts): Promise<MeasureRow | null> {
	const all = facts.revision
		? await revisionMeasures(db, facts.revision)
		: await surveyMeasures(db, facts.surveyId, facts.ref.id);
	return all.find((m) => m.id === facts.ref.id) ?? null;
}

async function measureName(db: Executor, facts: ItemFacts, measureId: string) {
	const [row] = facts.revision
		? await db
				.select({ id: surveyRevisionMeasures.measureId, name: surveyRevisionMeasures.name })
				.from(surveyRevisionMeasures)
				.where(
					and(
						eq(surveyRevisionMeasures.revisionId, facts.revision.id),
						eq(surveyRevisionMeasures.measureId, measureId)
					)
				)
		: await db
				.select({ id: measures.id, name: measures.name })
				.from(measures)
				.where(and(eq(measures.id, measureId), isNull(measures.deletedAt)));
	return row ?? null;
}

async function currencyOf(db: Executor, facts: ItemFacts): Promise<string> {
	if (facts.revision) {
		const [row] = await db
			.select({ totals: surveyRevisions.totals })
			.from(surveyRevisions)
			.where(eq(surveyRevisions.id, facts.revision.id));
		if (row) return row.totals.currency;
	}
	return (await surveyPricing(db, facts.surveyId))?.currency ?? 'EUR';
}

async function livePhotoIds(db: Executor, findingId: string): Promise<string[]> {
	const [row] = await db.select({ ids: F.photoIds }).from(F).where(eq(F.id, findingId));
	return row?.ids ?? [];
}

/** Everything the item page shows (facts from requireLadderItem), or null if it is gone. */
export async function ladderItemPage(
	db: Executor,
	reader: { id: string; firmId: string },
	facts: ItemFacts
): Promise<ItemPage | null> {
	const ref = facts.ref;
	const fromRevision = facts.source === 'revision';
	const [named, unitSystem, currency, history, thread] = await Promise.all([
		surveyNames(db, facts.surveyId),
		unitSystemOf(db, reader.id),
		currencyOf(db, facts),
		decisionHistory(db, ref),
		commentThread(db, ref)
	]);
	if (!named) return null;
	const { stage: _stage, ...survey } = named;
	const base = {
		kind: ref.kind,
		survey,
		revision: facts.revision
			? { number: facts.revision.number, publishedAt: facts.revision.publishedAt }
			: null,
		publishedOn: facts.publishedOn,
		unitSystem,
		currency,
		decisions: history,
		comments: thread
	};
	if (ref.kind === 'finding') {
		const [row] = await rowsOf(db, facts, fromRevision, 'one');
		if (!row) return null;
		const finding = shown(row, currency);
		const [photos, partOf] = await Promise.all([
			photosOf(db, reader.firmId, ref.id, await livePhotoIds(db, ref.id)),
			finding.measureId ? measureName(db, facts, finding.measureId) : null
		]);
		return { ...base, finding, measure: null, findings: [], partOf, photos };
	}
	const [measure, rows] = await Promise.all([
		measureOf(db, facts),
		rowsOf(db, facts, fromRevision, 'measure')
	]);
	if (!measure) return null;
	return {
		...base,
		finding: null,
		measure,
		findings: rows.map((r) => shown(r, currency)),
		partOf: null,
		photos: []
	};
}
