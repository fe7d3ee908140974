/**
 * Rows for the pull benchmark: `n` more findings on the demo survey in the field, written
 * straight to the bench database the way the push route leaves them (a capture's columns,
 * the server's results copied from a finding it priced, one change_seq each, the firm's counter
 * moved past them).
 */
import { randomUUID } from 'node:crypto';
import { and, desc, eq, isNotNull, sql } from 'drizzle-orm';
import { drizzle } from 'drizzle-orm/mysql2';
import mysql from 'mysql2/promise';
import * as schema from '../src/lib/server/db/schema';
import { demoSurveys } from '../src/lib/server/seed/demo';
import { databaseUrl } from './env';

/** Writes the rows; returns the firm's change counter just before them. */
export async function benchPullRows(n: number): Promise<number> {
	const pool = mysql.createPool({ uri: databaseUrl(), connectionLimit: 2 });
	const db = drizzle(pool, { schema, mode: 'default' });
	const survey = demoSurveys[0];
	try {
		const [priced] = await db
			.select()
			.from(schema.findings)
			.where(and(eq(schema.findings.surveyId, survey.id), isNotNull(schema.findings.resultsEngine)))
			.orderBy(desc(schema.findings.changeSeq))
			.limit(1);
		return await db.transaction(async (tx) => {
			await tx
				.insert(schema.changeCounters)
				.values({ firmId: survey.firmId, value: 0 })
				.onDuplicateKeyUpdate({ set: { firmId: sql`firm_id` } });
			const [counter] = await tx
				.select()
				.from(schema.changeCounters)
				.where(eq(schema.changeCounters.firmId, survey.firmId))
				.for('update');
			const start = Number(counter.value);
			for (let at = 0; at < n; at += 500) {
				const rows = Array.from({ length: Math.min(500, n - at) }, (_, i) => {
					const k = at + i;
					const when = new Date(Date.parse('2026-11-21T06:00:00Z') + k * 1000);
					return {
						id: randomUUID(),
						surveyId: survey.id,
						kind: priced.kind,
						headerId: priced.headerId,
						areaId: priced.areaId,
						location: `Pull bench line ${k}`,
						notes: '',
						photoIds: [],
						inputs: priced.inputs,
						...figureCopy(priced),
						recordedAt: when,
						capturedAt: when,
						version: 1,
						changeSeq: start + k + 1
					};
				});
				await tx.insert(schema.findings).values(rows);
			}
			await tx
				.update(schema.changeCounters)
				.set({ value: start + n })
				.where(eq(schema.changeCounters.firmId, survey.firmId));
			return start;
		});
	} finally {
		await pool.end();
	}
}

/** A priced row's figure columns, copied onto a bench row. */
function figureCopy(row: typeof schema.findings.$inferSelect) {
	const { flows, physics, physicsEngine, resultsEngine, pricedBasisId, pricedAt, pricingNote } =
		row;
	const { steamLoss, heatLoss, fuelEnergy, cost, co2, water, paybackYears, condition } = row;
	return {
		...{ flows, physics, physicsEngine, resultsEngine, pricedBasisId, pricedAt, pricingNote },
		...{ steamLoss, heatLoss, fuelEnergy, cost, co2, water, paybackYears, condition }
	};
}
