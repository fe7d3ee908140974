/**
 * Heat loss from valves and flange pairs, following the ASTM C1129 approach: a fitting loses
 * heat through its surface area at the same rate per unit area as the pipe it sits on, so
 * its loss is the pipe's loss per metre times an equivalent length (surface area ÷ πD). Bare
 * or with an insulating cover, the same C680 surface and conduction model is used.
 */
import { barePipeHeatLoss } from './bare-pipe';
import { type InsulationLayer, insulatedPipeHeatLoss } from './insulated-pipe';
import { type PipeSizeInput, resolveOuterDiameter } from './pipe-sizes';
import { checkCount, checkDiameter, positiveUpTo } from './validate';

export type FittingKind = 'valve' | 'flange-pair';

export interface EquivalentLength {
	/** Length of bare pipe of the same size with the same surface area [m]. */
	length: number;
	source: string;
}

/**
 * Default equivalent lengths of bare pipe per fitting, editable per site. Common practice,
 * size-independent: they are rough by nature, so an auditor with the fitting's dimensions
 * should enter its surface area instead.
 */
export const FITTING_EQUIVALENT_LENGTH: Readonly<Record<FittingKind, EquivalentLength>> = {
	valve: {
		length: 1.2,
		source:
			'common practice: a bare valve ≈ 1.2 m of bare pipe of its size (consistent with the ' +
			'US DOE steam fact sheet remark that a 6-inch gate valve may have more than 6 ft² of ' +
			'surface, i.e. more than 1.05 m of NPS 6 pipe)'
	},
	'flange-pair': {
		length: 0.5,
		source: 'common practice: a bare flange pair ≈ 0.5 m of bare pipe of its size'
	}
};

/** Most fittings in one finding. */
const COUNT_MAX = 10000;

export interface FittingInput extends PipeSizeInput {
	kind: FittingKind;
	/** Number of identical fittings (default 1). */
	count?: number;
	/** Process temperature, taken as the bare fitting's surface temperature [K]. */
	processTemperature: number;
	/** Air and surroundings temperature [K]. */
	ambientTemperature: number;
	/** Wind speed [m/s]. */
	windSpeed: number;
	/** Emissivity of the bare metal surface. */
	emissivity: number;
	/** An insulating cover; omit for a bare fitting. */
	insulation?: { layers: readonly InsulationLayer[]; jacketEmissivity: number };
	/** Bare surface area of one fitting [m²] (ASTM C1129: from its dimensions). */
	surfaceArea?: number;
	/** Equivalent length of pipe per fitting [m], overriding the common-practice default. */
	equivalentLength?: number;
}

export interface FittingHeatLoss {
	/** Heat lost by all the fittings [W]. */
	total: number;
	/** Heat lost by one fitting [W]. */
	perFitting: number;
	/** Equivalent length of pipe per fitting used [m]. */
	equivalentLength: number;
	/** Outside diameter of the pipe the fitting sits on [m]. */
	outerDiameter: number;
	/** Outer surface temperature: the process temperature bare, the cover's jacket insulated [K]. */
	surfaceTemperature: number;
	/** Where the equivalent length came from. */
	source: string;
}

/** Heat loss [W] of valves or flange pairs, bare or insulated, by equivalent pipe length. */
export function fittingHeatLoss(input: FittingInput): FittingHeatLoss {
	const D = checkDiameter('outerDiameter', resolveOuterDiameter(input));
	const count = checkCount('count', input.count ?? 1, COUNT_MAX);
	const { length, source } = equivalentLength(input, D);
	const common = {
		outerDiameter: D,
		ambientTemperature: input.ambientTemperature,
		windSpeed: input.windSpeed
	};
	let perMetre: number;
	let surfaceTemperature: number;
	if (input.insulation) {
		const insulated = insulatedPipeHeatLoss({
			...common,
			processTemperature: input.processTemperature,
			layers: input.insulation.layers,
			jacketEmissivity: input.insulation.jacketEmissivity
		});
		perMetre = insulated.total;
		surfaceTemperature = insulated.surfaceTemperature;
	} else {
		perMetre = barePipeHeatLoss({
			...common,
			surfaceTemperature: input.processTemperature,
			emissivity: input.emissivity
		}).total;
		surfaceTemperature = input.processTemperature;
	}
	const perFitting = perMetre * length;
	return {
		total: perFitting * count,
		perFitting,
		equivalentLength: length,
		outerDiameter: D,
		surfaceTemperature,
		source
	};
}

/** The equivalent length per fitting [m]: entered, from a surface area, or the default. */
export function equivalentLength(
	input: Pick<FittingInput, 'kind' | 'surfaceArea' | 'equivalentLength'>,
	outerDiameter: number
): EquivalentLength {
	if (input.surfaceArea !== undefined && input.equivalentLength !== undefined) {
		throw new TypeError('Give surfaceArea or equivalentLength for a fitting, not both');
	}
	if (input.equivalentLength !== undefined) {
		return {
			length: positiveUpTo('equivalentLength', input.equivalentLength, 100, 'm'),
			source: 'entered by the auditor'
		};
	}
	if (input.surfaceArea !== undefined) {
		const area = positiveUpTo('surfaceArea', input.surfaceArea, 1000, 'm²');
		return {
			length: area / (Math.PI * outerDiameter),
			source: 'ASTM C1129 approach: entered surface area ÷ (π × pipe outside diameter)'
		};
	}
	const defaults = FITTING_EQUIVALENT_LENGTH[input.kind];
	if (!defaults) {
		throw new TypeError(`Unknown fitting kind "${input.kind}": use 'valve' or 'flange-pair'`);
	}
	return defaults;
}
