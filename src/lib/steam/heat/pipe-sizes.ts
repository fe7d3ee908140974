/**
 * Outside diameters of steel pipe by nominal size, ASME B36.10M (Welded and Seamless Wrought
 * Steel Pipe), NPS ½ to 24 with the DN equivalents. The outside diameter of a nominal size is
 * the same for every schedule, which is all a heat-loss estimate needs.
 */
import { SteamRangeError } from '../errors';

export interface NominalPipeSize {
	/** Nominal pipe size [in, as a number: 0.5 for ½]. */
	nps: number;
	/** Diameter nominal (metric designation). */
	dn: number;
	/** Outside diameter [m]. */
	outerDiameter: number;
}

// [NPS, DN, OD mm] from ASME B36.10M; 18–24 are given to whole millimetres there.
const TABLE: readonly (readonly [number, number, number])[] = [
	[0.5, 15, 21.3],
	[0.75, 20, 26.7],
	[1, 25, 33.4],
	[1.25, 32, 42.2],
	[1.5, 40, 48.3],
	[2, 50, 60.3],
	[2.5, 65, 73.0],
	[3, 80, 88.9],
	[3.5, 90, 101.6],
	[4, 100, 114.3],
	[5, 125, 141.3],
	[6, 150, 168.3],
	[8, 200, 219.1],
	[10, 250, 273.0],
	[12, 300, 323.8],
	[14, 350, 355.6],
	[16, 400, 406.4],
	[18, 450, 457],
	[20, 500, 508],
	[22, 550, 559],
	[24, 600, 610]
];

/** All tabulated nominal sizes, smallest first. */
export const NOMINAL_PIPE_SIZES: readonly NominalPipeSize[] = TABLE.map(([nps, dn, mm]) => ({
	nps,
	dn,
	outerDiameter: mm / 1000
}));

const listNps = TABLE.map(([nps]) => nps).join(', ');
const listDn = TABLE.map(([, dn]) => dn).join(', ');

/**
 * The nominal size with a given NPS (inches, e.g. 0.5, 1.25, 6) or DN (e.g. 15, 32, 150).
 * Throws a SteamRangeError naming the sizes carried if there is no such size.
 */
export function nominalPipeSize(size: { nps: number } | { dn: number }): NominalPipeSize {
	if ('nps' in size) {
		const found = NOMINAL_PIPE_SIZES.find((row) => row.nps === size.nps);
		if (!found) throw new SteamRangeError('nps', size.nps, `one of ${listNps}`);
		return found;
	}
	const found = NOMINAL_PIPE_SIZES.find((row) => row.dn === size.dn);
	if (!found) throw new SteamRangeError('dn', size.dn, `one of ${listDn}`);
	return found;
}

/** Outside diameter [m] of a nominal pipe size given by NPS or DN (ASME B36.10M). */
export function pipeOutsideDiameter(size: { nps: number } | { dn: number }): number {
	return nominalPipeSize(size).outerDiameter;
}

/** A pipe given by exactly one of: outside diameter [m], NPS or DN. */
export interface PipeSizeInput {
	outerDiameter?: number;
	nps?: number;
	dn?: number;
}

/** Outside diameter [m] from exactly one of outerDiameter, nps or dn. */
export function resolveOuterDiameter(size: PipeSizeInput): number {
	const given = [size.outerDiameter, size.nps, size.dn].filter((v) => v !== undefined).length;
	if (given !== 1) {
		throw new TypeError(
			`Give exactly one of outerDiameter (m), nps or dn for the pipe size; ${given} were given`
		);
	}
	if (size.nps !== undefined) return pipeOutsideDiameter({ nps: size.nps });
	if (size.dn !== undefined) return pipeOutsideDiameter({ dn: size.dn });
	return size.outerDiameter as number;
}
