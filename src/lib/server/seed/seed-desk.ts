/**
 * What makes the Desk open full: the Brackenford Maltings client with its site, cost basis,
 * headers, areas and a reviewed survey of 320 findings (./maltings.ts), and two edits from the
 * auditor's phone on the winter survey that the server could not apply (it had a newer version):
 * waiting conflicts for a consultant to settle. Idempotent like the rest of the seed.
 */
import { and, eq, sql } from 'drizzle-orm';
import { findingCaptureSchema } from '../../schemas/capture';
import { findingSchema } from '../../schemas/finding';
import { assetForCapture } from '../assets';
import * as schema from '../db/schema';
import type { Db } from '../db/types';
import { pricingContext } from '../pricing/context';
import { figureColumns } from '../pricing/figures';
import { captureColumns } from '../walk/capture-row';
import { captureOf, findingId } from './demo-finding';
import { hashPassword } from '../auth/password';
import { demoFirms, demoPassword, demoUsers } from './demo';
import { demoFindings } from './findings';
import {
	maltingsClientUser,
	maltingsAreas,
	maltingsClient,
	maltingsCostBasis,
	maltingsCostBasisId,
	maltingsFindings,
	maltingsHeaders,
	maltingsRecordedBy,
	maltingsReviewedBy,
	maltingsSite,
	maltingsSurvey
} from './maltings';

const keep = { set: { id: sql`id` } };

export async function seedMaltings(db: Db): Promise<void> {
	const { clientCompanies, sites, headers, areas, costBases, surveys, findings, users } = schema;
	await db.insert(clientCompanies).values(maltingsClient).onDuplicateKeyUpdate(keep);
	await db
		.insert(users)
		.values({ ...maltingsClientUser, passwordHash: await hashPassword(demoPassword) })
		.onDuplicateKeyUpdate(keep);
	await db.insert(sites).values(maltingsSite).onDuplicateKeyUpdate(keep);
	await db
		.insert(headers)
		.values(maltingsHeaders.map((h) => ({ ...h, siteId: maltingsSite.id })))
		.onDuplicateKeyUpdate(keep);
	await db.insert(areas).values(maltingsAreas).onDuplicateKeyUpdate(keep);
	await db
		.insert(costBases)
		.values({
			id: maltingsCostBasisId,
			siteId: maltingsSite.id,
			number: 1,
			basis: maltingsCostBasis,
			note: 'Oil contract price for the heating season (demo)'
		})
		.onDuplicateKeyUpdate(keep);
	await db
		.update(sites)
		.set({ costBasisId: maltingsCostBasisId })
		.where(and(eq(sites.id, maltingsSite.id), sql`${sites.costBasisId} IS NULL`));
	await db.insert(surveys).values(maltingsSurvey).onDuplicateKeyUpdate(keep);

	const reviewedAt = maltingsSurvey.reviewedAt;
	await db.transaction(async (tx) => {
		const context = await pricingContext(tx, maltingsSite.id);
		const rows = [];
		for (const raw of maltingsFindings()) {
			const finding = findingSchema.parse(raw);
			const capture = findingCaptureSchema.parse(captureOf(raw));
			const asset = await assetForCapture(tx, maltingsSite.id, capture);
			rows.push({
				...captureColumns(capture, asset?.id ?? null),
				id: capture.id,
				surveyId: capture.surveyId,
				...figureColumns(context, finding),
				repairCost: finding.repairCost ?? null,
				status: finding.status,
				recordedBy: maltingsRecordedBy,
				reviewedAt,
				reviewedBy: maltingsReviewedBy
			});
		}
		for (let at = 0; at < rows.length; at += 100) {
			await tx
				.insert(findings)
				.values(rows.slice(at, at + 100))
				.onDuplicateKeyUpdate(keep);
		}
	});
}

const auditor = demoUsers.find((u) => u.email === 'auditor@cinderbrook.example')!;
const phone = '5e7a00d1-0000-4000-8000-000000000001';

/** The two waiting conflicts on the winter survey: an edit and a delete the server kept aside. */
export const demoConflicts = [
	{
		id: '5e7a00c1-0000-4000-8000-000000000001',
		findingId: findingId(17),
		mutationId: '5e7a00c2-0000-4000-8000-000000000001',
		/** What the auditor's phone sent, on top of version 1 (the server is at version 2). */
		device: (capture: Record<string, unknown>) => ({
			...capture,
			notes: 'Still blowing.\nBlowing through on retest after the boiler blowdown.',
			inputs: { ...(capture.inputs as object), condition: 'leaking', testMethod: 'ultrasound' },
			updatedAt: '2026-11-17T11:05:00.000Z'
		})
	},
	{
		id: '5e7a00c1-0000-4000-8000-000000000002',
		findingId: findingId(20),
		mutationId: '5e7a00c2-0000-4000-8000-000000000002',
		device: null
	}
] as const;

export async function seedConflicts(db: Db): Promise<void> {
	const { findingConflicts } = schema;
	const firmId = demoFirms[0].id;
	for (const c of demoConflicts) {
		const raw = demoFindings.find((f) => f.id === c.findingId)!;
		const capture = findingCaptureSchema.parse(captureOf(raw));
		await db
			.insert(findingConflicts)
			.values({
				id: c.id,
				firmId,
				surveyId: capture.surveyId,
				findingId: c.findingId,
				userId: auditor.id,
				deviceId: phone,
				mutationId: c.mutationId,
				baseVersion: 1,
				serverVersion: 2,
				data: c.device === null ? null : c.device(capture),
				createdAt: new Date('2026-11-17T11:06:00Z')
			})
			.onDuplicateKeyUpdate(keep);
	}
}
