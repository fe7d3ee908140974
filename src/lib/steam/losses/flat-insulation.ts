/**
 * Insulated flat surface (tank walls, vessel and exchanger shells): one-dimensional planar
 * conduction through the layers with conductivity varying with temperature, and the jacket's
 * convection plus radiation, solved for the jacket temperature as ASTM C680 prescribes for
 * flat systems. The pipe case lives in ../heat/insulated-pipe.ts; this is its planar twin.
 */
import { flatSurfaceHeatLoss } from '../heat/flat-surface';
import type { InsulationLayer } from '../heat/insulated-pipe';
import {
	conductivityAt,
	conductivityIntegral,
	materialData,
	type MaterialData
} from '../heat/insulation-materials';
import { findRoot } from '../heat/root-finding';
import { requirePositive } from './sourced';

export interface InsulatedFlatInput {
	/** Height of the vertical surface, m. */
	height: number;
	/** Process temperature, taken as the hot face of the first layer, K. */
	processTemperature: number;
	/** Layers from the hot surface outwards. */
	layers: readonly InsulationLayer[];
	jacketEmissivity: number;
	ambientTemperature: number;
	windSpeed: number;
}

export interface InsulatedFlatHeatLoss {
	/** Heat lost per square metre, W/m². */
	total: number;
	/** Jacket temperature, K. */
	surfaceTemperature: number;
}

const TOLERANCE = 1e-9;

/** Heat loss per m² and jacket temperature of an insulated vertical flat surface. */
export function insulatedFlatSurfaceHeatLoss(input: InsulatedFlatInput): InsulatedFlatHeatLoss {
	const { processTemperature: process, ambientTemperature: ambient, layers } = input;
	if (layers.length < 1) throw new Error('An insulated surface needs at least one layer');
	const materials = layers.map((layer) => materialData(layer.material));
	layers.forEach((layer, i) => requirePositive(`Layer ${i + 1} thickness`, layer.thickness, 'm'));
	checkService(materials[0], process);
	const surfaceLoss = (T: number) =>
		flatSurfaceHeatLoss({
			height: input.height,
			surfaceTemperature: T,
			ambientTemperature: ambient,
			windSpeed: input.windSpeed,
			emissivity: input.jacketEmissivity
		}).total;

	/** Hot-face temperatures implied inward from a trial jacket temperature, outermost last. */
	const inward = (jacket: number) => {
		const q = surfaceLoss(jacket);
		const temperatures = [jacket];
		for (let i = layers.length - 1; i >= 0; i--) {
			temperatures.unshift(hotFace(materials[i], temperatures[0], q * layers[i].thickness));
		}
		return { q, temperatures };
	};
	// Implied hot face rises with the jacket temperature: ambient at ambient, above process at
	// process, so [ambient, process] brackets the answer.
	const solved = findRoot((T) => inward(T).temperatures[0] - process, ambient, process, TOLERANCE);
	const { q, temperatures } = inward(solved.root);
	materials.forEach((data, i) => checkService(data, i === 0 ? process : temperatures[i]));
	return { total: q, surfaceTemperature: solved.root };
}

/** Hot-face temperature of a layer whose cold face is at `cold`, with ∫k dT = target (W/m). */
function hotFace(data: MaterialData, cold: number, target: number): number {
	if (target === 0) return cold;
	// k does not fall with temperature, so the rise is at most target / k(cold).
	const upper = cold + target / conductivityAt(data, cold);
	if (data.points.length === 1) return upper;
	return findRoot((hot) => conductivityIntegral(data, cold, hot) - target, cold, upper, TOLERANCE)
		.root;
}

function checkService(data: MaterialData, hotFaceTemperature: number): void {
	if (hotFaceTemperature > data.maxServiceTemperature) {
		throw new Error(
			`${data.name} would run at ${hotFaceTemperature.toFixed(1)} K, above its maximum use temperature of ${data.maxServiceTemperature.toFixed(1)} K: choose a material rated for it`
		);
	}
}
