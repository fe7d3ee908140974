/**
 * A survey's measures with their sums (docs/costs.md). The sums are one GROUP BY over the
 * findings' typed columns; payback, NPV and IRR then come from $lib/economics on those sums,
 * NPV and IRR only when the cost basis gives a life and a discount rate.
 */
import { and, asc, eq, isNull, sql, type AnyColumn } from 'drizzle-orm';
import { measureEconomics, simplePaybackYears, type MeasureEconomics } from '../../economics/index';
import type { CostBasis } from '../../schemas/site';
import {
	costBases,
	findings,
	measures,
	surveyRevisionFindings,
	surveyRevisionMeasures
} from '../db/schema';
import { surveyPricing } from '../desk/findings-query';
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

/** The life and discount rate of a cost basis, when it gives both (NPV and IRR need them). */
export async function basisLifeTerms(db: Executor, basisId: string | null) {
	if (basisId === null) return null;
	const [row] = await db
		.select({ basis: costBases.basis })
		.from(costBases)
		.where(eq(costBases.id, basisId))
		.limit(1);
	const basis = row?.basis as CostBasis | undefined;
	if (!basis || basis.discountRate === undefined || basis.lifeYears === undefined) return null;
	return { discountRate: Number(basis.discountRate), lifeYears: Number(basis.lifeYears) };
}

export type LifeTerms = NonNullable<Awaited<ReturnType<typeof basisLifeTerms>>>;

/** One measure's columns and its findings' sums, as the GROUP BY gives them. */
interface MeasureSums {
	id: string;
	name: string;
	description: string | null;
	access: unknown;
	scaffold: unknown;
	shutdown: unknown;
	other: unknown;
	otherLabel: string | null;
	version: unknown;
	findings: unknown;
	repairCost: unknown;
	withoutRepairCost: unknown;
	annualSaving: unknown;
	withoutSaving: unknown;
	steam: unknown;
	fuel: unknown;
	co2: unknown;
	water: unknown;
}

/** The sums of a measure's findings (`f`: the findings table or a revision's snapshot). */
function findingSums(f: {
	id: AnyColumn;
	repairCost: AnyColumn;
	cost: AnyColumn;
	steamLoss: AnyColumn;
	fuelEnergy: AnyColumn;
	co2: AnyColumn;
	water: AnyColumn;
}) {
	return {
		findings: sql<number>`COUNT(${f.id})`,
		repairCost: sql<number>`SUM(${f.repairCost})`,
		withoutRepairCost: sql<number>`SUM(${f.id} IS NOT NULL AND ${f.repairCost} IS NULL)`,
		annualSaving: sql<number>`SUM(${f.cost})`,
		withoutSaving: sql<number>`SUM(${f.id} IS NOT NULL AND ${f.cost} IS NULL)`,
		steam: sql<number>`SUM(${f.steamLoss})`,
		fuel: sql<number>`SUM(${f.fuelEnergy})`,
		co2: sql<number>`SUM(${f.co2})`,
		water: sql<number>`SUM(${f.water})`
	};
}

/** A measure's cost (its findings' repairs + its own costs), saving, payback, NPV and IRR. */
function measureRow(r: MeasureSums, terms: LifeTerms | null): MeasureRow {
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
		version: num(r.version),
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
				...findingSums(findings)
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
		surveyPricing(db, surveyId).then((p) => basisLifeTerms(db, p?.basisId ?? null))
	]);
	return rows.map((r) => measureRow(r, terms));
}

/**
 * A published revision's measures as they stood (survey_revision_measures) with the sums of
 * their findings' frozen figures (survey_revision_findings), on the revision's basis.
 */
export async function revisionMeasures(
	db: Executor,
	revision: { id: string; costBasisId: string | null }
): Promise<MeasureRow[]> {
	const M = surveyRevisionMeasures;
	const S = surveyRevisionFindings;
	const [rows, terms] = await Promise.all([
		db
			.select({
				id: M.measureId,
				name: M.name,
				description: M.description,
				access: M.accessCost,
				scaffold: M.scaffoldCost,
				shutdown: M.shutdownCost,
				other: M.otherCost,
				otherLabel: M.otherCostLabel,
				// A revision's measure is frozen: no version a form could save at.
				version: sql<number>`0`,
				...findingSums({ ...S, id: S.findingId })
			})
			.from(M)
			.leftJoin(S, and(eq(S.revisionId, M.revisionId), eq(S.measureId, M.measureId)))
			.where(eq(M.revisionId, revision.id))
			.groupBy(M.measureId)
			.orderBy(asc(M.sortOrder), asc(M.createdAt)),
		basisLifeTerms(db, revision.costBasisId)
	]);
	return rows.map((r) => measureRow(r, terms));
}
