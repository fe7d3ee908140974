/**
 * The site's cost basis resolved into the numbers the energy chain needs, each with its
 * source, and the site's headers resolved into steam states.
 */
import { STANDARD_ATMOSPHERE_MPA } from '../../units/constants';
import { atmosphericPressureAtElevation } from '../../units/atmosphere';
import { stateFromPT } from '../forward';
import { saturationTemperature } from '../region4';
import { saturatedVapour, stateFromTX } from '../saturation';
import type { CostBasis, Header } from './inputs';
import { type AnnualBasis, requireEfficiency, requireHours } from './energy-chain';
import { FUELS, emissionFactor, fuelPricePerGJ, parseDecimal } from './fuels';
import type { Assumption, Sourced } from './sourced';
import { requireFinite } from './sourced';

export interface ResolvedBasis {
	currency: string;
	boilerEfficiency: number;
	/** Saturated-liquid enthalpy at the feedwater temperature, kJ/kg. */
	feedwaterEnthalpy: number;
	condensateReturnFraction: number;
	/** Site atmospheric pressure, MPa absolute. */
	atmosphere: number;
	/** Site operating hours per year. */
	hours: number;
	fuelPricePerGJ: Sourced;
	emissionFactor: Sourced;
	/** Makeup water plus treatment, per m³, major units. */
	waterPricePerM3: number;
	assumptions: Assumption[];
}

/** Resolves a cost basis, throwing a plain message for anything missing or out of range. */
export function resolveBasis(costBasis: CostBasis | null | undefined): ResolvedBasis {
	if (costBasis === null || costBasis === undefined) {
		throw new Error(
			'The site has no cost basis: set its fuel, price, boiler efficiency, feedwater temperature and operating hours before pricing findings'
		);
	}
	const efficiency = requireEfficiency(costBasis.boilerEfficiency);
	const hours = requireHours(costBasis.operatingHours);
	const Tfw = requireFinite('Feedwater temperature', costBasis.feedwaterTemperature, 'K');
	const returned = requireFinite(
		'Condensate return fraction',
		costBasis.condensateReturnFraction,
		''
	);
	if (returned < 0 || returned > 1) {
		throw new Error(`Condensate return fraction must be between 0 and 1, got ${returned}`);
	}
	// DOE "Benchmark the Fuel Cost of Steam Generation" counts feedwater as saturated liquid.
	const feedwaterEnthalpy = stateFromTX(Tfw, 0).h;
	const atmosphere = siteAtmosphere(costBasis);
	const price = fuelPricePerGJ(costBasis.fuel);
	const factor = emissionFactor(costBasis);
	const water = parseDecimal('Makeup water price', costBasis.makeupWaterPrice);
	const treatment = parseDecimal('Water treatment price', costBasis.waterTreatmentPrice);
	const site = 'site cost basis';
	return {
		currency: costBasis.currency,
		boilerEfficiency: efficiency,
		feedwaterEnthalpy,
		condensateReturnFraction: returned,
		atmosphere: atmosphere.value,
		hours,
		fuelPricePerGJ: price,
		emissionFactor: factor,
		waterPricePerM3: water + treatment,
		assumptions: [
			{
				key: 'boilerEfficiency',
				label: 'Boiler efficiency',
				value: efficiency,
				unit: '',
				source: site
			},
			{
				key: 'feedwaterTemperature',
				label: 'Feedwater temperature',
				value: Tfw,
				unit: 'K',
				source: site
			},
			{
				key: 'feedwaterEnthalpy',
				label: 'Feedwater enthalpy (saturated liquid)',
				value: feedwaterEnthalpy,
				unit: 'kJ/kg',
				source: 'IAPWS-IF97'
			},
			{
				key: 'fuelPrice',
				label: `Fuel price (${FUELS[costBasis.fuel.kind].label})`,
				...price,
				unit: `${costBasis.currency}/GJ`
			},
			{ key: 'emissionFactor', label: 'CO2 emission factor', ...factor },
			{
				key: 'waterPrice',
				label: 'Makeup water and treatment',
				value: water + treatment,
				unit: `${costBasis.currency}/m³`,
				source: site
			},
			{ key: 'atmosphericPressure', label: 'Atmospheric pressure', ...atmosphere }
		]
	};
}

/** The prices and factors a year of a steady flow is priced at (./energy-chain.ts annualLoss). */
export function annualBasis(basis: ResolvedBasis, hours: number): AnnualBasis {
	return {
		hours,
		fuelPricePerGJ: basis.fuelPricePerGJ.value,
		emissionFactor: basis.emissionFactor.value,
		waterPricePerM3: basis.waterPricePerM3
	};
}

/** Site atmospheric pressure, MPa absolute: measured, else from elevation, else standard. */
export function siteAtmosphere(
	costBasis: Pick<CostBasis, 'atmosphericPressure' | 'elevation'>
): Sourced {
	if (costBasis.atmosphericPressure !== undefined) {
		return { value: costBasis.atmosphericPressure, unit: 'MPa abs', source: 'site cost basis' };
	}
	if (costBasis.elevation !== undefined) {
		return {
			value: atmosphericPressureAtElevation(costBasis.elevation),
			unit: 'MPa abs',
			source: `U.S. Standard Atmosphere 1976 at the site elevation of ${costBasis.elevation} m`
		};
	}
	return {
		value: STANDARD_ATMOSPHERE_MPA,
		unit: 'MPa abs',
		source: 'standard atmosphere (no site value)'
	};
}

/** A header from the site's list, or a plain error naming what is missing. */
export function findHeader(headers: readonly Header[] | undefined, id: string | undefined): Header {
	if (id === undefined) throw new Error('This finding has no header: choose the header it is on');
	const header = headers?.find((h) => h.id === id);
	if (!header) throw new Error(`Header ${id} is not in the site's header list`);
	return header;
}

export interface HeaderSteam {
	/** MPa absolute. */
	pressure: number;
	/** Design temperature when superheated, K; undefined for saturated headers. */
	temperature: number | undefined;
	/** Steam enthalpy at the header, kJ/kg. */
	enthalpy: number;
	saturationTemperature: number;
}

/** The steam a header carries: dry saturated, or superheated at its design temperature. */
export function headerSteam(header: Header): HeaderSteam {
	const Tsat = saturationTemperature(header.pressure);
	if (header.designTemperature !== undefined && header.designTemperature < Tsat - 1e-6) {
		throw new Error(
			`Header "${header.name}" has a design temperature of ${header.designTemperature} K, below saturation (${Tsat.toFixed(2)} K) at ${header.pressure} MPa abs`
		);
	}
	const superheated =
		header.designTemperature !== undefined && header.designTemperature > Tsat + 1e-6;
	return {
		pressure: header.pressure,
		temperature: superheated ? header.designTemperature : undefined,
		enthalpy: superheated
			? stateFromPT(header.pressure, header.designTemperature!).h
			: saturatedVapour(header.pressure).h,
		saturationTemperature: Tsat
	};
}
