/**
 * Thrown when a value cannot be converted or formatted: an unknown unit, a value that is not
 * a finite number, an absolute pressure or temperature below zero, or units of different
 * quantities. The message names the unit and the value so a person can fix the input.
 */
export class UnitError extends Error {
	/** The unit id involved, as given (may be an unknown string). */
	readonly unit: string;
	/** The value involved, as given. */
	readonly value: number;

	constructor(message: string, unit: string, value: number) {
		super(message);
		this.name = 'UnitError';
		this.unit = unit;
		this.value = value;
	}
}

/** Renders a value for an error message, saying plainly when it is not a finite number. */
export function describeValue(value: unknown): string {
	if (typeof value !== 'number') return `${String(value)} (not a number)`;
	return Number.isFinite(value) ? String(value) : `${value} (not a finite number)`;
}

/** Throws UnitError unless value is a finite number. Returns it, typed. */
export function requireFinite(value: number, unit: string, what: string): number {
	if (typeof value !== 'number' || !Number.isFinite(value)) {
		throw new UnitError(
			`${what} ${describeValue(value)} ${unit} is not a finite number`,
			unit,
			value
		);
	}
	return value;
}
