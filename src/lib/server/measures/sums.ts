/**
 * A survey's measures with their sums (docs/costs.md). The sums are one GROUP BY over the
 * findings' typed columns; payback, NPV and IRR then come from $lib/economics on those sums,
 * NPV and IRR only when the cost basis gives a life and a discount rate.
 */
import { and, asc, eq, isNull, sql } from 'drizzle-orm';
import { measureEconomics, simplePaybackYears, type MeasureEconomics } from '../../economics/index';
import type { CostBasis } from '../../schemas/site';
import { costBases, findings, measures, sites, surveys } from '../db/schema';
import type { Executor } from '../db/types';

export interface MeasureRow {
	id: string;
	name: string;
	description: string | null;
	extras: { access: number; scaffold: number; shutdown: number; other: number };
	otherLabel: string | null;
	/** Bumped by every save of the name, description or extra costs (the edit form's check). */
	version: number;
	findings: number;
	/** Sum of the findings' known repair costs, minor units. */
	repairCost: number;
	withoutRepairCost: number;
	extraCost: number;
	/** Repairs + extras, minor units; null when nothing at all is priced. */
	cost: number | null;
	/** Fuel and water cost saved per year, minor units. */
	annualSaving: number;
	withoutSaving: number;
	steamKgH: number;
	fuelGj: number;
	co2Kg: number;
	waterM3: number;
	paybackYears: number | null;
	/** Over the basis's life and discount rate; null without them (or without a cost). */
	economics: (MeasureEconomics & { lifeYears: number; discountRate: number }) | null;
}

const num = (v: unknown) => (v === null || v === undefined ? 0 : Number(v));

/** The life and discount rate of the basis the survey is priced on, when it gives both. */
export async function lifeTerms(db: Executor, surveyId: string) {
	const [row] = await db
		.select({ basis: costBases.basis })
		.from(surveys)
		.innerJoin(sites, eq(sites.id, surveys.siteId))
		.innerJoin(
			costBases,
			eq(costBases.id, sql`COALESCE(${surveys.costBasisId}, ${sites.costBasisId})`)
		)
		.where(eq(surveys.id, surveyId))
		.limit(1);
	const basis = row?.basis as CostBasis | undefined;
	if (!basis || basis.discountRate === undefined || basis.lifeYears === undefined) return null;
	return { discountRate: Number(basis.discountRate), lifeYears: Number(basis.lifeYears) };
}

/** The survey's live measures with their sums, in the consultant's order; `only` picks one. */
export async function surveyMeasures(
	db: Executor,
	surveyId: string,
	only?: string
): Promise<MeasureRow[]> {
	const live = and(eq(findings.measureId, measures.id), isNull(findings.deletedAt));
	const [rows, terms] = await Promise.all([
		db
			.select({
				id: measures.id,
				name: measures.name,
				description: measures.description,
				access: measures.accessCost,
				scaffold: measures.scaffoldCost,
				shutdown: measures.shutdownCost,
				other: measures.otherCost,
				otherLabel: measures.otherCostLabel,
				version: measures.version,
				findings: sql<number>`COUNT(${findings.id})`,
				repairCost: sql<number>`SUM(${findings.repairCost})`,
				withoutRepairCost: sql<number>`SUM(${findings.id} IS NOT NULL AND ${findings.repairCost} IS NULL)`,
				annualSaving: sql<number>`SUM(${findings.cost})`,
				withoutSaving: sql<number>`SUM(${findings.id} IS NOT NULL AND ${findings.cost} IS NULL)`,
				steam: sql<number>`SUM(${findings.steamLoss})`,
				fuel: sql<number>`SUM(${findings.fuelEnergy})`,
				co2: sql<number>`SUM(${findings.co2})`,
				water: sql<number>`SUM(${findings.water})`
			})
			.from(measures)
			.leftJoin(findings, live)
			.where(
				and(
					eq(measures.surveyId, surveyId),
					isNull(measures.deletedAt),
					only ? eq(measures.id, only) : undefined
				)
			)
			.groupBy(measures.id)
			.orderBy(asc(measures.sortOrder), asc(measures.createdAt)),
		lifeTerms(db, surveyId)
	]);
	return rows.map((r) => {
		const extras = {
			access: num(r.access),
			scaffold: num(r.scaffold),
			shutdown: num(r.shutdown),
			other: num(r.other)
		};
		const extraCost = extras.access + extras.scaffold + extras.shutdown + extras.other;
		const count = num(r.findings);
		const repairCost = num(r.repairCost);
		const withoutRepairCost = num(r.withoutRepairCost);
		const annualSaving = num(r.annualSaving);
		// Nothing priced (no finding's repair, no extra cost): the cost is unknown, not zero.
		const known = withoutRepairCost < count || extraCost > 0;
		const cost = known ? repairCost + extraCost : null;
		const economics =
			cost !== null && terms
				? {
						...measureEconomics({ costMinor: cost, annualSavingMinor: annualSaving }, terms),
						...terms
					}
				: null;
		return {
			id: r.id,
			name: r.name,
			description: r.description,
			extras,
			otherLabel: r.otherLabel,
			version: r.version,
			findings: count,
			repairCost,
			withoutRepairCost,
			extraCost,
			cost,
			annualSaving,
			withoutSaving: num(r.withoutSaving),
			steamKgH: num(r.steam),
			fuelGj: num(r.fuel),
			co2Kg: num(r.co2),
			waterM3: num(r.water),
			paybackYears: simplePaybackYears(cost, annualSaving),
			economics
		};
	});
}
