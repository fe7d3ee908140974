/**
 * Building blocks shared by the site and finding schemas. Stored quantities are in the steam
 * engine's base units (p MPa absolute, T K, lengths m, mass flow kg/s); the forms convert at
 * the edges. Money is never a float: unit prices are decimal strings, amounts integer minor units.
 */
import { z } from 'zod';
import { NOMINAL_DNS, type NominalDn } from '../steam/vocabulary';
import type { Same } from './agrees';

/** A unit price as a decimal string: up to 12 whole digits and 6 decimals, no sign, no exponent. */
export const DECIMAL_PATTERN = /^\d{1,12}(\.\d{1,6})?$/;

export const decimalStringSchema = z
	.string({ error: 'Enter a price as a number, e.g. 12.50' })
	.trim()
	.regex(DECIMAL_PATTERN, {
		error: 'Enter a price as a plain number with up to 6 decimals, e.g. 12.50 (no sign, no commas)'
	});

/** An amount of money in integer minor units (cents, pence…), never negative. */
export const minorUnitsSchema = z
	.number({ error: 'Enter an amount of money' })
	.int({ error: 'Money is stored in whole minor units (e.g. cents): no fractions' })
	.nonnegative({ error: 'An amount of money cannot be negative' })
	.max(Number.MAX_SAFE_INTEGER, { error: 'That amount is too large' });

/** ISO 4217 alphabetic currency code. */
export const currencySchema = z
	.string({ error: 'Choose a currency' })
	.regex(/^[A-Z]{3}$/, { error: 'Currency must be a three-letter ISO 4217 code, e.g. USD or EUR' });

export const uuidSchema = z.uuid({ error: 'Must be a UUID' });

/** Absolute temperature in K within [min, max] (default −100 °C to 2000 °C, the IF97 ceiling). */
export function temperatureSchema(label: string, min = 173.15, max = 2273.15) {
	const range = `between ${min} K (${celsius(min)} °C) and ${max} K (${celsius(max)} °C)`;
	return z
		.number({ error: `${label} must be a number (kelvin)` })
		.min(min, { error: `${label} must be ${range}` })
		.max(max, { error: `${label} must be ${range}` });
}

function celsius(kelvin: number): string {
	return String(Math.round((kelvin - 273.15) * 100) / 100).replace('-', '−');
}

/** Absolute pressure in MPa, above 0 and up to `max` (default 100 MPa, the IF97 ceiling). */
export function pressureSchema(label: string, max = 100) {
	return z
		.number({ error: `${label} must be a number (MPa absolute)` })
		.positive({ error: `${label} must be greater than 0 MPa absolute` })
		.max(max, { error: `${label} must be at most ${max} MPa absolute` });
}

/**
 * Nominal pipe sizes: DN (ISO 6708) with the NPS designation of ASME B36.10M that shares
 * the outside diameter. DN is what we store; NPS is shown to US-customary users.
 */
export const NOMINAL_SIZES = [
	{ dn: 6, nps: '1/8' },
	{ dn: 8, nps: '1/4' },
	{ dn: 10, nps: '3/8' },
	{ dn: 15, nps: '1/2' },
	{ dn: 20, nps: '3/4' },
	{ dn: 25, nps: '1' },
	{ dn: 32, nps: '1-1/4' },
	{ dn: 40, nps: '1-1/2' },
	{ dn: 50, nps: '2' },
	{ dn: 65, nps: '2-1/2' },
	{ dn: 80, nps: '3' },
	{ dn: 90, nps: '3-1/2' },
	{ dn: 100, nps: '4' },
	{ dn: 125, nps: '5' },
	{ dn: 150, nps: '6' },
	{ dn: 200, nps: '8' },
	{ dn: 250, nps: '10' },
	{ dn: 300, nps: '12' },
	{ dn: 350, nps: '14' },
	{ dn: 400, nps: '16' },
	{ dn: 450, nps: '18' },
	{ dn: 500, nps: '20' },
	{ dn: 550, nps: '22' },
	{ dn: 600, nps: '24' }
] as const;

export type { NominalDn };
export type NominalNps = (typeof NOMINAL_SIZES)[number]['nps'];
// The engine's DN list and this table name the same sizes.
const _sameDns: Same<(typeof NOMINAL_SIZES)[number]['dn'], NominalDn> = true;

export const dnSchema = z.literal([...NOMINAL_DNS], { error: 'Choose a standard nominal size' });

/** The NPS designation for a DN, e.g. 15 → '1/2'. */
export function npsForDn(dn: NominalDn): NominalNps {
	return NOMINAL_SIZES.find((s) => s.dn === dn)!.nps;
}

/** The DN for an NPS designation, e.g. '1/2' → 15. */
export function dnForNps(nps: NominalNps): NominalDn {
	return NOMINAL_SIZES.find((s) => s.nps === nps)!.dn;
}
