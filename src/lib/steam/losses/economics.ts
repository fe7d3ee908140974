/**
 * Repair economics: simple payback and net present value of a repair that saves the same
 * amount every year of its life (end-of-year savings, the usual convention for NPV).
 */
import { requireFinite, requireNonNegative } from './sourced';

export interface Payback {
	/** Years to recover the repair cost; null when the repair saves nothing and never pays back. */
	years: number | null;
	/** Why there is no figure, when years is null. */
	note: string | null;
}

/**
 * Simple payback, years = repair cost ÷ annual saving (both in major units).
 * A free repair pays back at once (0 years); a repair that saves nothing never does (null).
 */
export function simplePayback(repairCost: number, annualSaving: number): Payback {
	requireNonNegative('Repair cost', repairCost, '(currency)');
	requireNonNegative('Annual saving', annualSaving, '(currency per year)');
	if (annualSaving === 0) {
		return repairCost === 0
			? { years: 0, note: null }
			: { years: null, note: 'No annual saving: the repair does not pay back in money' };
	}
	return { years: repairCost / annualSaving, note: null };
}

export interface NpvInput {
	/** Repair cost at year 0, major units. */
	repairCost: number;
	/** Saving at the end of each year, major units. */
	annualSaving: number;
	/** Discount rate per year, [0, 1). */
	discountRate: number;
	/** Life of the repair, whole years ≥ 1. */
	lifeYears: number;
}

/**
 * Net present value, major units: −cost + saving × Σ_{t=1..N} (1 + r)^−t.
 */
export function netPresentValue({
	repairCost,
	annualSaving,
	discountRate,
	lifeYears
}: NpvInput): number {
	requireNonNegative('Repair cost', repairCost, '(currency)');
	requireFinite('Annual saving', annualSaving, '(currency per year)');
	requireFinite('Discount rate', discountRate, '(a fraction per year)');
	if (discountRate < 0 || discountRate >= 1) {
		throw new Error(`Discount rate must be at least 0 and below 1, got ${discountRate}`);
	}
	if (!Number.isInteger(lifeYears) || lifeYears < 1) {
		throw new Error(`Life must be a whole number of years, at least 1, got ${lifeYears}`);
	}
	const annuity =
		discountRate === 0 ? lifeYears : (1 - (1 + discountRate) ** -lifeYears) / discountRate;
	return annualSaving * annuity - repairCost;
}
