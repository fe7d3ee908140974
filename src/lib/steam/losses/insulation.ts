/**
 * An insulation gap: heat saved by insulating a bare pipe run, valves, flange pairs or a flat
 * surface, with the surface temperatures before and after and the burn-risk flags. Pipes and
 * fittings use the ../heat models (ASTM C680, C1129 approach); flat surfaces flat-insulation.ts.
 */
import { FITTING_EQUIVALENT_LENGTH } from '../heat/fittings';
import { flatSurfaceHeatLoss } from '../heat/flat-surface';
import { insulationSaving } from '../heat/insulation-saving';
import { CONTACT_BURN_THRESHOLD, surfaceSafety, type SurfaceSafety } from '../heat/surface-safety';
import { insulatedFlatSurfaceHeatLoss } from './flat-insulation';
import type { InsulationInputs } from './inputs';
import type { Assumption } from './sourced';

export interface InsulationGap {
	/** Heat lost bare, W. */
	bare: number;
	/** Heat lost once insulated, W. */
	insulated: number;
	/** bare − insulated, W. */
	saving: number;
	bareSurfaceTemperature: number;
	insulatedSurfaceTemperature: number;
	before: SurfaceSafety;
	after: SurfaceSafety;
	assumptions: Assumption[];
}

/**
 * Heat saved by closing an insulation gap.
 * @param processTemperature line or surface temperature, K
 */
export function insulationGap(inputs: InsulationInputs, processTemperature: number): InsulationGap {
	const common = {
		processTemperature,
		ambientTemperature: inputs.ambientTemperature,
		windSpeed: inputs.windSpeed,
		bareEmissivity: inputs.bareEmissivity,
		layers: inputs.layers,
		jacketEmissivity: inputs.jacketEmissivity
	};
	const assumptions: Assumption[] = [
		{
			key: 'burnThreshold',
			label: 'Contact burn threshold',
			value: CONTACT_BURN_THRESHOLD,
			unit: 'K',
			source: 'common practice for personnel protection (the ASTM C1055 approach)'
		}
	];
	if (inputs.item === 'surface') return flatGap(inputs, processTemperature, assumptions);
	// The schema requires a size for pipes and fittings; an outer diameter wins over DN.
	const size =
		inputs.outerDiameter !== undefined
			? { outerDiameter: inputs.outerDiameter }
			: { dn: inputs.dn };
	if (inputs.item === 'pipe') {
		if (inputs.length === undefined) throw new Error('A bare pipe needs its length in metres');
		const result = insulationSaving({ ...common, ...size, length: inputs.length });
		return { ...result, assumptions };
	}
	if (inputs.count === undefined) throw new Error(`Give the number of bare ${inputs.item}s`);
	const result = insulationSaving({
		...common,
		...size,
		fittings: { kind: inputs.item, count: inputs.count }
	});
	const equivalent = FITTING_EQUIVALENT_LENGTH[inputs.item];
	assumptions.push({
		key: `equivalentLength.${inputs.item}`,
		label: `Bare pipe length equivalent to one ${inputs.item === 'valve' ? 'valve' : 'flange pair'}`,
		value: equivalent.length,
		unit: 'm',
		source: equivalent.source
	});
	return { ...result, assumptions };
}

function flatGap(
	inputs: InsulationInputs,
	process: number,
	assumptions: Assumption[]
): InsulationGap {
	if (inputs.area === undefined || inputs.height === undefined) {
		throw new Error('A flat surface needs its bare area (m²) and height (m)');
	}
	const conditions = {
		height: inputs.height,
		ambientTemperature: inputs.ambientTemperature,
		windSpeed: inputs.windSpeed
	};
	const bare =
		flatSurfaceHeatLoss({
			...conditions,
			surfaceTemperature: process,
			emissivity: inputs.bareEmissivity
		}).total * inputs.area;
	const covered = insulatedFlatSurfaceHeatLoss({
		...conditions,
		processTemperature: process,
		layers: inputs.layers,
		jacketEmissivity: inputs.jacketEmissivity
	});
	const insulated = covered.total * inputs.area;
	return {
		bare,
		insulated,
		saving: bare - insulated,
		bareSurfaceTemperature: process,
		insulatedSurfaceTemperature: covered.surfaceTemperature,
		before: surfaceSafety(process),
		after: surfaceSafety(covered.surfaceTemperature),
		assumptions
	};
}
