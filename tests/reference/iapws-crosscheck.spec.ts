/**
 * Cross-check of the steam engine against Debian's python3-iapws (IAPWS-IF97), a general-purpose
 * reference library: ≥ 5,000 seeded states over regions 1, 2, 3, 5, the saturation line, two-phase
 * states and the (p,h) and (p,s) inversions, every property compared. Which states are left out
 * (region boundaries, the critical neighbourhood) and where the reference is not python3-iapws's
 * own answer (two-phase above 623.15 K) is explained, with reasons, in iapws_points.py.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import {
	saturatedLiquid,
	saturatedVapour,
	saturationPressure,
	saturationTemperature,
	stateFromPH,
	stateFromPS,
	stateFromPT,
	stateFromPX,
	stateFromTX
} from '../../src/lib/steam/index';
import type { SteamState } from '../../src/lib/steam/types';
import {
	ensureIapws,
	loadReferencePoints,
	type ReferencePoint,
	type ReferenceState
} from './iapws-reference';

const TOLERANCE = 1e-6;
const PROPERTIES = ['p', 'T', 'v', 'h', 'u', 's', 'cp', 'cv', 'w', 'x'] as const;
type Property = (typeof PROPERTIES)[number];

/**
 * Relative deviations are taken against max(|reference|, floor). h, u and s are zero by
 * definition at the triple point (IF97's reference state), so near it a plain relative deviation
 * divides round-off by nearly nothing. The floors make the bound there an absolute one of
 * 1e-8 kJ/kg and 1e-11 kJ/(kg K), far below any digit the product shows.
 */
const FLOOR: Partial<Record<Property, number>> = { h: 0.01, u: 0.01, s: 1e-5 };

interface Worst {
	deviation: number;
	where: string;
	count: number;
}

function evaluate(point: ReferencePoint): Partial<SteamState> {
	const { p = NaN, T = NaN, x = NaN, h = NaN, s = NaN } = point;
	switch (point.kind) {
		case 'pt':
			return stateFromPT(p, T);
		case 'psat':
			return { p: saturationPressure(T) };
		case 'tsat':
			return { T: saturationTemperature(p) };
		case 'satliq':
			return saturatedLiquid(p);
		case 'satvap':
			return saturatedVapour(p);
		case 'px':
			return stateFromPX(p, x);
		case 'tx':
			return stateFromTX(T, x);
		case 'ph':
			return stateFromPH(p, h);
		case 'ps':
			return stateFromPS(p, s);
	}
}

function describePoint(point: ReferencePoint): string {
	const inputs = (['p', 'T', 'h', 's', 'x'] as const)
		.filter((k) => point[k] !== undefined)
		.map((k) => `${k}=${point[k]}`);
	return `${point.kind}(${inputs.join(', ')})${point.built === 'lever' ? ' [lever]' : ''}`;
}

/**
 * On the saturation line a state is on region 4's boundary and is computed by the equation of
 * the phase it is (1 or 2 below 623.15 K, 3 above); python3-iapws reports the latter, and
 * either is a correct answer, so a saturated end state may carry either number.
 */
function regionAgrees(point: ReferencePoint, got: Partial<SteamState>): boolean {
	if (point.ref.region === undefined) return true;
	const saturatedEnd = point.kind === 'satliq' || point.kind === 'satvap';
	return got.region === point.ref.region || (saturatedEnd && got.region === 4);
}

function compare(points: ReferencePoint[]) {
	const worst = Object.fromEntries(
		PROPERTIES.map((k) => [k, { deviation: 0, where: 'n/a', count: 0 }])
	) as Record<Property, Worst>;
	const problems: string[] = [];
	for (const point of points) {
		let got: Partial<SteamState>;
		try {
			got = evaluate(point);
		} catch (error) {
			problems.push(`${describePoint(point)} threw ${String(error)}`);
			continue;
		}
		if (!regionAgrees(point, got)) {
			problems.push(
				`${describePoint(point)}: region ${got.region}, python3-iapws ${point.ref.region}`
			);
		}
		for (const k of PROPERTIES) {
			const want: ReferenceState[Property] = point.ref[k];
			if (want === undefined) continue;
			const have = got[k];
			if (want === null || typeof have !== 'number' || !Number.isFinite(have)) {
				if (want !== have) problems.push(`${describePoint(point)}: ${k} = ${have}, want ${want}`);
				continue;
			}
			const scale = Math.max(Math.abs(want), FLOOR[k] ?? 0);
			const deviation = have === want ? 0 : Math.abs(have - want) / scale;
			worst[k].count++;
			if (deviation > worst[k].deviation) {
				worst[k] = { ...worst[k], deviation, where: `${describePoint(point)}: ${have} vs ${want}` };
			}
		}
	}
	return { worst, problems };
}

function table(library: string, worst: Record<Property, Worst>): string {
	const rows = PROPERTIES.map(
		(k) =>
			`${k.padEnd(3)} ${String(worst[k].count).padStart(5)}  ${worst[k].deviation.toExponential(2).padStart(9)}  ${worst[k].where}`
	);
	const head = `Worst relative deviation from ${library} (IAPWS-IF97), tolerance ${TOLERANCE}`;
	return [head, 'prop     n      worst  where (engine vs python3-iapws)', ...rows].join('\n');
}

const library = ensureIapws();
const file = loadReferencePoints(library);

describe(`steam engine vs ${library}, IAPWS-IF97`, () => {
	let result: ReturnType<typeof compare>;

	beforeAll(() => {
		result = compare(file.points);
		console.log(table(library, result.worst));
		console.log(
			`points ${file.points.length}; dropped by the generator: ${JSON.stringify(file.meta.dropped)}`
		);
	});

	it('has at least 5,000 reference points', () => {
		expect(file.points.length).toBeGreaterThanOrEqual(5000);
	});

	it('gives a state for every point, in the same region, with null exactly where the reference has none', () => {
		expect(result.problems.slice(0, 20), `${result.problems.length} problems`).toEqual([]);
	});

	it.each(PROPERTIES)(`agrees on %s within ${TOLERANCE} relative`, (k) => {
		expect(result.worst[k].count).toBeGreaterThan(0);
		expect(result.worst[k].deviation, result.worst[k].where).toBeLessThanOrEqual(TOLERANCE);
	});
});
