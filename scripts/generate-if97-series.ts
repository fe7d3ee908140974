/**
 * Writes the IF97 Gibbs series of regions 1 and 2 out term by term, as straight-line code:
 * `npx tsx scripts/generate-gibbs-series.ts` (run by hand after changing a table or this
 * script; `--check` only reports whether the committed files are current).
 *
 * Why: the general evaluator in power-series.ts fills its power tables in a loop through index
 * arrays, which V8 cannot unroll; for the 43 terms of region 2 that loop was a third of the
 * time of a whole stateFromPT. Written out, every power is a named local formed once by a
 * short chain of multiplications, every coefficient (and its derivative weights J·n, J(J−1)·n)
 * is a literal, and the terms sharing a power of the first variable are summed before it is
 * multiplied in, so each term costs three or four multiply-adds.
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import * as prettier from 'prettier';
import * as region1 from '../src/lib/steam/region1-coefficients';
import * as region2 from '../src/lib/steam/region2-coefficients';

interface SeriesSpec {
	/** File written, relative to src/lib/steam. */
	file: string;
	/** Name stem of the two exported functions. */
	name: string;
	/** Where the table comes from, for the header. */
	table: string;
	/** The series in the release's own variables, for the JSDoc. */
	formula: string;
	/** What x and y are. */
	x: string;
	y: string;
	I: readonly number[];
	J: readonly number[];
	n: readonly number[];
}

const SPECS: SeriesSpec[] = [
	{
		file: 'region1-series.generated.ts',
		name: 'region1Series',
		table: 'IAPWS R7-97(2012) table 2 (region1-coefficients.ts)',
		formula: 'γ = Σ nᵢ x^Iᵢ y^Jᵢ (eq. 7)',
		x: '7.1 − π',
		y: 'τ − 1.222',
		...region1
	},
	{
		file: 'region2-residual.generated.ts',
		name: 'region2Residual',
		table: 'IAPWS R7-97(2012) table 11 (region2-coefficients.ts)',
		formula: 'γʳ = Σ nᵢ x^Iᵢ y^Jᵢ (eq. 17)',
		x: 'π',
		y: 'τ − 0.5',
		...region2
	}
];

/**
 * Statements forming base^e for every e in `needed` (e ≥ 2), each the product of two powers
 * already formed, choosing the pair with the shortest chain of dependent multiplications.
 * `name(e)` is the local holding base^e (name(1) is the base itself).
 */
function powerChain(needed: Iterable<number>, name: (e: number) => string): string[] {
	const depth = new Map<number, number>([[1, 0]]);
	const lines: string[] = [];
	const ensure = (e: number): void => {
		if (depth.has(e)) return;
		let best: [number, number] | null = null;
		for (const a of depth.keys()) {
			const b = e - a;
			if (b < a || !depth.has(b)) continue;
			const d = Math.max(depth.get(a)!, depth.get(b)!);
			if (best === null || d < Math.max(depth.get(best[0])!, depth.get(best[1])!)) best = [a, b];
		}
		if (best === null) {
			const half = Math.floor(e / 2);
			ensure(half);
			ensure(e - half);
			best = [half, e - half];
		}
		depth.set(e, Math.max(depth.get(best[0])!, depth.get(best[1])!) + 1);
		lines.push(`const ${name(e)} = ${name(best[0])} * ${name(best[1])};`);
	};
	[...new Set(needed)].sort((a, b) => a - b).forEach(ensure);
	return lines;
}

const xName = (e: number) => (e === 1 ? 'x' : `x${e}`);
/** y^J, with 1/y for negative J (region 1). */
const yName = (e: number) => (e === 1 ? 'y' : e === -1 ? 'z' : e < 0 ? `z${-e}` : `y${e}`);

/** A coefficient written as the release prints it, 0.dddd…e±k, so it reads like the table. */
function releaseStyle(n: number): string {
	const [mantissa, exponent] = Math.abs(n).toExponential().split('e');
	const power = Number(exponent) + 1;
	const text = `0.${mantissa.replace('.', '')}${power === 0 ? '' : `e${power}`}`;
	if (Number(text) !== Math.abs(n)) throw new Error(`coefficient ${n} does not round-trip`);
	return n < 0 ? `-${text}` : text;
}

function sum(parts: string[]): string {
	const kept = parts.filter(Boolean);
	return kept.length === 0 ? '0' : kept.join(' + ');
}

interface Group {
	I: number;
	terms: { i: number; J: number }[];
}

function groups(spec: SeriesSpec): Group[] {
	const byI = new Map<number, Group>();
	spec.I.forEach((I, k) => {
		if (!Number.isInteger(I) || !Number.isInteger(spec.J[k])) throw new Error('integer exponents');
		if (!byI.has(I)) byI.set(I, { I, terms: [] });
		byI.get(I)!.terms.push({ i: k + 1, J: spec.J[k] });
	});
	return [...byI.values()].sort((a, b) => a.I - b.I);
}

/** The powers of x and y both functions need. */
function powers(spec: SeriesSpec): string[] {
	const lines = powerChain(
		spec.I.filter((e) => e > 1),
		xName
	);
	if (spec.J.some((e) => e < 0)) lines.push('const z = 1 / y;');
	lines.push(
		...powerChain(
			spec.J.filter((e) => e > 1),
			yName
		),
		...powerChain(
			spec.J.filter((e) => e < -1).map((e) => -e),
			(e) => yName(-e)
		)
	);
	return lines;
}

/** One line per table row: cᵢ = nᵢ·y^Jᵢ. */
function termProducts(spec: SeriesSpec): string[] {
	return spec.n.map((n, k) => {
		const J = spec.J[k];
		const power = J === 0 ? '' : ` * ${yName(J)}`;
		return `const c${k + 1} = ${releaseStyle(n)}${power}; // I = ${spec.I[k]}, J = ${J}`;
	});
}

/**
 * Per group of equal I: x^I times Σ w(J)·cᵢ for each weight w, as `const <prefix><I> = …`.
 * The weights are the factors that y-derivatives bring down: 1, J, J(J−1), J(J−1)(J−2).
 */
function groupSums(spec: SeriesSpec, weights: [string, (J: number) => number][]): string[] {
	const lines: string[] = [];
	for (const { I, terms } of groups(spec)) {
		for (const [prefix, w] of weights) {
			const inner = sum(
				terms.map(({ i, J }) => {
					const k = w(J);
					return k === 0 ? '' : k === 1 ? `c${i}` : `${k} * c${i}`;
				})
			);
			if (inner === '0') continue;
			lines.push(`const ${prefix}${I} = ${I === 0 ? inner : `${xName(I)} * (${inner})`};`);
		}
	}
	return lines;
}

/** Σ over groups of weight(I)·<prefix>I, skipping groups without that sum or with weight 0. */
function total(spec: SeriesSpec, prefix: string, w: (I: number) => number, has: Set<string>) {
	return sum(
		groups(spec).map(({ I }) => {
			const k = w(I);
			if (k === 0 || !has.has(`${prefix}${I}`)) return '';
			return k === 1 ? `${prefix}${I}` : `${k} * ${prefix}${I}`;
		})
	);
}

const declared = (lines: string[]) =>
	new Set(lines.flatMap((l) => /^const (\w+)/.exec(l)?.slice(1) ?? []));

const one = () => 1;
const first = (e: number) => e;
const second = (e: number) => e * (e - 1);
const third = (e: number) => e * (e - 1) * (e - 2);

function fullFunction(spec: SeriesSpec): string {
	const body = [
		...powers(spec),
		...termProducts(spec),
		...groupSums(spec, [
			['s', one],
			['t', first],
			['u', second]
		])
	];
	const has = declared(body);
	return `
/**
 * ${spec.formula} with x = ${spec.x}, y = ${spec.y}, and its first and second partial
 * derivatives, into out[F], out[F_X], out[F_XX], out[F_Y], out[F_YY], out[F_XY]. s, t and u
 * hold each group's terms weighted by 1, J and J(J − 1); the x-derivatives weight the groups by
 * I and I(I − 1). Both weights bring down one power of the variable, divided out once at the
 * end, so x and y must not be zero (see power-series.ts for why they never are).
 */
export function ${spec.name}Into(x: number, y: number, out: Float64Array): void {
	${body.join('\n')}
	const rx = 1 / x;
	const ry = 1 / y;
	out[F] = ${total(spec, 's', one, has)};
	out[F_X] = (${total(spec, 's', first, has)}) * rx;
	out[F_XX] = (${total(spec, 's', second, has)}) * rx * rx;
	out[F_Y] = (${total(spec, 't', one, has)}) * ry;
	out[F_YY] = (${total(spec, 'u', one, has)}) * ry * ry;
	out[F_XY] = (${total(spec, 't', first, has)}) * rx * ry;
}`;
}

function tauFunction(spec: SeriesSpec): string {
	const body = [
		...powers(spec),
		...termProducts(spec),
		...groupSums(spec, [
			['s', one],
			['t', first],
			['u', second],
			['v', third]
		])
	];
	const has = declared(body);
	return `
/**
 * Only the y-derivatives of the same series, up to the third, into out[F], out[F_Y],
 * out[F_YY], out[F_YYY] (y ≠ 0): enough for h, s, cp and dcp/dT, all a temperature iteration
 * needs.
 */
export function ${spec.name}TauInto(x: number, y: number, out: Float64Array): void {
	${body.join('\n')}
	const ry = 1 / y;
	out[F] = ${total(spec, 's', one, has)};
	out[F_Y] = (${total(spec, 't', one, has)}) * ry;
	out[F_YY] = (${total(spec, 'u', one, has)}) * ry * ry;
	out[F_YYY] = (${total(spec, 'v', one, has)}) * ry * ry * ry;
}`;
}

function source(spec: SeriesSpec): string {
	return `/**
 * GENERATED by scripts/generate-gibbs-series.ts from ${spec.table}.
 * Do not edit: change the table or the script, then run \`npx tsx scripts/generate-gibbs-series.ts\`.
 *
 * ${spec.formula}, x = ${spec.x}, y = ${spec.y}, written out term by term: cᵢ is table row i,
 * nᵢ·y^Jᵢ, with nᵢ as the release prints it; s, t, u (and v) sum a group of rows of equal I.
 */
import { F, F_X, F_XX, F_XY, F_Y, F_YY, F_YYY } from './power-series';
${fullFunction(spec)}
${tauFunction(spec)}
`;
}

async function main(): Promise<void> {
	const check = process.argv.includes('--check');
	const dir = fileURLToPath(new URL('../src/lib/steam/', import.meta.url));
	let stale = 0;
	for (const spec of SPECS) {
		const path = dir + spec.file;
		const options = { ...(await prettier.resolveConfig(path)), filepath: path };
		const text = await prettier.format(source(spec), options);
		let current = '';
		try {
			current = readFileSync(path, 'utf8');
		} catch {
			// Not written yet.
		}
		if (current === text) continue;
		stale++;
		if (check)
			console.error(`${spec.file} is out of date: run npx tsx scripts/generate-gibbs-series.ts`);
		else writeFileSync(path, text);
	}
	if (check && stale > 0) process.exit(1);
	if (!check) console.log(`${stale} of ${SPECS.length} files written`);
}

await main();
