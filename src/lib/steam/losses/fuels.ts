/**
 * Fuels: energy per priced unit and default CO2 emission factors. Energies are higher heating
 * values (HHV), the basis of the US EPA and 40 CFR 98 factors used here, so fuel energy,
 * price per GJ and emissions stay on one basis.
 */
import type { EnergyPriceUnit, FuelKind, FuelPriceUnit, QuantityPriceUnit } from '../vocabulary';
import { BTU_IT_J, FT_M, GAL_US_M3, THERM_J } from '../../units/constants';
import type { CostBasis, Fuel } from './inputs';
import type { Sourced } from './sourced';

/** GJ in one MMBtu (International Table Btu, exact: NIST SP 811 B.8). */
export const MMBTU_GJ = (1e6 * BTU_IT_J) / 1e9;

const NIST = 'NIST SP 811 (2008) Appendix B.8, exact';

/** GJ per energy unit a fuel can be priced in. */
export const ENERGY_UNIT_GJ: Record<EnergyPriceUnit, number> = {
	GJ: 1,
	MMBtu: MMBTU_GJ,
	therm: THERM_J / 1e9,
	kWh: 0.0036,
	MWh: 3.6
};

const EPA_HUB = 'US EPA GHG Emission Factors Hub (2024), Table 1';
const CFR_C1 = '40 CFR Part 98 Subpart C, Table C-1 (as amended, 81 FR 89188, 2016)';

/** Standard cubic foot (60 °F, 1 atm) in m³. */
const SCF_M3 = FT_M ** 3;
const LITRE_M3 = 0.001;

function perGallon(mmbtuPerGallon: number, source: string) {
	const gjPerM3 = (mmbtuPerGallon * MMBTU_GJ) / GAL_US_M3;
	return {
		'US-gal': { value: mmbtuPerGallon * MMBTU_GJ, unit: 'GJ/US gal', source },
		L: { value: gjPerM3 * LITRE_M3, unit: 'GJ/L', source: `${source}, per US gallon converted` },
		m3: { value: gjPerM3, unit: 'GJ/m³', source: `${source}, per US gallon converted` }
	};
}

function perMmbtu(kgPerMmbtu: number, source: string): Sourced {
	return {
		value: kgPerMmbtu / MMBTU_GJ,
		unit: 'kg CO2/GJ',
		source: `${source}: ${kgPerMmbtu} kg CO2/MMBtu (HHV)`
	};
}

interface FuelData {
	label: string;
	emissionFactor: Sourced | null;
	energyContent: Partial<Record<QuantityPriceUnit, Sourced>>;
}

/**
 * Defaults per fuel. Coal and biomass have no default energy per tonne: rank and moisture move
 * it by a factor of two, so the site must enter it (or price the fuel per unit of energy).
 */
export const FUELS: Record<FuelKind, FuelData> = {
	'natural-gas': {
		label: 'Natural gas',
		emissionFactor: perMmbtu(53.06, EPA_HUB),
		energyContent: {
			Mcf: { value: 1.026 * MMBTU_GJ, unit: 'GJ/Mcf', source: `${EPA_HUB}: 0.001026 MMBtu/scf` },
			// A cubic metre at the same 60 °F, 1 atm reference as the standard cubic foot.
			m3: {
				value: (0.001026 * MMBTU_GJ) / SCF_M3,
				unit: 'GJ/m³ (60 °F, 1 atm)',
				source: `${EPA_HUB}: 0.001026 MMBtu/scf, converted per m³ at 60 °F`
			}
		}
	},
	'fuel-oil-2': {
		label: 'Fuel oil No. 2 (distillate)',
		emissionFactor: perMmbtu(73.96, CFR_C1),
		energyContent: perGallon(0.138, `${CFR_C1}: 0.138 MMBtu/gal`)
	},
	'fuel-oil-6': {
		label: 'Fuel oil No. 6 (residual)',
		emissionFactor: perMmbtu(75.1, CFR_C1),
		energyContent: perGallon(0.15, `${CFR_C1}: 0.150 MMBtu/gal`)
	},
	lpg: {
		label: 'LPG (propane)',
		// Liquid propane's row, so the factor and the heat per gallon are on one basis (the
		// table's "propane gas", 61.46 per scf, is for gas metered as gas).
		emissionFactor: perMmbtu(62.87, `${CFR_C1}, propane`),
		energyContent: perGallon(0.091, `${CFR_C1}, propane: 0.091 MMBtu/gal`)
	},
	coal: {
		label: 'Coal (bituminous)',
		emissionFactor: perMmbtu(93.28, `${EPA_HUB}, bituminous coal`),
		energyContent: {}
	},
	biomass: {
		label: 'Biomass (wood and wood residuals)',
		// Biogenic CO2: reported apart from fossil CO2 in most inventories.
		emissionFactor: perMmbtu(93.8, `${EPA_HUB}, wood and wood residuals (biogenic CO2)`),
		energyContent: {}
	},
	electricity: { label: 'Electricity', emissionFactor: null, energyContent: {} },
	custom: { label: 'Custom fuel', emissionFactor: null, energyContent: {} }
};

export function isEnergyUnit(unit: FuelPriceUnit): unit is EnergyPriceUnit {
	return unit in ENERGY_UNIT_GJ;
}

/** The default GJ per priced unit for a fuel, or null when the site must enter it. */
export function defaultEnergyContent(kind: FuelKind, unit: FuelPriceUnit): Sourced | null {
	if (isEnergyUnit(unit)) return { value: ENERGY_UNIT_GJ[unit], unit: `GJ/${unit}`, source: NIST };
	return FUELS[kind].energyContent[unit] ?? null;
}

/**
 * Energy in one priced unit of the fuel, GJ: the site's own value when given, otherwise the
 * default. Throws when neither exists.
 */
export function energyPerPriceUnit(fuel: Fuel): Sourced {
	if (fuel.energyContent !== undefined && !isEnergyUnit(fuel.unit)) {
		return { value: fuel.energyContent, unit: `GJ/${fuel.unit}`, source: 'site cost basis' };
	}
	const found = defaultEnergyContent(fuel.kind, fuel.unit);
	if (found === null) {
		throw new Error(
			`No default energy content for ${FUELS[fuel.kind].label} priced per ${fuel.unit}: enter it in GJ per ${fuel.unit} in the cost basis`
		);
	}
	return found;
}

/** Fuel price per GJ of fuel energy, in major units of the site's currency. */
export function fuelPricePerGJ(fuel: Fuel): Sourced {
	const price = parseDecimal('Fuel price', fuel.price);
	const energy = energyPerPriceUnit(fuel);
	return {
		value: price / energy.value,
		unit: 'per GJ',
		source: `site fuel price ÷ ${energy.source}`
	};
}

/** kg CO2 per GJ of fuel: the site's factor when given, else the fuel's published default. */
export function emissionFactor(basis: Pick<CostBasis, 'fuel' | 'emissionFactor'>): Sourced {
	if (basis.emissionFactor !== undefined) {
		return { value: basis.emissionFactor, unit: 'kg CO2/GJ', source: 'site cost basis' };
	}
	const found = FUELS[basis.fuel.kind].emissionFactor;
	if (found === null) {
		throw new Error(
			`${FUELS[basis.fuel.kind].label} has no default emission factor: enter one in kg CO2 per GJ in the cost basis`
		);
	}
	return found;
}

/** Parses a stored decimal string (e.g. "12.50") to a number; throws on anything else. */
export function parseDecimal(label: string, text: string): number {
	if (typeof text !== 'string' || !/^\d{1,12}(\.\d{1,6})?$/.test(text.trim())) {
		throw new Error(`${label} must be a decimal number such as 12.50, got "${String(text)}"`);
	}
	return Number(text);
}
