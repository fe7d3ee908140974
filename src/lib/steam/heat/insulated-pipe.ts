/**
 * Heat loss through one or more insulation layers on a horizontal pipe, solved for the
 * jacket surface temperature as ASTM C680 prescribes: steady one-dimensional radial
 * conduction with temperature-dependent conductivity (integrated over each layer), and an
 * outer surface coefficient of convection plus radiation.
 *
 * Stated assumptions, as in C680: the pipe surface is at the process temperature (the inside
 * film of condensing steam and the steel wall are neglected: their resistances are orders of
 * magnitude below the insulation's), layers are homogeneous and in perfect contact, and the
 * radiant surroundings are at the air temperature.
 */
import { SteamRangeError } from '../errors';
import { barePipeHeatLoss } from './bare-pipe';
import {
	type InsulationMaterial,
	type MaterialData,
	conductivityAt,
	conductivityIntegral,
	materialData
} from './insulation-materials';
import { findRoot } from './root-finding';
import {
	checkAmbient,
	checkDiameter,
	checkEmissivity,
	checkHotTemperature,
	checkThickness,
	checkWindSpeed
} from './validate';

export interface InsulationLayer {
	/** Layer thickness [m]. */
	thickness: number;
	/** A named material or { conductivity } in W/(m K). */
	material: InsulationMaterial;
}

export interface InsulatedPipeInput {
	/** Outside diameter of the bare pipe [m]. */
	outerDiameter: number;
	/** Process (steam or condensate) temperature, taken as the pipe surface temperature [K]. */
	processTemperature: number;
	/** Insulation layers from the pipe outwards. */
	layers: readonly InsulationLayer[];
	/** Emissivity of the jacket or outer surface, 0 < ε ≤ 1. */
	jacketEmissivity: number;
	/** Air and surroundings temperature [K]. */
	ambientTemperature: number;
	/** Wind speed [m/s]. */
	windSpeed: number;
}

export interface InsulatedPipeHeatLoss {
	/** Heat lost per metre of pipe [W/m]. */
	total: number;
	/** Convective and radiative parts at the jacket [W/m]. */
	convection: number;
	radiation: number;
	/** Jacket (outer surface) temperature [K]. */
	surfaceTemperature: number;
	/** Temperatures between consecutive layers, innermost first [K] (empty for one layer). */
	interfaceTemperatures: number[];
	/** Outside diameter over the insulation [m]. */
	jacketDiameter: number;
	/** Mean conductivity of each layer over its own temperature span [W/(m K)]. */
	layerConductivities: number[];
	/** Iterations the surface-temperature solver took. */
	iterations: number;
}

/** Most layers accepted. */
const LAYERS_MAX = 6;
/** Surface-temperature convergence [K]: far below any thermometer. */
const SURFACE_TOLERANCE = 1e-9;

/**
 * Heat loss per metre [W/m] and jacket temperature [K] of an insulated horizontal pipe.
 * Throws if a layer's hot face would exceed its material's maximum use temperature.
 */
export function insulatedPipeHeatLoss(input: InsulatedPipeInput): InsulatedPipeHeatLoss {
	const D = checkDiameter('outerDiameter', input.outerDiameter);
	const ambient = checkAmbient(input.ambientTemperature);
	const process = checkHotTemperature('processTemperature', input.processTemperature, ambient);
	const wind = checkWindSpeed(input.windSpeed);
	const emissivity = checkEmissivity('jacketEmissivity', input.jacketEmissivity);
	const layers = input.layers;
	if (!Array.isArray(layers) || layers.length < 1 || layers.length > LAYERS_MAX) {
		throw new SteamRangeError(
			'layers (count)',
			Array.isArray(layers) ? layers.length : NaN,
			`1 to ${LAYERS_MAX} insulation layers (use barePipeHeatLoss for a bare pipe)`
		);
	}
	const radii = [D / 2];
	layers.forEach((layer, i) => {
		radii.push(radii[i] + checkThickness(`layers[${i}].thickness`, layer.thickness));
	});
	const materials = layers.map((layer) => materialData(layer.material));
	checkServiceTemperature(materials[0], 0, process);
	const jacketDiameter = 2 * radii[radii.length - 1];

	/** Heat flow for a trial jacket temperature, and the temperatures it implies inward. */
	const inward = (surface: number) => {
		const q = barePipeHeatLoss({
			outerDiameter: jacketDiameter,
			surfaceTemperature: surface,
			ambientTemperature: ambient,
			windSpeed: wind,
			emissivity
		});
		const temperatures = [surface];
		for (let i = layers.length - 1; i >= 0; i--) {
			const target = (q.total * Math.log(radii[i + 1] / radii[i])) / (2 * Math.PI);
			temperatures.unshift(hotFaceTemperature(materials[i], temperatures[0], target));
		}
		return { q, temperatures };
	};

	// The implied pipe temperature rises monotonically with the jacket temperature: it equals
	// the ambient when the jacket is at ambient, and exceeds the process temperature when the
	// jacket is at process temperature, so [ambient, process] always brackets the solution.
	const solved = findRoot(
		(surface) => inward(surface).temperatures[0] - process,
		ambient,
		process,
		SURFACE_TOLERANCE
	);
	const { q, temperatures } = inward(solved.root);
	temperatures[0] = process;
	materials.forEach((data, i) => checkServiceTemperature(data, i, temperatures[i]));
	return {
		total: q.total,
		convection: q.convection,
		radiation: q.radiation,
		surfaceTemperature: solved.root,
		interfaceTemperatures: temperatures.slice(1, -1),
		jacketDiameter,
		layerConductivities: materials.map((data, i) =>
			temperatures[i] === temperatures[i + 1]
				? conductivityAt(data, temperatures[i])
				: conductivityIntegral(data, temperatures[i + 1], temperatures[i]) /
					(temperatures[i] - temperatures[i + 1])
		),
		iterations: solved.iterations
	};
}

/**
 * The hot-face temperature of a layer whose cold face is at `cold` [K], such that
 * ∫ k dT from cold to hot equals `target` [W/m] (= q'·ln(r_o/r_i)/2π).
 */
function hotFaceTemperature(data: MaterialData, cold: number, target: number): number {
	if (target === 0) return cold;
	// k never falls with temperature above `cold`, so k(cold) bounds the rise from above.
	const kCold = conductivityAt(data, cold);
	if (data.points.length === 1) return cold + target / kCold;
	const upper = cold + target / kCold;
	return findRoot(
		(hot) => conductivityIntegral(data, cold, hot) - target,
		cold,
		upper,
		SURFACE_TOLERANCE * 1e-3
	).root;
}

function checkServiceTemperature(data: MaterialData, index: number, hotFace: number): void {
	if (hotFace > data.maxServiceTemperature) {
		throw new SteamRangeError(
			`hot-face temperature of layers[${index}] (${data.name}), K`,
			hotFace,
			`at most ${round(data.maxServiceTemperature)} K (${round(data.maxServiceTemperature - 273.15)} °C), ` +
				`the material's maximum use temperature`
		);
	}
}

function round(x: number): number {
	return Math.round(x * 100) / 100;
}
