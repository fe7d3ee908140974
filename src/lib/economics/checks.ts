/**
 * Input checks shared by the economics functions: a bad number is refused with a message in
 * plain words (what, the value, and what is allowed), never turned into NaN or Infinity.
 */

/** A finite number, else an Error naming the input. */
export function finite(label: string, value: number): number {
	if (typeof value !== 'number' || !Number.isFinite(value)) {
		throw new Error(`${label} must be a finite number, got ${String(value)}`);
	}
	return value;
}

/** A finite number ≥ 0. */
export function nonNegative(label: string, value: number): number {
	if (finite(label, value) < 0) throw new Error(`${label} cannot be negative, got ${value}`);
	return value;
}

/** Money in minor units (cents, pence…): a whole number within the safe integer range. */
export function minorUnits(label: string, value: number): number {
	if (!Number.isSafeInteger(value)) {
		throw new Error(`${label} must be a whole number of minor units (cents), got ${String(value)}`);
	}
	return value;
}

/** Longest life the functions take, years (a repair outliving a century is no estimate). */
export const MAX_LIFE_YEARS = 100;

/** A life of whole years, 1 to MAX_LIFE_YEARS. */
export function lifeYears(value: number): number {
	if (!Number.isInteger(value) || value < 1 || value > MAX_LIFE_YEARS) {
		throw new Error(
			`Life must be a whole number of years from 1 to ${MAX_LIFE_YEARS}, got ${String(value)}`
		);
	}
	return value;
}

/** A rate per year as a fraction above −1 (−100 % would make every later amount infinite). */
export function rate(label: string, value: number): number {
	if (finite(label, value) <= -1) {
		throw new Error(`${label} must be above −1 (−100 %), got ${value}`);
	}
	return value;
}
