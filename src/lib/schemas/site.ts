/**
 * A site's cost basis (what turns steam and heat into money and CO2) and its header list.
 * Stored as JSON on the server, edited on the Desk, read by the engine's evaluateFinding.
 */
import { z } from 'zod';
import {
	currencySchema,
	decimalStringSchema,
	pressureSchema,
	temperatureSchema,
	uuidSchema
} from './common';
import { defaultEnergyContent, FUELS } from '../steam/losses/fuels';
import type {
	CostBasis as EngineCostBasis,
	Fuel as EngineFuel,
	Header as EngineHeader,
	TrapFactors as EngineTrapFactors
} from '../steam/losses/inputs';
import {
	ENERGY_PRICE_UNITS,
	FUEL_KINDS,
	FUEL_PRICE_UNITS,
	QUANTITY_PRICE_UNITS,
	type EnergyPriceUnit,
	type FuelKind,
	type FuelPriceUnit,
	type QuantityPriceUnit
} from '../steam/vocabulary';
import type { Agrees } from './agrees';

export { ENERGY_PRICE_UNITS, FUEL_KINDS, FUEL_PRICE_UNITS, QUANTITY_PRICE_UNITS };
export type { EnergyPriceUnit, FuelKind, FuelPriceUnit, QuantityPriceUnit };

/** The words people read for each fuel (the engine's own names for them). */
export const FUEL_KIND_LABELS: Record<FuelKind, string> = Object.fromEntries(
	FUEL_KINDS.map((kind) => [kind, FUELS[kind].label])
) as Record<FuelKind, string>;

/** The words people read for each price unit. */
export const FUEL_PRICE_UNIT_LABELS: Record<FuelPriceUnit, string> = {
	GJ: 'GJ',
	MMBtu: 'MMBtu',
	therm: 'therm',
	kWh: 'kWh',
	MWh: 'MWh',
	m3: 'm³',
	Mcf: 'Mcf (thousand cubic feet)',
	L: 'litre',
	'US-gal': 'US gallon',
	kg: 'kg',
	t: 'tonne',
	'short-ton': 'short ton'
};

/** Which quantity units make sense for each fuel (any energy unit always does). */
export const QUANTITY_UNITS_BY_FUEL: Record<FuelKind, readonly QuantityPriceUnit[]> = {
	'natural-gas': ['m3', 'Mcf'],
	'fuel-oil-2': ['L', 'US-gal', 'm3', 'kg', 't'],
	'fuel-oil-6': ['L', 'US-gal', 'm3', 'kg', 't'],
	lpg: ['L', 'US-gal', 'kg', 't'],
	coal: ['kg', 't', 'short-ton'],
	biomass: ['kg', 't', 'short-ton'],
	electricity: [],
	custom: QUANTITY_PRICE_UNITS
};

const ENERGY_UNIT_SET = new Set<string>(ENERGY_PRICE_UNITS);

export function isEnergyPriceUnit(unit: FuelPriceUnit): unit is EnergyPriceUnit {
	return ENERGY_UNIT_SET.has(unit);
}

export const fuelSchema = z
	.object({
		kind: z.enum(FUEL_KINDS, { error: 'Choose the fuel the boilers burn' }),
		/** Price per `unit`, in the cost basis currency. */
		price: decimalStringSchema,
		unit: z.enum(FUEL_PRICE_UNITS, { error: 'Choose the unit the fuel is priced in' }),
		/**
		 * Energy content in GJ per priced unit (higher heating value), overriding the fuel's
		 * default. Required for a quantity unit without a published default (custom fuels,
		 * coal and biomass per mass, oils per mass).
		 */
		energyContent: z
			.number({ error: 'Energy content must be a number (GJ per unit)' })
			.positive({ error: 'Energy content must be greater than 0 GJ per unit' })
			.max(1000, { error: 'Energy content must be at most 1000 GJ per unit' })
			.optional()
	})
	.superRefine((fuel, ctx) => {
		if (isEnergyPriceUnit(fuel.unit)) return;
		const fuelName = FUEL_KIND_LABELS[fuel.kind];
		const unitName = FUEL_PRICE_UNIT_LABELS[fuel.unit];
		if (!QUANTITY_UNITS_BY_FUEL[fuel.kind].includes(fuel.unit)) {
			const allowed = [...ENERGY_PRICE_UNITS, ...QUANTITY_UNITS_BY_FUEL[fuel.kind]].map(
				(unit) => FUEL_PRICE_UNIT_LABELS[unit]
			);
			ctx.addIssue({
				code: 'custom',
				path: ['unit'],
				message: `${fuelName} cannot be priced per ${unitName}: choose ${allowed.slice(0, -1).join(', ')} or ${allowed.at(-1)}`
			});
		}
		if (fuel.energyContent === undefined && defaultEnergyContent(fuel.kind, fuel.unit) === null) {
			ctx.addIssue({
				code: 'custom',
				path: ['energyContent'],
				message: `There is no standard energy content for ${fuelName.toLowerCase()} per ${unitName}: enter it in GJ per ${unitName}`
			});
		}
	});
export type Fuel = z.infer<typeof fuelSchema>;
const _fuel: Agrees<typeof fuelSchema, EngineFuel> = true;

const fraction = (label: string) =>
	z
		.number({ error: `${label} must be a number between 0 and 1` })
		.min(0, { error: `${label} must be between 0 and 1` })
		.max(1, { error: `${label} must be between 0 and 1` });

/** Per-site overrides of the trap loss factors (defaults and their sources live in the engine). */
export const trapFactorsSchema = z.object({
	/** Share of the full orifice flow that blows through a trap failed open. */
	failedOpen: fraction('Failed-open blow-through factor').optional(),
	/** Share of the full orifice flow that passes a leaking trap. */
	leaking: fraction('Leaking-trap fraction').optional()
});
export type TrapFactors = z.infer<typeof trapFactorsSchema>;
const _trapFactors: Agrees<typeof trapFactorsSchema, EngineTrapFactors> = true;

export const costBasisSchema = z
	.object({
		fuel: fuelSchema,
		currency: currencySchema,
		/** Fuel-to-steam efficiency, (0, 1]. */
		boilerEfficiency: z
			.number({ error: 'Boiler efficiency must be a number between 0 and 1, e.g. 0.8' })
			.gt(0, { error: 'Boiler efficiency must be greater than 0 (e.g. 0.8 for 80 %)' })
			.max(1, { error: 'Boiler efficiency cannot exceed 1 (100 %); enter 0.8 for 80 %' }),
		/** Feedwater temperature entering the boiler, K. */
		feedwaterTemperature: temperatureSchema('Feedwater temperature', 273.15, 523.15),
		/** Share of the steam's mass that comes back as condensate, [0, 1]. */
		condensateReturnFraction: fraction('Condensate return fraction'),
		/** Makeup (cold) water temperature, K; when set, unreturned water is charged its heating. */
		makeupWaterTemperature: temperatureSchema(
			'Makeup water temperature',
			273.15,
			373.15
		).optional(),
		/** Makeup water price per m³, in the cost basis currency. */
		makeupWaterPrice: decimalStringSchema,
		/** Water treatment (chemicals, softening, blowdown) per m³ of makeup water. */
		waterTreatmentPrice: decimalStringSchema,
		/** Hours per year the steam system is live, (0, 8784]. */
		operatingHours: z
			.number({ error: 'Operating hours must be a number of hours per year' })
			.gt(0, { error: 'Operating hours must be greater than 0 h per year' })
			.max(8784, { error: 'Operating hours cannot exceed 8784 h per year (a leap year)' }),
		/** kg CO2 per GJ of fuel (higher heating value); defaults by fuel; required for electricity and custom. */
		emissionFactor: z
			.number({ error: 'Emission factor must be a number (kg CO2 per GJ of fuel)' })
			.min(0, { error: 'Emission factor cannot be negative' })
			.max(1000, { error: 'Emission factor must be at most 1000 kg CO2 per GJ' })
			.optional(),
		/** Site atmospheric pressure, MPa absolute, for gauge readings. Wins over elevation. */
		atmosphericPressure: z
			.number({ error: 'Atmospheric pressure must be a number (MPa absolute)' })
			.min(0.05, { error: 'Atmospheric pressure must be at least 0.05 MPa (500 mbar)' })
			.max(0.11, { error: 'Atmospheric pressure must be at most 0.11 MPa (1100 mbar)' })
			.optional(),
		/** Site elevation above sea level, m, used for atmospheric pressure when no pressure is given. */
		elevation: z
			.number({ error: 'Elevation must be a number of metres' })
			.min(-500, { error: 'Elevation must be at least −500 m' })
			.max(5000, { error: 'Elevation must be at most 5000 m' })
			.optional(),
		trapFactors: trapFactorsSchema.optional(),
		/** For NPV: discount rate per year [0, 1) and the life of a repair in years. */
		discountRate: z
			.number({ error: 'Discount rate must be a number, e.g. 0.08 for 8 %' })
			.min(0, { error: 'Discount rate cannot be negative' })
			.lt(1, { error: 'Discount rate must be below 1 (100 %); enter 0.08 for 8 %' })
			.optional(),
		lifeYears: z
			.number({ error: 'Life must be a whole number of years' })
			.int({ error: 'Life must be a whole number of years' })
			.min(1, { error: 'Life must be at least 1 year' })
			.max(50, { error: 'Life must be at most 50 years' })
			.optional()
	})
	.superRefine((basis, ctx) => {
		const kind = basis.fuel.kind;
		if ((kind === 'electricity' || kind === 'custom') && basis.emissionFactor === undefined) {
			ctx.addIssue({
				code: 'custom',
				path: ['emissionFactor'],
				message: `Enter an emission factor for ${kind === 'electricity' ? 'electricity (your grid or supplier factor)' : 'a custom fuel'}, in kg CO2 per GJ`
			});
		}
	});
export type CostBasis = z.infer<typeof costBasisSchema>;
const _costBasis: Agrees<typeof costBasisSchema, EngineCostBasis> = true;

export const headerSchema = z.object({
	id: uuidSchema,
	name: z
		.string({ error: 'Give the header a name' })
		.trim()
		.min(1, { error: 'Give the header a name' })
		.max(80, { error: 'Header name must be at most 80 characters' }),
	/** Line pressure, MPa absolute (the Desk converts from gauge with the site's atmosphere). */
	pressure: pressureSchema('Header pressure', 22),
	/** Design steam temperature for superheated headers, K; absent for saturated headers. */
	designTemperature: temperatureSchema('Design temperature', 273.16, 1073.15).optional(),
	/** Hours per year this header is live, where it differs from the site's. */
	operatingHours: z
		.number({ error: 'Header operating hours must be a number of hours per year' })
		.gt(0, { error: 'Header operating hours must be greater than 0 h per year' })
		.max(8784, { error: 'Header operating hours cannot exceed 8784 h per year (a leap year)' })
		.optional()
});
export type Header = z.infer<typeof headerSchema>;
const _header: Agrees<typeof headerSchema, EngineHeader> = true;

export const headerListSchema = z.array(headerSchema).superRefine((headers, ctx) => {
	const ids = new Set<string>();
	const names = new Set<string>();
	headers.forEach((header, i) => {
		if (ids.has(header.id)) {
			ctx.addIssue({ code: 'custom', path: [i, 'id'], message: 'Two headers share one id' });
		}
		const name = header.name.toLowerCase();
		if (names.has(name)) {
			ctx.addIssue({
				code: 'custom',
				path: [i, 'name'],
				message: `Another header is already called “${header.name}”`
			});
		}
		ids.add(header.id);
		names.add(name);
	});
});
export type HeaderList = z.infer<typeof headerListSchema>;

/** What the engine needs from a site to price a finding. */
export const siteBasisSchema = z.object({
	costBasis: costBasisSchema,
	headers: headerListSchema
});
export type SiteBasis = z.infer<typeof siteBasisSchema>;
