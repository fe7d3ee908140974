/**
 * `GET /api/sync/pull`: what changed after a cursor, for one person, in change-counter order
 * (docs/sync.md). Three feeds share the firm's counter — findings of the surveys the person
 * records on, those surveys themselves, and tombstones addressed to the person (or everyone) —
 * so merging them by change_seq gives one total order, and a page ends at a counter value.
 */
import { and, asc, eq, gt, inArray, isNull, or } from 'drizzle-orm';
import type { Change, PullResponse } from '../../schemas/sync';
import { assets, findings, sites, surveys, syncTombstones } from '../db/schema';
import type { Db, Executor } from '../db/types';
import { surveyScope } from '../policy';
import { captureFromRow } from '../walk/capture-row';
import { surveySummaries } from '../walk/summaries';
import { figuresForDevice } from './price';

/** The finding's columns a change carries; its stored results are read field by field below. */
const feedColumns = {
	id: findings.id,
	surveyId: findings.surveyId,
	kind: findings.kind,
	headerId: findings.headerId,
	areaId: findings.areaId,
	location: findings.location,
	notes: findings.notes,
	inputs: findings.inputs,
	photoIds: findings.photoIds,
	recordedAt: findings.recordedAt,
	capturedAt: findings.capturedAt,
	createdAt: findings.createdAt,
	updatedAt: findings.updatedAt,
	status: findings.status,
	version: findings.version,
	changeSeq: findings.changeSeq,
	deletedAt: findings.deletedAt
};

/** The typed figure columns a device is sent (never the JSON physics beside them). */
const feedFigures = {
	resultsEngine: findings.resultsEngine,
	steamLoss: findings.steamLoss,
	heatLoss: findings.heatLoss,
	fuelEnergy: findings.fuelEnergy,
	cost: findings.cost,
	co2: findings.co2,
	water: findings.water
};

type Sequenced = { seq: number; change: Change };

async function findingFeed(tx: Executor, user: SessionUser, since: number, n: number) {
	// Two steps: the page's ids from the (survey_id, change_seq) index alone, then the whole rows
	// of that page only, so a long feed never reads its JSON columns to sort them.
	const page = await tx
		.select({ id: findings.id })
		.from(findings)
		.innerJoin(surveys, eq(surveys.id, findings.surveyId))
		.where(and(surveyScope(user), gt(findings.changeSeq, since)))
		.orderBy(asc(findings.changeSeq))
		.limit(n);
	if (page.length === 0) return [];
	const rows = await tx
		.select({
			finding: feedColumns,
			figures: feedFigures,
			assetTag: assets.tag,
			currency: sites.currency
		})
		.from(findings)
		.innerJoin(surveys, eq(surveys.id, findings.surveyId))
		.innerJoin(sites, eq(sites.id, surveys.siteId))
		.leftJoin(assets, eq(assets.id, findings.assetId))
		.where(
			inArray(
				findings.id,
				page.map((p) => p.id)
			)
		)
		.orderBy(asc(findings.changeSeq));
	return rows.map(({ finding: f, figures, assetTag, currency }): Sequenced => {
		const deleted = f.deletedAt !== null;
		return {
			seq: f.changeSeq,
			change: {
				entity: 'finding',
				id: f.id,
				version: f.version,
				deleted,
				data: deleted
					? null
					: {
							capture: captureFromRow({ ...f, assetTag }),
							status: f.status as never,
							results: figuresForDevice(figures, currency)
						}
			}
		};
	});
}

async function surveyFeed(tx: Executor, user: SessionUser, since: number, n: number) {
	const rows = await tx
		.select({
			id: surveys.id,
			seq: surveys.changeSeq,
			version: surveys.version,
			stage: surveys.status
		})
		.from(surveys)
		.where(and(surveyScope(user), gt(surveys.changeSeq, since)))
		.orderBy(asc(surveys.changeSeq))
		.limit(n);
	if (rows.length === 0) return [];
	const summaries = new Map(
		(
			await surveySummaries(
				tx,
				inArray(
					surveys.id,
					rows.map((r) => r.id)
				)
			)
		).map((s) => [s.id, s])
	);
	return rows.map((r): Sequenced => {
		// A closed survey leaves the device like an unassigned one.
		const deleted = r.stage === 'closed' || !summaries.has(r.id);
		return {
			seq: r.seq,
			change: {
				entity: 'survey',
				id: r.id,
				version: r.version,
				deleted,
				data: deleted ? null : summaries.get(r.id)!
			}
		};
	});
}

async function tombstoneFeed(tx: Executor, user: SessionUser, since: number, n: number) {
	const rows = await tx
		.select()
		.from(syncTombstones)
		.where(
			and(
				eq(syncTombstones.firmId, user.firmId),
				or(eq(syncTombstones.userId, user.id), isNull(syncTombstones.userId)),
				gt(syncTombstones.changeSeq, since)
			)
		)
		.orderBy(asc(syncTombstones.changeSeq))
		.limit(n);
	return rows.map((t): Sequenced => ({
		seq: t.changeSeq,
		change:
			t.entity === 'survey'
				? { entity: 'survey', id: t.entityId, version: 0, deleted: true, data: null }
				: { entity: 'finding', id: t.entityId, version: 0, deleted: true, data: null }
	}));
}

export async function pullChanges(
	db: Db,
	user: SessionUser,
	since: number,
	limit: number
): Promise<PullResponse> {
	// One consistent read of the three feeds, as the snapshot does.
	return db.transaction(
		async (tx) => {
			const feeds = await Promise.all([
				findingFeed(tx, user, since, limit + 1),
				surveyFeed(tx, user, since, limit + 1),
				tombstoneFeed(tx, user, since, limit + 1)
			]);
			const merged = feeds.flat().sort((a, b) => a.seq - b.seq);
			const page = merged.slice(0, limit);
			const changes = page.map((s) => s.change);
			return {
				changes,
				cursor: page.length > 0 ? page[page.length - 1].seq : since,
				more: merged.length > limit
			};
		},
		{ isolationLevel: 'repeatable read', withConsistentSnapshot: true }
	);
}
