/**
 * Steam trap losses: a trap failed open passes steam through its discharge orifice, a leaking
 * trap a fraction of that; failed closed or flooded traps lose no steam but back condensate
 * up. Every factor is returned as an assumption with its source, and the site may override
 * the two trap factors.
 */
import type { TrapCondition, TrapType } from '../vocabulary';
import type { TrapFactors, TrapInputs } from './inputs';
import type { Assumption, Sourced } from './sourced';
import { orificeSteamFlow, type OrificeFlow } from './orifice';

const DOE_TRAPS = 'US DOE steam fact sheet "Inspect and Repair Steam Traps"';

/**
 * Discharge coefficient for a trap seat or leak hole. The DOE fact sheet's table of steam
 * lost through trap orifices is Napier's formula × 0.73 at every entry, i.e. 0.70–0.75 of the
 * ideal IF97 flow from 15 to 300 psig (tests/reference/losses-orifice.spec.ts).
 */
export const DISCHARGE_COEFFICIENT: Sourced = {
	value: 0.72,
	unit: '',
	source: `implied by the ${DOE_TRAPS} table of steam loss by orifice and pressure`
};

/** Default share of the full orifice flow for a failed-open and a leaking trap. */
export const TRAP_FACTORS: Record<'failedOpen' | 'leaking', Sourced> = {
	failedOpen: {
		value: 1,
		unit: '',
		source: `${DOE_TRAPS}: a trap stuck open is priced at its orifice's full steam flow`
	},
	leaking: {
		value: 0.25,
		unit: '',
		source: 'common practice: a leaking trap passes about a quarter of its blow-through flow'
	}
};

/** Sizes with a default orifice, DN; larger or smaller traps need the orifice entered. */
const TABLE_DNS = [8, 10, 15, 20, 25, 32, 40, 50] as const;

/**
 * Default discharge orifice diameters, mm, by DN (columns as TABLE_DNS). Mechanical traps
 * (float, bucket) have smaller seats for higher pressure ratings: rows for ≤ 2, ≤ 10 and
 * > 10 bar g. Common practice estimates, not a published table: enter the maker's orifice
 * where known.
 */
const MECHANICAL_MM: Record<'inverted-bucket' | 'float-thermostatic', readonly number[][]> = {
	'inverted-bucket': [
		[4.8, 5.6, 6.4, 7.9, 12.7, 15.9, 19.1, 25.4],
		[2.8, 3.2, 3.2, 4.0, 6.4, 9.5, 12.7, 15.9],
		[2.4, 2.4, 2.4, 3.2, 4.8, 6.4, 7.9, 9.5]
	],
	'float-thermostatic': [
		[4.8, 5.6, 6.4, 7.9, 11.1, 14.3, 17.5, 22.2],
		[3.2, 3.2, 4.0, 4.8, 7.1, 9.5, 12.7, 15.9],
		[2.4, 2.4, 3.2, 4.0, 5.6, 7.1, 9.5, 11.1]
	]
};

/** Thermodynamic, thermostatic and bimetallic seats barely change with rating. */
const FIXED_MM: Record<'thermodynamic' | 'thermostatic' | 'bimetallic', readonly number[]> = {
	thermodynamic: [2.0, 2.5, 3.2, 4.0, 4.8, 6.4, 7.9, 9.5],
	thermostatic: [3.2, 3.2, 3.2, 4.8, 6.4, 7.9, 9.5, 12.7],
	bimetallic: [2.4, 2.4, 3.2, 4.0, 4.8, 6.4, 7.9, 9.5]
};

const COMMON_PRACTICE_ORIFICE =
	"common practice estimate by trap type and size (no published table): enter the maker's orifice where known";

/**
 * Default discharge orifice diameter, m, for a trap of this type and size at this gauge
 * pressure (MPa). Throws for fixed-orifice and other traps, and sizes outside DN 8–50, where
 * no sensible default exists.
 */
export function defaultTrapOrifice(type: TrapType, dn: number, gaugePressure: number): Sourced {
	const column = (TABLE_DNS as readonly number[]).indexOf(dn);
	if (type === 'fixed-orifice' || type === 'other') {
		throw new Error(`Enter the discharge orifice diameter for a ${type} trap: there is no default`);
	}
	if (column < 0) {
		throw new Error(
			`Enter the discharge orifice diameter for a DN ${dn} trap: defaults cover DN 8 to DN 50`
		);
	}
	const mm =
		type === 'inverted-bucket' || type === 'float-thermostatic'
			? MECHANICAL_MM[type][gaugePressure <= 0.2 ? 0 : gaugePressure <= 1 ? 1 : 2][column]
			: FIXED_MM[type][column];
	return { value: mm / 1000, unit: 'm', source: COMMON_PRACTICE_ORIFICE };
}

export const TRAP_RISK_NOTES: Partial<Record<TrapCondition, string>> = {
	'failed-closed':
		'Failed closed: no steam lost, but condensate backs up into the equipment or main — lost heating, water hammer, corrosion and, outdoors, freezing. Repair promptly.',
	flooded:
		'Flooded: the trap cannot clear its condensate (undersized, blocked strainer or too much back pressure) — lost heating and a risk of water hammer.'
};

export const TRAP_STATUS_NOTES: Partial<Record<TrapCondition, string>> = {
	working: 'Working: no steam loss.',
	'out-of-service': 'Out of service: no steam loss while the line is not in use.',
	'not-accessible':
		'Not accessible: not tested, so no loss is estimated; test it on the next survey.'
};

export interface TrapLossInput {
	inputs: TrapInputs;
	/** Inlet (header) pressure, MPa absolute. */
	inletPressure: number;
	/** Inlet temperature when the header is superheated, K. */
	inletTemperature?: number;
	/** Site atmospheric pressure, MPa absolute. */
	atmosphere: number;
	/** Site overrides of the trap factors. */
	factors?: TrapFactors;
}

export interface TrapLoss {
	/** Steam passing the trap, kg/s. */
	steamFlow: number;
	/** Fraction of the full orifice flow applied (0 when no steam passes). */
	factor: number;
	/** The full orifice flow, when computed. */
	orifice: OrificeFlow | null;
	riskNote: string | null;
	note: string | null;
	assumptions: Assumption[];
}

/** Steam lost through a trap in the given condition. */
export function trapSteamLoss({
	inputs,
	inletPressure,
	inletTemperature,
	atmosphere,
	factors
}: TrapLossInput): TrapLoss {
	const condition = inputs.condition;
	if (condition !== 'failed-open' && condition !== 'leaking') {
		return {
			steamFlow: 0,
			factor: 0,
			orifice: null,
			riskNote: TRAP_RISK_NOTES[condition] ?? null,
			note: TRAP_STATUS_NOTES[condition] ?? null,
			assumptions: []
		};
	}
	const backPressure = inputs.discharge === 'atmosphere' ? atmosphere : inputs.backPressure;
	if (backPressure === undefined) {
		throw new Error('A trap discharging to a condensate return needs the return’s back pressure');
	}
	if (backPressure >= inletPressure) {
		throw new Error(
			`The trap's back pressure (${backPressure} MPa abs) must be below its inlet pressure (${inletPressure} MPa abs)`
		);
	}
	const orificeDiameter: Sourced =
		inputs.orificeDiameter !== undefined
			? { value: inputs.orificeDiameter, unit: 'm', source: 'measured or from the maker (finding)' }
			: defaultTrapOrifice(inputs.trapType, inputs.dn, inletPressure - atmosphere);
	const key = condition === 'failed-open' ? 'failedOpen' : 'leaking';
	const siteFactor = factors?.[key];
	const factor: Sourced =
		siteFactor !== undefined
			? { value: siteFactor, unit: '', source: 'site cost basis' }
			: TRAP_FACTORS[key];
	const orifice = orificeSteamFlow({
		p1: inletPressure,
		p2: backPressure,
		diameter: orificeDiameter.value,
		cd: DISCHARGE_COEFFICIENT.value,
		T1: inletTemperature
	});
	return {
		steamFlow: orifice.massFlow * factor.value,
		factor: factor.value,
		orifice,
		riskNote: null,
		note: `${condition === 'failed-open' ? 'Failed open' : 'Leaking'}: steam through the ${(orificeDiameter.value * 1000).toFixed(1)} mm orifice${orifice.choked ? ' (choked flow)' : ''} × ${factor.value}`,
		assumptions: [
			{ key: 'orificeDiameter', label: 'Discharge orifice diameter', ...orificeDiameter },
			{ key: 'dischargeCoefficient', label: 'Discharge coefficient', ...DISCHARGE_COEFFICIENT },
			{
				key: `trapFactor.${key}`,
				label:
					condition === 'failed-open' ? 'Blow-through factor (failed open)' : 'Leaking fraction',
				...factor
			},
			{
				key: 'backPressure',
				label:
					inputs.discharge === 'atmosphere'
						? 'Discharge to atmosphere'
						: 'Condensate return back pressure',
				value: backPressure,
				unit: 'MPa abs',
				source: inputs.discharge === 'atmosphere' ? 'site atmospheric pressure' : 'finding'
			}
		]
	};
}
