/**
 * A number with its unit and where it comes from, so every assumption a result rests on can
 * be shown to the person signing the report.
 */
export interface Sourced {
	value: number;
	unit: string;
	/**
	 * A named publication (docs/sources.md lists them), "common practice" for a fact of the trade,
	 * or the site or finding it was entered on. Never "from memory": people read these.
	 */
	source: string;
}

/** One line of a result's assumption list. */
export interface Assumption extends Sourced {
	/** Stable key, e.g. "boilerEfficiency", for forms that edit it. */
	key: string;
	/** Words a person reads. */
	label: string;
}

/** Throws a plain Error unless value is a finite number; returns it. Never lets NaN through. */
export function requireFinite(label: string, value: number, unit: string): number {
	if (typeof value !== 'number' || !Number.isFinite(value)) {
		throw new Error(`${label} must be a finite number of ${unit}, got ${String(value)}`);
	}
	return value;
}

/** Throws unless value is finite and > 0. */
export function requirePositive(label: string, value: number, unit: string): number {
	requireFinite(label, value, unit);
	if (value <= 0) throw new Error(`${label} must be greater than 0 ${unit}, got ${value}`);
	return value;
}

/** Throws unless value is finite and ≥ 0. */
export function requireNonNegative(label: string, value: number, unit: string): number {
	requireFinite(label, value, unit);
	if (value < 0) throw new Error(`${label} cannot be negative, got ${value} ${unit}`);
	return value;
}
