/**
 * Thrown for any input outside the range a formulation is valid in, or not a finite number.
 * The message names the quantity, the value given and the valid range, so a person can fix it.
 */
export class SteamRangeError extends RangeError {
	readonly quantity: string;
	readonly value: number;

	constructor(quantity: string, value: number, validRange: string) {
		super(`${quantity} = ${formatValue(value)} is outside the valid range: ${validRange}`);
		this.name = 'SteamRangeError';
		this.quantity = quantity;
		this.value = value;
	}
}

function formatValue(value: number): string {
	return Number.isFinite(value) ? String(value) : `${value} (not a finite number)`;
}

/** Throws SteamRangeError unless min <= value <= max (and finite). Returns the value. */
export function inRange(
	quantity: string,
	value: number,
	min: number,
	max: number,
	unit: string
): number {
	if (!Number.isFinite(value) || value < min || value > max) {
		throw new SteamRangeError(quantity, value, `${min} to ${max} ${unit}`);
	}
	return value;
}
