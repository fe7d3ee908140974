/**
 * The stored ids the engine prices by: finding kinds, trap types and conditions, leak size
 * classes and components, insulation items, materials and states, nominal sizes, fuels and
 * the units a fuel is priced in. The engine owns them; src/lib/schemas re-exports them and
 * adds the words people read (`*_LABELS`), so the ids have one home and no cycle.
 */

export const FINDING_KINDS = ['trap', 'leak', 'insulation', 'header'] as const;
export type FindingKind = (typeof FINDING_KINDS)[number];

export const TRAP_TYPES = [
	'thermodynamic',
	'float-thermostatic',
	'inverted-bucket',
	'thermostatic',
	'bimetallic',
	'fixed-orifice',
	'other'
] as const;
export type TrapType = (typeof TRAP_TYPES)[number];

export const TRAP_CONDITIONS = [
	'working',
	'leaking',
	'failed-open',
	'failed-closed',
	'flooded',
	'out-of-service',
	'not-accessible'
] as const;
export type TrapCondition = (typeof TRAP_CONDITIONS)[number];

export const TRAP_DISCHARGES = ['atmosphere', 'condensate-return'] as const;
export type TrapDischarge = (typeof TRAP_DISCHARGES)[number];

export const TRAP_TEST_METHODS = ['ultrasound', 'temperature', 'visual', 'combined'] as const;
export type TrapTestMethod = (typeof TRAP_TEST_METHODS)[number];

/** Leak size classes by what the auditor sees; losses/leaks.ts maps each to a hole diameter. */
export const LEAK_SIZE_CLASSES = ['pinhole', 'small', 'medium', 'large', 'very-large'] as const;
export type LeakSizeClass = (typeof LEAK_SIZE_CLASSES)[number];

/** Where on the line a leak is. */
export const LEAK_COMPONENTS = ['valve-stem', 'flange', 'fitting', 'pipe', 'other'] as const;
export type LeakComponent = (typeof LEAK_COMPONENTS)[number];

export const INSULATION_ITEMS = ['pipe', 'valve', 'flange-pair', 'surface'] as const;
export type InsulationItem = (typeof INSULATION_ITEMS)[number];

export const INSULATION_MATERIALS = ['mineral-wool', 'calcium-silicate', 'cellular-glass'] as const;
export type InsulationMaterialName = (typeof INSULATION_MATERIALS)[number];

/** What the auditor found on the surface today. */
export const INSULATION_STATES = ['bare', 'damaged', 'wet'] as const;
export type InsulationState = (typeof INSULATION_STATES)[number];

/** Nominal pipe sizes (DN, ISO 6708) a finding may name. */
export const NOMINAL_DNS = [
	6, 8, 10, 15, 20, 25, 32, 40, 50, 65, 80, 90, 100, 125, 150, 200, 250, 300, 350, 400, 450, 500,
	550, 600
] as const;
export type NominalDn = (typeof NOMINAL_DNS)[number];

export const FUEL_KINDS = [
	'natural-gas',
	'fuel-oil-2',
	'fuel-oil-6',
	'lpg',
	'coal',
	'biomass',
	'electricity',
	'custom'
] as const;
export type FuelKind = (typeof FUEL_KINDS)[number];

/** Units a fuel can be priced in: energy units suit every fuel; the others suit some. */
export const ENERGY_PRICE_UNITS = ['GJ', 'MMBtu', 'therm', 'kWh', 'MWh'] as const;
export const QUANTITY_PRICE_UNITS = ['m3', 'Mcf', 'L', 'US-gal', 'kg', 't', 'short-ton'] as const;
export const FUEL_PRICE_UNITS = [...ENERGY_PRICE_UNITS, ...QUANTITY_PRICE_UNITS] as const;
export type EnergyPriceUnit = (typeof ENERGY_PRICE_UNITS)[number];
export type QuantityPriceUnit = (typeof QUANTITY_PRICE_UNITS)[number];
export type FuelPriceUnit = (typeof FUEL_PRICE_UNITS)[number];
