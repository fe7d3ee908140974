/**
 * A measure: findings repaired as one job ("replace 14 traps in the dryer hall"). What it
 * costs is its findings' repair costs plus its own extra costs (access, scaffold, a shutdown);
 * what it saves is its findings' savings; its payback is the whole cost over the whole saving.
 */
import { finite, minorUnits, nonNegative } from './checks';
import { simplePaybackYears } from './payback';
import { netPresentValue } from './present-value';
import { repairIrr } from './irr';

/** One finding of a measure, with the figures a measure adds up. */
export interface MeasureFinding {
	/** Repair cost, integer minor units; null: not priced yet. */
	repairCostMinor: number | null;
	/** Fuel and water cost saved per year, integer minor units; null: no current figure. */
	annualSavingMinor: number | null;
	/** Steam no longer lost, kg/h. */
	steamKgH?: number | null;
	/** Fuel energy saved per year, GJ. */
	fuelGjYear?: number | null;
	/** CO2 avoided per year, kg. */
	co2KgYear?: number | null;
	/** Makeup water saved per year, m³. */
	waterM3Year?: number | null;
}

/** A cost of the job itself rather than of one finding's repair. */
export interface ExtraCost {
	/** What it is for ("scaffold in the dryer hall"). */
	label: string;
	/** Integer minor units, ≥ 0. */
	costMinor: number;
}

export interface MeasureSums {
	/** How many findings the measure groups. */
	findings: number;
	/** Sum of the findings' known repair costs, minor units. */
	repairCostMinor: number;
	/** Sum of the measure's own extra costs, minor units. */
	extraCostMinor: number;
	/** What the job costs: repairs + extra costs, minor units. */
	costMinor: number;
	/** Saved per year, minor units. */
	annualSavingMinor: number;
	steamKgH: number;
	fuelGjYear: number;
	co2KgYear: number;
	waterM3Year: number;
	/** Findings whose repair is not priced yet: the cost (and payback) leaves them out. */
	withoutRepairCost: number;
	/** Findings with no current saving figure: the savings leave them out. */
	withoutSaving: number;
	/** costMinor ÷ annualSavingMinor, years; null with no saving, or nothing priced at all. */
	paybackYears: number | null;
}

const add = (label: string, value: number | null | undefined) =>
	value === null || value === undefined ? 0 : finite(label, value);

/** Sums of a measure: its findings' repair costs and savings plus its own extra costs. */
export function measureSums(
	findings: readonly MeasureFinding[],
	extraCosts: readonly ExtraCost[] = []
): MeasureSums {
	let repair = 0;
	let saving = 0;
	let steam = 0;
	let fuel = 0;
	let co2 = 0;
	let water = 0;
	let withoutRepairCost = 0;
	let withoutSaving = 0;
	for (const f of findings) {
		if (f.repairCostMinor === null) withoutRepairCost++;
		else repair += nonNegative('Repair cost', minorUnits('Repair cost', f.repairCostMinor));
		if (f.annualSavingMinor === null) withoutSaving++;
		else saving += minorUnits('Annual saving', f.annualSavingMinor);
		steam += add('Steam', f.steamKgH);
		fuel += add('Fuel energy', f.fuelGjYear);
		co2 += add('CO2', f.co2KgYear);
		water += add('Water', f.waterM3Year);
	}
	let extra = 0;
	for (const e of extraCosts) {
		extra += nonNegative(
			`Extra cost "${e.label}"`,
			minorUnits(`Extra cost "${e.label}"`, e.costMinor)
		);
	}
	const cost = repair + extra;
	// Nothing priced at all (no repair cost known, no extra cost): the cost is unknown, not zero.
	const known = withoutRepairCost < findings.length || extraCosts.length > 0;
	return {
		findings: findings.length,
		repairCostMinor: repair,
		extraCostMinor: extra,
		costMinor: cost,
		annualSavingMinor: saving,
		steamKgH: steam,
		fuelGjYear: fuel,
		co2KgYear: co2,
		waterM3Year: water,
		withoutRepairCost,
		withoutSaving,
		paybackYears: simplePaybackYears(known ? cost : null, saving)
	};
}

export interface LifeTerms {
	/** Discount rate per year, a fraction above −1. */
	discountRate: number;
	/** Whole years the saving lasts, 1 to 100. */
	lifeYears: number;
}

export interface MeasureEconomics {
	/** NPV of the whole job over its life, minor units (not rounded). */
	npvMinor: number;
	/** IRR, a fraction per year; null when no single rate exists (see internalRateOfReturn). */
	irr: number | null;
}

/** NPV and IRR of a measure's cost and constant annual saving over a life and discount rate. */
export function measureEconomics(
	sums: Pick<MeasureSums, 'costMinor' | 'annualSavingMinor'>,
	terms: LifeTerms
): MeasureEconomics {
	const base = {
		initialCost: sums.costMinor,
		annualSaving: sums.annualSavingMinor,
		lifeYears: terms.lifeYears
	};
	return {
		npvMinor: netPresentValue({ ...base, discountRate: terms.discountRate }),
		irr: repairIrr(base)
	};
}
