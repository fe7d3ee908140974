/**
 * Net present value: money at different times brought to today at a discount rate. Amounts
 * fall at the end of each year (year 0 is today, the day the repair is paid for), the usual
 * convention of engineering economics and of spreadsheet NPV functions.
 */
import { finite, lifeYears, nonNegative, rate } from './checks';

/**
 * Present value of one unit received at the end of each of `years` years:
 * Σ_{t=1..N} (1 + r)^−t = (1 − (1 + r)^−N) ÷ r, and N at r = 0 ("uniform present value"
 * or annuity factor of the standard interest tables).
 * @param discountRate fraction per year (0.08 for 8 %), above −1
 * @param years whole years, 1 to 100
 */
export function annuityFactor(discountRate: number, years: number): number {
	rate('Discount rate', discountRate);
	lifeYears(years);
	if (discountRate === 0) return years;
	return (1 - (1 + discountRate) ** -years) / discountRate;
}

export interface NpvInput {
	/** Paid today (year 0), ≥ 0; any currency unit — the answer is in the same unit. */
	initialCost: number;
	/** Saved at the end of each year of the life, the same every year (may be negative). */
	annualSaving: number;
	/** Discount rate per year as a fraction (0.08 for 8 %), above −1. */
	discountRate: number;
	/** Whole years the saving lasts, 1 to 100. */
	lifeYears: number;
}

/**
 * NPV = −initialCost + annualSaving × annuityFactor(r, N), in the unit of the inputs. Not
 * rounded: round to minor units only for display (the result is not stored).
 */
export function netPresentValue(input: NpvInput): number {
	nonNegative('Initial cost', input.initialCost);
	finite('Annual saving', input.annualSaving);
	return (
		input.annualSaving * annuityFactor(input.discountRate, input.lifeYears) - input.initialCost
	);
}

/**
 * NPV of any cash flows: Σ_t flows[t] × (1 + r)^−t, flows[0] today, flows[t] at the end of year t
 * (costs negative, savings positive).
 * @param discountRate fraction per year, above −1
 */
export function presentValueOfFlows(discountRate: number, flows: readonly number[]): number {
	rate('Discount rate', discountRate);
	let sum = 0;
	let factor = 1;
	for (let t = 0; t < flows.length; t++) {
		sum += finite(`Cash flow of year ${t}`, flows[t]) * factor;
		factor /= 1 + discountRate;
	}
	return sum;
}

/** The cash flows of a repair: −initialCost today, then annualSaving for each year of its life. */
export function repairFlows(input: Omit<NpvInput, 'discountRate'>): number[] {
	nonNegative('Initial cost', input.initialCost);
	finite('Annual saving', input.annualSaving);
	lifeYears(input.lifeYears);
	return [-input.initialCost, ...Array.from({ length: input.lifeYears }, () => input.annualSaving)];
}
