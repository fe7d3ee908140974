/**
 * The demo's published survey as a publication of today's app: a survey seeded as published
 * before revisions were kept gets its revision 1 — the savings list's totals and the snapshot
 * of its findings and measures, on its frozen cost basis — so the client's Ladder and reports
 * read frozen figures like any other publication. Idempotent: a survey with a revision is left.
 */
import { and, eq, isNotNull, notExists } from 'drizzle-orm';
import * as schema from '../db/schema';
import type { Db } from '../db/types';
import { surveyPricing } from '../desk/findings-query';
import { freezeSurveyBasis } from '../pricing/cost-basis';
import { writeRevision } from '../publish/revision-write';
import { demoUsers } from './demo';

export async function seedPublishedRevisions(db: Db): Promise<void> {
	const { surveys, surveyRevisions } = schema;
	const waiting = await db
		.select({ id: surveys.id, firmId: surveys.firmId, publishedAt: surveys.publishedAt })
		.from(surveys)
		.where(
			and(
				eq(surveys.status, 'published'),
				isNotNull(surveys.publishedAt),
				notExists(
					db
						.select({ id: surveyRevisions.id })
						.from(surveyRevisions)
						.where(eq(surveyRevisions.surveyId, surveys.id))
				)
			)
		);
	for (const s of waiting) {
		const consultant = demoUsers.find((u) => u.firmId === s.firmId && u.role === 'consultant');
		await db.transaction(async (tx) => {
			const basisId = await freezeSurveyBasis(tx, s.id);
			const pricing = await surveyPricing(tx, s.id);
			if (!basisId || !pricing) return;
			await writeRevision(tx, {
				surveyId: s.id,
				number: 1,
				basisId,
				currency: pricing.currency,
				actorId: consultant?.id ?? null,
				note: null,
				at: s.publishedAt!
			});
		});
	}
}
