/**
 * Money at the edges of the engine: results carry amounts as numbers in major units for
 * display and sums, and as integer minor units for storage, never as floats in storage.
 */

/**
 * ISO 4217 currencies whose minor unit is not 2 digits (ISO 4217 list; from memory).
 * Every other code has 2.
 */
const MINOR_DIGITS: Record<string, number> = {
	BIF: 0,
	CLP: 0,
	DJF: 0,
	GNF: 0,
	ISK: 0,
	JPY: 0,
	KMF: 0,
	KRW: 0,
	PYG: 0,
	RWF: 0,
	UGX: 0,
	UYI: 0,
	VND: 0,
	VUV: 0,
	XAF: 0,
	XOF: 0,
	XPF: 0,
	BHD: 3,
	IQD: 3,
	JOD: 3,
	KWD: 3,
	LYD: 3,
	OMR: 3,
	TND: 3,
	CLF: 4,
	UYW: 4
};

/** Digits of the currency's minor unit, e.g. USD 2, JPY 0, KWD 3. */
export function minorUnitDigits(currency: string): number {
	if (!/^[A-Z]{3}$/.test(currency)) {
		throw new Error(`Currency must be a three-letter ISO 4217 code, got "${currency}"`);
	}
	return MINOR_DIGITS[currency] ?? 2;
}

/** Rounds an amount in major units to whole minor units (half away from zero). */
export function toMinorUnits(amount: number, currency: string): number {
	if (!Number.isFinite(amount)) {
		throw new Error(`An amount of money must be a finite number, got ${amount}`);
	}
	const scaled = amount * 10 ** minorUnitDigits(currency);
	// Math.round rounds −2.5 to −2; money rounds half away from zero.
	const minor = Math.sign(scaled) * Math.round(Math.abs(scaled));
	if (!Number.isSafeInteger(minor)) throw new Error(`The amount ${amount} is too large`);
	return minor === 0 ? 0 : minor;
}

/** Integer minor units back to a number in major units. */
export function fromMinorUnits(minor: number, currency: string): number {
	if (!Number.isSafeInteger(minor)) {
		throw new Error(`Minor units must be a whole number, got ${minor}`);
	}
	return minor / 10 ** minorUnitDigits(currency);
}

/** An amount per year as both forms. */
export interface Money {
	/** Major units (e.g. dollars), for display and ranking. */
	amount: number;
	/** Integer minor units (e.g. cents), for storage. */
	minor: number;
	currency: string;
}

export function money(amount: number, currency: string): Money {
	return { amount, minor: toMinorUnits(amount, currency), currency };
}
