/**
 * What the engine prices, as plain TypeScript: a finding's kind-specific inputs, the finding
 * itself and the site's cost basis and headers. Base units throughout: p MPa absolute, T K,
 * lengths m, areas m², mass flow kg/s, hours per year. The zod schemas in src/lib/schemas are
 * declared against these types (they import them; the engine never imports the schemas).
 */
import type {
	FuelKind,
	FuelPriceUnit,
	InsulationItem,
	InsulationMaterialName,
	InsulationState,
	LeakComponent,
	LeakSizeClass,
	NominalDn,
	TrapCondition,
	TrapDischarge,
	TrapTestMethod,
	TrapType
} from '../vocabulary';

export interface TrapInputs {
	trapType: TrapType;
	/** Nominal connection size; sets the default discharge orifice. */
	dn: NominalDn;
	/** Discharge orifice diameter, m; defaults from the size and type table when absent. */
	orificeDiameter?: number;
	condition: TrapCondition;
	discharge: TrapDischarge;
	/** Pressure the trap discharges into, MPa absolute; required for a condensate return. */
	backPressure?: number;
	testMethod?: TrapTestMethod;
	/** Hours per year this trap is live, overriding the site's operating hours. */
	operatingHours?: number;
	/** Condensate the trap passes, kg/s: priced as lost water and heat when it goes to drain. */
	condensateLoad?: number;
	/** Surface temperature read just upstream of the trap, K (temperature test). */
	inletTemperature?: number;
	/** Surface temperature read just downstream of the trap, K (temperature test). */
	outletTemperature?: number;
}

export interface LeakInputs {
	/** Equivalent hole diameter, m: the round hole that would pass the same steam. */
	holeDiameter?: number;
	/** A size class chosen from the guidance when the hole cannot be measured. */
	sizeClass?: LeakSizeClass;
	/** Where on the line the leak is. */
	component?: LeakComponent;
	operatingHours?: number;
}

/** A named material, or a constant apparent conductivity in W/(m K). */
export type InsulationMaterialInput = InsulationMaterialName | { conductivity: number };

export interface InsulationLayerInput {
	/** m */
	thickness: number;
	material: InsulationMaterialInput;
}

export interface InsulationInputs {
	item: InsulationItem;
	/** Nominal pipe size of the pipe, valve or flange pair. */
	dn?: NominalDn;
	/** Bare outside diameter, m, when it is not a standard pipe size (wins over dn). */
	outerDiameter?: number;
	/** Bare length, m (pipe). */
	length?: number;
	/** Number of bare valves or flange pairs. */
	count?: number;
	/** Height of a flat surface, m: the run the warm air rises along. */
	height?: number;
	/** Bare area, m² (flat surface: tank, vessel, heat-exchanger shell). */
	area?: number;
	/** Process temperature, K; when absent, the header's steam temperature. */
	processTemperature?: number;
	/** K */
	ambientTemperature: number;
	/** m/s */
	windSpeed: number;
	/** Proposed insulation, innermost layer first. */
	layers: InsulationLayerInput[];
	jacketEmissivity: number;
	bareEmissivity: number;
	operatingHours?: number;
	/** What is there today: bare (the default), damaged or wet insulation (priced as bare). */
	surfaceState?: InsulationState;
}

export interface HeaderInputs {
	/** Measured line pressure, MPa absolute. */
	measuredPressure: number;
	/** Measured line temperature, K, when a thermometer reading was taken. */
	measuredTemperature?: number;
}

interface FindingCommon {
	id: string;
	/** The site header it draws steam from; optional only for insulation with its own temperature. */
	headerId?: string;
	/** Repair cost in integer minor units of the site's currency (a capture has none). */
	repairCost?: number;
}

export interface TrapFindingInput extends FindingCommon {
	kind: 'trap';
	inputs: TrapInputs;
}
export interface LeakFindingInput extends FindingCommon {
	kind: 'leak';
	inputs: LeakInputs;
}
export interface InsulationFindingInput extends FindingCommon {
	kind: 'insulation';
	inputs: InsulationInputs;
}
export interface HeaderFindingInput extends FindingCommon {
	kind: 'header';
	inputs: HeaderInputs;
}

/** What evaluateFinding prices: a device's capture and a stored finding both fit it. */
export type FindingInput =
	TrapFindingInput | LeakFindingInput | InsulationFindingInput | HeaderFindingInput;

export interface Fuel {
	kind: FuelKind;
	/** Price per `unit` as a decimal string, in the cost basis currency. */
	price: string;
	unit: FuelPriceUnit;
	/** GJ per priced unit (higher heating value), overriding the fuel's default. */
	energyContent?: number;
}

/** Per-site overrides of the trap loss factors (defaults and their sources in ./traps.ts). */
export interface TrapFactors {
	/** Share of the full orifice flow that blows through a trap failed open, [0, 1]. */
	failedOpen?: number;
	/** Share of the full orifice flow that passes a leaking trap, [0, 1]. */
	leaking?: number;
}

/** A site's cost basis: what turns steam and heat into money and CO2. */
export interface CostBasis {
	fuel: Fuel;
	/** ISO 4217 code. */
	currency: string;
	/** Fuel-to-steam efficiency, (0, 1]. */
	boilerEfficiency: number;
	/** K */
	feedwaterTemperature: number;
	/** Share of the steam's mass that comes back as condensate, [0, 1]. */
	condensateReturnFraction: number;
	/** Decimal strings per m³. */
	makeupWaterPrice: string;
	waterTreatmentPrice: string;
	/** Hours per year the steam system is live. */
	operatingHours: number;
	/**
	 * Makeup water temperature, K. When given, water that is not returned is also charged the
	 * heat that raises makeup from this temperature to feedwater temperature.
	 */
	makeupWaterTemperature?: number;
	/** kg CO2 per GJ of fuel (HHV). */
	emissionFactor?: number;
	/** MPa absolute; wins over elevation. */
	atmosphericPressure?: number;
	/** m above sea level. */
	elevation?: number;
	trapFactors?: TrapFactors;
	/** Per year, [0, 1). */
	discountRate?: number;
	lifeYears?: number;
}

/** A steam header of the site. */
export interface Header {
	id: string;
	name: string;
	/** MPa absolute. */
	pressure: number;
	/** Design steam temperature for superheated headers, K. */
	designTemperature?: number;
	/** Hours per year this header is live, where it differs from the site's (0, 8784]. */
	operatingHours?: number;
}

/** The part of a site that moves a finding's physics (steam flow, heat flow), not its money. */
export type PhysicsBasis = Pick<CostBasis, 'atmosphericPressure' | 'elevation' | 'trapFactors'>;
