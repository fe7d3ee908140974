/**
 * The Desk's cost basis form: the shared costBasisSchema's fields (fuel.kind, fuel.price,
 * fuel.unit, fuel.energyContent, boilerEfficiency, trapFactors.failedOpen…) as people type them —
 * percentages rather than fractions, °C or °F, water per m³ or per 1000 US gal — turned into the
 * stored basis here and then checked by costBasisSchema itself, so the Desk and the engine can
 * never disagree on what a valid basis is.
 */
import { z } from 'zod';
import { GAL_US_M3 } from '../units/constants';
import { fromBase, toBase, type UnitSystemId } from '../units/index';
import { isoCurrencySchema, measuredField, optionalText, shown } from './desk-sites';
import { costBasisSchema, FUEL_KINDS, FUEL_PRICE_UNITS, type CostBasis } from './site';
import { DECIMAL_PATTERN } from './common';

/** m³ in 1000 US gallons: US water is priced per thousand gallons. */
const KGAL_M3 = 1000 * GAL_US_M3;

export function basisUnits(units: UnitSystemId) {
	return units === 'US'
		? { temperature: 'degF' as const, temperatureLabel: '°F', water: '1000 US gal' }
		: { temperature: 'degC' as const, temperatureLabel: '°C', water: 'm³' };
}

const percent = (label: string, opts: { required?: boolean; aboveMin?: boolean; max?: number }) =>
	measuredField({
		label,
		unit: '%',
		min: 0,
		max: opts.max ?? 100,
		aboveMin: opts.aboveMin,
		required: opts.required,
		toBaseUnit: (v) => v / 100
	});

const priceText = (label: string) =>
	z
		.string({ error: `Enter the ${label}` })
		.trim()
		.min(1, { error: `Enter the ${label}` })
		.regex(DECIMAL_PATTERN, {
			error: `Enter the ${label} as a plain number with up to 6 decimals, e.g. 12.50 (no sign, no commas)`
		});

/** A price per m³ as a stored decimal string, from a price per the person's water unit. */
function waterPrice(text: string, units: UnitSystemId): string {
	if (units === 'SI') return text;
	return String(Number((Number(text) / KGAL_M3).toFixed(6)));
}

/** The cost basis form for a person working in `units`; its output is { basis, note }. */
export function costBasisFormSchema(units: UnitSystemId) {
	const u = basisUnits(units);
	const toK = (v: number) => toBase('temperature', v, u.temperature);
	const fromK = (k: number) => fromBase('temperature', k, u.temperature);
	return z
		.object({
			fuel: z.object({
				kind: z.enum(FUEL_KINDS, { error: 'Choose the fuel the boilers burn' }),
				price: priceText('fuel price'),
				unit: z.enum(FUEL_PRICE_UNITS, { error: 'Choose the unit the fuel is priced in' }),
				energyContent: measuredField({
					label: 'Energy content',
					unit: 'GJ per unit',
					min: 0,
					max: 1000,
					aboveMin: true
				})
			}),
			currency: isoCurrencySchema,
			boilerEfficiency: percent('Boiler efficiency', { required: true, aboveMin: true }),
			feedwaterTemperature: measuredField({
				label: 'Feedwater temperature',
				unit: u.temperatureLabel,
				min: fromK(273.15),
				max: fromK(523.15),
				required: true,
				toBaseUnit: toK
			}),
			condensateReturnFraction: percent('Condensate return', { required: true }),
			makeupWaterTemperature: measuredField({
				label: 'Makeup water temperature',
				unit: u.temperatureLabel,
				min: fromK(273.15),
				max: fromK(373.15),
				toBaseUnit: toK
			}),
			makeupWaterPrice: priceText('water price'),
			waterTreatmentPrice: priceText('water treatment cost'),
			operatingHours: measuredField({
				label: 'Operating hours',
				unit: 'h per year',
				min: 0,
				max: 8784,
				aboveMin: true,
				required: true
			}),
			emissionFactor: measuredField({
				label: 'Emission factor',
				unit: 'kg CO2 per GJ',
				min: 0,
				max: 1000
			}),
			trapFactors: z
				.object({
					failedOpen: percent('Failed-open blow-through', {}),
					leaking: percent('Leaking-trap share', {})
				})
				.optional(),
			discountRate: percent('Discount rate', { max: 99.99 }),
			lifeYears: measuredField({ label: 'Life', unit: 'years', min: 1, max: 50, integer: true }),
			note: optionalText(255, 'The note')
		})
		.transform((f) => {
			const trap = {
				...(f.trapFactors?.failedOpen === undefined
					? {}
					: { failedOpen: f.trapFactors.failedOpen }),
				...(f.trapFactors?.leaking === undefined ? {} : { leaking: f.trapFactors.leaking })
			};
			const basis = {
				fuel: {
					kind: f.fuel.kind,
					price: f.fuel.price,
					unit: f.fuel.unit,
					...(f.fuel.energyContent === undefined ? {} : { energyContent: f.fuel.energyContent })
				},
				currency: f.currency,
				boilerEfficiency: f.boilerEfficiency!,
				feedwaterTemperature: f.feedwaterTemperature!,
				condensateReturnFraction: f.condensateReturnFraction!,
				...(f.makeupWaterTemperature === undefined
					? {}
					: { makeupWaterTemperature: f.makeupWaterTemperature }),
				makeupWaterPrice: waterPrice(f.makeupWaterPrice, units),
				waterTreatmentPrice: waterPrice(f.waterTreatmentPrice, units),
				operatingHours: f.operatingHours!,
				...(f.emissionFactor === undefined ? {} : { emissionFactor: f.emissionFactor }),
				...(Object.keys(trap).length === 0 ? {} : { trapFactors: trap }),
				...(f.discountRate === undefined ? {} : { discountRate: f.discountRate }),
				...(f.lifeYears === undefined ? {} : { lifeYears: f.lifeYears })
			};
			return { basis: basis as CostBasis, note: f.note };
		})
		.superRefine(({ basis }, ctx) => {
			// The shared contract decides last (fuel and unit together, an emission factor where
			// there is no default…); its paths are the form's field names.
			const checked = costBasisSchema.safeParse(basis);
			if (checked.success) return;
			for (const issue of checked.error.issues) {
				ctx.addIssue({ code: 'custom', path: issue.path, message: issue.message });
			}
		});
}
export type CostBasisForm = z.output<ReturnType<typeof costBasisFormSchema>>;

/** Names of every field of the form, for keeping what was typed. */
export const COST_BASIS_FIELDS = [
	'fuel.kind',
	'fuel.price',
	'fuel.unit',
	'fuel.energyContent',
	'currency',
	'boilerEfficiency',
	'feedwaterTemperature',
	'condensateReturnFraction',
	'makeupWaterTemperature',
	'makeupWaterPrice',
	'waterTreatmentPrice',
	'operatingHours',
	'emissionFactor',
	'trapFactors.failedOpen',
	'trapFactors.leaking',
	'discountRate',
	'lifeYears',
	'note'
] as const;

const pct = (v: number | undefined) => (v === undefined ? '' : shown(v * 100, 2));

/** A stored basis as the form's text, in the person's units (the note starts empty). */
export function costBasisFormValues(basis: CostBasis, units: UnitSystemId): Record<string, string> {
	const u = basisUnits(units);
	const temp = (k: number | undefined) =>
		k === undefined ? '' : shown(fromBase('temperature', k, u.temperature), 1);
	const water = (text: string) =>
		units === 'SI' ? text : String(Number((Number(text) * KGAL_M3).toFixed(4)));
	return {
		'fuel.kind': basis.fuel.kind,
		'fuel.price': basis.fuel.price,
		'fuel.unit': basis.fuel.unit,
		'fuel.energyContent':
			basis.fuel.energyContent === undefined ? '' : shown(basis.fuel.energyContent, 6),
		currency: basis.currency,
		boilerEfficiency: pct(basis.boilerEfficiency),
		feedwaterTemperature: temp(basis.feedwaterTemperature),
		condensateReturnFraction: pct(basis.condensateReturnFraction),
		makeupWaterTemperature: temp(basis.makeupWaterTemperature),
		makeupWaterPrice: water(basis.makeupWaterPrice),
		waterTreatmentPrice: water(basis.waterTreatmentPrice),
		operatingHours: shown(basis.operatingHours, 0),
		emissionFactor: basis.emissionFactor === undefined ? '' : shown(basis.emissionFactor, 4),
		'trapFactors.failedOpen': pct(basis.trapFactors?.failedOpen),
		'trapFactors.leaking': pct(basis.trapFactors?.leaking),
		discountRate: pct(basis.discountRate),
		lifeYears: basis.lifeYears === undefined ? '' : String(basis.lifeYears),
		note: ''
	};
}
