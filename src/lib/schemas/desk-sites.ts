/**
 * The Desk's forms for clients, sites, headers and areas, read as the person typed them (text in
 * their own units: mbar or psia, m or ft, bar g or psig, °C or °F) and turned into the engine's
 * base units here, at the edge. Every message names the person's unit, so what they read matches
 * what they typed. The header form is in ./desk-headers.ts, the cost basis form in
 * ./desk-cost-basis.ts.
 */
import { z } from 'zod';
import { fromBase, toBase, type UnitSystemId } from '../units/index';
import { nameSchema } from './names';
import { unitSystems } from './roles';

/** ISO 4217 codes the runtime knows (ICU's list, the same in Node and every current browser). */
const ISO_CURRENCIES: ReadonlySet<string> = new Set(Intl.supportedValuesOf('currency'));

/** An ISO 4217 alphabetic code the world uses, upper-cased as typed in any case. */
export const isoCurrencySchema = z
	.string({ error: 'Enter the currency as a three-letter code, e.g. EUR or USD' })
	.trim()
	.toUpperCase()
	.refine((code) => /^[A-Z]{3}$/.test(code), {
		error: 'Enter the currency as a three-letter ISO 4217 code, e.g. EUR or USD'
	})
	.refine((code) => ISO_CURRENCIES.has(code), {
		error: 'That is not an ISO 4217 currency code; use one such as EUR, GBP or USD'
	});

/** Optional free text: blank is null. */
export const optionalText = (max: number, label: string) =>
	z
		.string()
		.trim()
		.max(max, { error: `${label} must be at most ${max} characters` })
		.optional()
		.transform((v) => (v ? v : null));

const requiredText = (max: number, missing: string, label: string) =>
	z
		.string({ error: missing })
		.trim()
		.min(1, { error: missing })
		.max(max, { error: `${label} must be at most ${max} characters` });

/** A typed number ("12.5", "12,5", " 12 "), or undefined for a blank field. */
export function readNumber(text: string | undefined): number | undefined {
	const t = (text ?? '').trim().replace(/\s/g, '');
	if (t === '') return undefined;
	const normal = /^[+-]?\d+,\d+$/.test(t) ? t.replace(',', '.') : t;
	return /^[+-]?(\d+\.?\d*|\.\d+)$/.test(normal) ? Number(normal) : NaN;
}

/** Shown in messages and fields: at most `decimals` decimals, no trailing zeros. */
export function shown(value: number, decimals = 3): string {
	return String(Number(value.toFixed(decimals))).replace('-', '−');
}

/**
 * A number field in the person's unit: `required` or optional, inside [min, max] of that unit
 * (inclusive), converted to the base unit by `toBaseUnit`.
 */
export function measuredField(opts: {
	label: string;
	unit: string;
	min: number;
	max: number;
	required?: boolean;
	/** Exclusive lower bound (e.g. more than 0 %). */
	aboveMin?: boolean;
	integer?: boolean;
	toBaseUnit?: (v: number) => number;
}) {
	const { label, unit, min, max } = opts;
	const u = unit ? ` ${unit}` : '';
	const range = `${opts.aboveMin ? 'more than' : 'from'} ${shown(min)}${u} ${opts.aboveMin ? 'and up to' : 'to'} ${shown(max)}${u}`;
	return z
		.string()
		.optional()
		.transform((text, ctx) => {
			const n = readNumber(text);
			if (n === undefined) {
				if (opts.required) ctx.addIssue({ code: 'custom', message: `Enter the ${lower(label)}` });
				return undefined;
			}
			if (Number.isNaN(n)) {
				ctx.addIssue({ code: 'custom', message: `${label} must be a number${u ? ` in${u}` : ''}` });
				return undefined;
			}
			const below = opts.aboveMin ? n <= min : n < min;
			if (below || n > max) {
				ctx.addIssue({ code: 'custom', message: `${label} must be ${range}` });
				return undefined;
			}
			if (opts.integer && !Number.isInteger(n)) {
				ctx.addIssue({ code: 'custom', message: `${label} must be a whole number` });
				return undefined;
			}
			return opts.toBaseUnit ? opts.toBaseUnit(n) : n;
		});
}

const lower = (label: string) => label.charAt(0).toLowerCase() + label.slice(1);

export const unitSystemSchema = z.enum(unitSystems, { error: 'Choose SI or US customary units' });

export const clientFormSchema = z.object({
	name: nameSchema(160, 'Give the client company a name', 'The name'),
	contactEmail: z
		.string()
		.trim()
		.optional()
		.transform((v) => v || null)
		.pipe(
			z
				.email({
					error: 'Enter an e-mail address such as engineering@plant.example, or leave it blank'
				})
				.max(254, { error: 'The e-mail address must be at most 254 characters' })
				.nullable()
		),
	notes: optionalText(4000, 'Notes')
});
export type ClientForm = z.output<typeof clientFormSchema>;

/** The person's units for the site's atmosphere fields. */
export function atmosphereUnits(units: UnitSystemId) {
	return units === 'US'
		? { elevation: 'ft', pressure: 'psia' }
		: { elevation: 'm', pressure: 'mbar' };
}

/** Site elevation and measured atmosphere limits (costBasisSchema's, in base units). */
const ELEVATION_M = { min: -500, max: 5000 };
const ATMOSPHERE_MPA = { min: 0.05, max: 0.11 };

const pressureFromPerson = (units: UnitSystemId) => (v: number) =>
	units === 'US' ? toBase('pressure', v, 'psia') : toBase('pressure', v / 1000, 'bar_a');
const pressureToPerson = (units: UnitSystemId) => (mpa: number) =>
	units === 'US' ? fromBase('pressure', mpa, 'psia') : fromBase('pressure', mpa, 'bar_a') * 1000;
const lengthFromPerson = (units: UnitSystemId) => (v: number) =>
	units === 'US' ? toBase('length', v, 'ft') : v;
const lengthToPerson = (units: UnitSystemId) => (m: number) =>
	units === 'US' ? fromBase('length', m, 'ft') : m;

/** Name, address, atmosphere (elevation or a measured pressure), units and currency of a site. */
export function siteFormSchema(units: UnitSystemId) {
	const u = atmosphereUnits(units);
	const toP = pressureToPerson(units);
	const toL = lengthToPerson(units);
	return z.object({
		name: requiredText(160, 'Give the site a name', 'The name'),
		address: optionalText(2000, 'The address'),
		elevation: measuredField({
			label: 'Elevation',
			unit: u.elevation,
			min: toL(ELEVATION_M.min),
			max: toL(ELEVATION_M.max),
			toBaseUnit: lengthFromPerson(units)
		}),
		atmosphericPressure: measuredField({
			label: 'Measured atmospheric pressure',
			unit: u.pressure,
			min: toP(ATMOSPHERE_MPA.min),
			max: toP(ATMOSPHERE_MPA.max),
			toBaseUnit: pressureFromPerson(units)
		}),
		unitSystem: unitSystemSchema,
		currency: isoCurrencySchema
	});
}
export type SiteForm = z.output<ReturnType<typeof siteFormSchema>>;

/** A site's stored facts as the form's text, in the person's units. */
export function siteFormValues(
	site: {
		name: string;
		address: string | null;
		elevation: number | null;
		atmosphericPressure: number | null;
		unitSystem: string;
		currency: string;
	},
	units: UnitSystemId
): Record<string, string> {
	return {
		name: site.name,
		address: site.address ?? '',
		elevation: site.elevation === null ? '' : shown(lengthToPerson(units)(site.elevation), 1),
		atmosphericPressure:
			site.atmosphericPressure === null
				? ''
				: shown(pressureToPerson(units)(site.atmosphericPressure), units === 'US' ? 3 : 1),
		unitSystem: site.unitSystem,
		currency: site.currency
	};
}

export const areaFormSchema = z.object({
	name: requiredText(120, 'Give the area a name', 'The name')
});
export const areaIdSchema = z.object({ areaId: z.uuid({ error: 'Choose an area' }) });
export const areaRenameSchema = areaFormSchema.extend(areaIdSchema.shape);
export const headerIdSchema = z.object({ headerId: z.uuid({ error: 'Choose a header' }) });
