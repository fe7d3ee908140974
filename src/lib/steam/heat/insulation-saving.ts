/**
 * The saving from closing an insulation gap: bare loss − insulated loss over a length of pipe
 * or a number of fittings, with the surface temperatures before and after and the hot-surface
 * flags. Multiply by operating hours in the energy chain; this module stays in watts.
 */
import { barePipeHeatLoss } from './bare-pipe';
import { type FittingKind, fittingHeatLoss } from './fittings';
import { type InsulationLayer, insulatedPipeHeatLoss } from './insulated-pipe';
import { type PipeSizeInput, resolveOuterDiameter } from './pipe-sizes';
import { HOT_SURFACE_CAUTION, type SurfaceSafety, surfaceSafety } from './surface-safety';
import { positiveUpTo } from './validate';

/** Longest pipe run in one finding [m]. */
const LENGTH_MAX = 100000;

export interface InsulationSavingInput extends PipeSizeInput {
	/** Process temperature, taken as the bare surface temperature [K]. */
	processTemperature: number;
	/** Air and surroundings temperature [K]. */
	ambientTemperature: number;
	/** Wind speed [m/s]. */
	windSpeed: number;
	/** Emissivity of the bare surface. */
	bareEmissivity: number;
	/** The insulation to be fitted, from the pipe outwards. */
	layers: readonly InsulationLayer[];
	/** Emissivity of its jacket. */
	jacketEmissivity: number;
	/** Length of bare pipe [m]; give this or `fittings`. */
	length?: number;
	/** Bare fittings; give this or `length`. */
	fittings?: {
		kind: FittingKind;
		count: number;
		surfaceArea?: number;
		equivalentLength?: number;
	};
}

export interface InsulationSaving {
	/** Heat lost bare [W]. */
	bare: number;
	/** Heat lost once insulated [W]. */
	insulated: number;
	/** bare − insulated [W]. */
	saving: number;
	/** saving ÷ bare. */
	savingFraction: number;
	/** Surface temperature bare (the process temperature) [K]. */
	bareSurfaceTemperature: number;
	/** Jacket temperature once insulated [K]. */
	insulatedSurfaceTemperature: number;
	/** Hot-surface flags before and after. */
	before: SurfaceSafety;
	after: SurfaceSafety;
	/** Cautions to show with the result (empty when no surface is hot). */
	cautions: string[];
}

/** Heat saved [W] by insulating a bare pipe run or bare fittings. */
export function insulationSaving(input: InsulationSavingInput): InsulationSaving {
	const D = resolveOuterDiameter(input);
	const conditions = {
		outerDiameter: D,
		ambientTemperature: input.ambientTemperature,
		windSpeed: input.windSpeed
	};
	let bare: number;
	let insulated: number;
	let insulatedSurfaceTemperature: number;
	if ((input.length === undefined) === (input.fittings === undefined)) {
		throw new TypeError('Give either length (m of pipe) or fittings for an insulation gap');
	}
	if (input.length !== undefined) {
		const length = positiveUpTo('length', input.length, LENGTH_MAX, 'm');
		bare =
			barePipeHeatLoss({
				...conditions,
				surfaceTemperature: input.processTemperature,
				emissivity: input.bareEmissivity
			}).total * length;
		const covered = insulatedPipeHeatLoss({
			...conditions,
			processTemperature: input.processTemperature,
			layers: input.layers,
			jacketEmissivity: input.jacketEmissivity
		});
		insulated = covered.total * length;
		insulatedSurfaceTemperature = covered.surfaceTemperature;
	} else {
		const fittings = input.fittings!;
		const common = {
			...conditions,
			...fittings,
			processTemperature: input.processTemperature,
			emissivity: input.bareEmissivity
		};
		bare = fittingHeatLoss(common).total;
		const covered = fittingHeatLoss({
			...common,
			insulation: { layers: input.layers, jacketEmissivity: input.jacketEmissivity }
		});
		insulated = covered.total;
		insulatedSurfaceTemperature = covered.surfaceTemperature;
	}
	const before = surfaceSafety(input.processTemperature);
	const after = surfaceSafety(insulatedSurfaceTemperature);
	return {
		bare,
		insulated,
		saving: bare - insulated,
		// A line at ambient temperature loses nothing either way: report no saving, not 0/0.
		savingFraction: bare > 0 ? (bare - insulated) / bare : 0,
		bareSurfaceTemperature: input.processTemperature,
		insulatedSurfaceTemperature,
		before,
		after,
		cautions: before.burnRisk || after.burnRisk ? [HOT_SURFACE_CAUTION] : []
	};
}
