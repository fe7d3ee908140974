import { UnitError, describeValue } from './errors';

/** Options for formatting a plain number. */
export interface NumberFormatOptions {
	/** Significant figures, 1 to 21. Default 3. */
	sigFigs?: number;
	/**
	 * BCP 47 locale(s) for Intl.NumberFormat: decimal mark and digit grouping. Default
	 * 'en-US', fixed so that server-rendered and browser-rendered text agree.
	 */
	locale?: string | readonly string[];
	/** Keep trailing zeros to show the precision (12.0 rather than 12). Default false. */
	keepTrailingZeros?: boolean;
	/** Group thousands ("12,300"). Default true; the locale decides the separator. */
	grouping?: boolean;
}

/** Default locale for formatting; fixed so server and browser render the same text. */
export const DEFAULT_LOCALE = 'en-US';

/**
 * Magnitudes shown in plain notation; outside this band (after rounding) scientific notation
 * ("1.23E-6") is clearer than a long run of zeros.
 */
const PLAIN_MIN = 1e-4;
const PLAIN_MAX = 1e15;

function checkSigFigs(sigFigs: number): number {
	if (!Number.isInteger(sigFigs) || sigFigs < 1 || sigFigs > 21) {
		throw new UnitError(
			`Significant figures ${describeValue(sigFigs)} must be a whole number from 1 to 21`,
			'',
			sigFigs
		);
	}
	return sigFigs;
}

/**
 * Rounds to a number of significant figures: roundToSignificant(1234.5, 3) = 1230.
 * Rounds the number's exact binary value to the nearest, ties away from zero (so 1.005,
 * stored as 1.00499…, gives 1.00).
 *
 * @throws UnitError for a non-finite value or sigFigs outside 1..21
 */
export function roundToSignificant(value: number, sigFigs = 3): number {
	checkSigFigs(sigFigs);
	if (typeof value !== 'number' || !Number.isFinite(value)) {
		throw new UnitError(`Cannot round ${describeValue(value)}`, '', value);
	}
	if (value === 0) return 0;
	// toPrecision rounds the exact binary value; its decimal string parses back exactly.
	return Number(value.toPrecision(sigFigs));
}

/**
 * Formats a number to significant figures for people: formatSignificant(12345.6) =
 * "12,300", formatSignificant(0.012345) = "0.0123", formatSignificant(12) = "12".
 * Plain notation for everyday magnitudes, scientific only below 1e-4 or from 1e15 up.
 *
 * @throws UnitError for a non-finite value or sigFigs outside 1..21
 */
export function formatSignificant(value: number, options: NumberFormatOptions = {}): string {
	const sigFigs = checkSigFigs(options.sigFigs ?? 3);
	if (typeof value !== 'number' || !Number.isFinite(value)) {
		throw new UnitError(`Cannot format ${describeValue(value)}`, '', value);
	}
	// Decide the notation on the rounded magnitude, so 0.000099996 → "0.0001", not "1.00E-4".
	const rounded = roundToSignificant(value, sigFigs);
	const magnitude = Math.abs(rounded);
	const plain = magnitude === 0 || (magnitude >= PLAIN_MIN && magnitude < PLAIN_MAX);
	return formatterFor(options, sigFigs, plain).format(rounded);
}

/** Building an Intl.NumberFormat costs far more than using one: keep them per option set. */
const formatters = new Map<string, Intl.NumberFormat>();

/** An Intl.NumberFormat for these options, made once (money, counts, figures on every row). */
export function numberFormat(
	locale: string | readonly string[],
	options: Intl.NumberFormatOptions
): Intl.NumberFormat {
	const key = JSON.stringify([locale, options]);
	let format = formatters.get(key);
	if (!format) {
		format = new Intl.NumberFormat(locale as string | string[], options);
		// Option sets in use are few; the bound only guards against a caller varying them freely.
		if (formatters.size >= 64) formatters.clear();
		formatters.set(key, format);
	}
	return format;
}

function formatterFor(options: NumberFormatOptions, sigFigs: number, plain: boolean) {
	const locale = (options.locale as string | string[] | undefined) ?? DEFAULT_LOCALE;
	const keepZeros = options.keepTrailingZeros === true;
	const grouping = options.grouping !== false;
	return numberFormat(locale, {
		notation: plain ? 'standard' : 'scientific',
		maximumSignificantDigits: sigFigs,
		minimumSignificantDigits: keepZeros ? sigFigs : 1,
		// 'auto' follows the locale's own rule (Spanish does not group four-digit numbers).
		useGrouping: grouping ? 'auto' : false,
		// A value that rounds to zero reads "0", never "-0".
		signDisplay: 'negative'
	});
}
