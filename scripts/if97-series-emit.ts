/**
 * Source text for IF97 series Σ nᵢ x^Iᵢ y^Jᵢ written out term by term, used by
 * generate-if97-series.ts. Every power is a named local formed once by a short chain of
 * multiplications, every coefficient a literal as the release prints it, and the terms that
 * share a power of x are summed before it is multiplied in.
 */

/** One table of the release, and what its variables stand for. */
export interface Series {
	/** Name of the exported function (Gibbs series: stem of the two exported functions). */
	name: string;
	/** The series and its source, for the JSDoc: e.g. 'θ = Σ nᵢ x^Iᵢ y^Jᵢ, table 20 (eq. 22)'. */
	summary: string;
	/** What x and y are, in the release's variables. */
	x: string;
	y: string;
	I: readonly number[];
	J: readonly number[];
	n: readonly number[];
	/** When the I are multiples of 1/root (table 25: quarters), x is the variable^(1/root). */
	root?: number;
}

/**
 * Statements forming base^e for every e in `needed` (e ≥ 2), each the product of two powers
 * already formed, choosing the pair with the shortest chain of dependent multiplications.
 * `name(e)` is the local holding base^e (name(1) is the base itself).
 */
function powerChain(needed: Iterable<number>, name: (e: number) => string): string[] {
	const depth = new Map<number, number>([[1, 0]]);
	const lines: string[] = [];
	const chain = (pair: [number, number]) => Math.max(depth.get(pair[0])!, depth.get(pair[1])!);
	const ensure = (e: number): void => {
		if (depth.has(e)) return;
		let best: [number, number] | null = null;
		for (const a of depth.keys()) {
			const b = e - a;
			if (b < a || !depth.has(b)) continue;
			if (best === null || chain([a, b]) < chain(best)) best = [a, b];
		}
		if (best === null) {
			const half = Math.floor(e / 2);
			ensure(half);
			ensure(e - half);
			best = [half, e - half];
		}
		depth.set(e, chain(best) + 1);
		lines.push(`const ${name(e)} = ${name(best[0])} * ${name(best[1])};`);
	};
	[...new Set(needed)].sort((a, b) => a - b).forEach(ensure);
	return lines;
}

/** Local holding v^e: v, v2, v3 … and vm1 = 1/v, vm2 … for negative e. */
const power = (v: string, e: number) => (e === 1 ? v : e < 0 ? `${v}m${-e}` : `${v}${e}`);

/** The powers of v (x or y) that exponents es need, including 1/v for negative ones. */
function powers(v: string, es: readonly number[]): string[] {
	const lines = powerChain(
		es.filter((e) => e > 1),
		(e) => power(v, e)
	);
	if (es.some((e) => e < 0)) lines.push(`const ${power(v, -1)} = 1 / ${v};`);
	lines.push(
		...powerChain(
			es.filter((e) => e < -1).map((e) => -e),
			(e) => power(v, -e)
		)
	);
	return lines;
}

/** A coefficient written as the release prints it, 0.dddd…e±k, so it reads like the table. */
function releaseStyle(n: number): string {
	const [mantissa, exponent] = Math.abs(n).toExponential().split('e');
	const e = Number(exponent) + 1;
	const text = `0.${mantissa.replace('.', '')}${e === 0 ? '' : `e${e}`}`;
	if (Number(text) !== Math.abs(n)) throw new Error(`coefficient ${n} does not round-trip`);
	return n < 0 ? `-${text}` : text;
}

/** Integer exponents of x: the I, times root where the table's are fractions. */
function xExponents(s: Series): number[] {
	return s.I.map((I) => {
		const e = I * (s.root ?? 1);
		if (!Number.isInteger(e)) throw new Error(`${s.name}: I = ${I} is not a multiple of 1/root`);
		return e;
	});
}

/** The powers of x and y, then one line per table row: cᵢ = nᵢ·y^Jᵢ. */
function terms(s: Series): string[] {
	const I = xExponents(s);
	if (!s.J.every(Number.isInteger)) throw new Error(`${s.name}: J must be integers`);
	const ideal = I.every((e) => e === 0);
	const shown = (k: number) =>
		ideal ? '' : s.root ? `I = ${s.I[k]} (x^${I[k]}), ` : `I = ${I[k]}, `;
	return [
		...powers('x', I),
		...powers('y', s.J),
		...s.n.map((n, k) => {
			const J = s.J[k];
			const factor = J === 0 ? '' : ` * ${power('y', J)}`;
			return `const c${k + 1} = ${releaseStyle(n)}${factor}; // ${shown(k)}J = ${J}`;
		})
	];
}

/** Rows grouped by their exponent of x, in rising order. */
function groups(s: Series): { e: number; rows: { i: number; J: number }[] }[] {
	const byE = new Map<number, { i: number; J: number }[]>();
	xExponents(s).forEach((e, k) => {
		if (!byE.has(e)) byE.set(e, []);
		byE.get(e)!.push({ i: k + 1, J: s.J[k] });
	});
	return [...byE.entries()].sort((a, b) => a[0] - b[0]).map(([e, rows]) => ({ e, rows }));
}

const groupName = (prefix: string, e: number) => (e < 0 ? `${prefix}m${-e}` : `${prefix}${e}`);

/**
 * Per group: x^e times Σ w(J)·cᵢ, as `const <prefix><e> = …`, for each weight w; the weights
 * are the factors the y-derivatives bring down: 1, J, J(J−1), J(J−1)(J−2).
 */
function groupSums(s: Series, weights: [string, (J: number) => number][]): string[] {
	const lines: string[] = [];
	for (const { e, rows } of groups(s)) {
		for (const [prefix, w] of weights) {
			const inner = signedSum(rows.map(({ i, J }) => [w(J), `c${i}`]));
			if (inner === '0') continue;
			const scaled = e === 0 ? inner : `${power('x', e)} * (${inner})`;
			lines.push(`const ${groupName(prefix, e)} = ${scaled};`);
		}
	}
	return lines;
}

/** Σ over groups of k(e)·<prefix>e, leaving out groups without that sum or with k = 0. */
function total(s: Series, prefix: string, k: (e: number) => number, lines: string[]): string {
	const declared = new Set(lines.flatMap((l) => /^const (\w+)/.exec(l)?.slice(1) ?? []));
	return signedSum(
		groups(s).map(({ e }): [number, string] => {
			const name = groupName(prefix, e);
			return [declared.has(name) ? k(e) : 0, name];
		})
	);
}

/** Σ wᵢ·nameᵢ as source, e.g. 'c2 - 3 * c3 + 2 * c6', leaving out zero weights. */
function signedSum(parts: [number, string][]): string {
	let text = '';
	for (const [w, name] of parts) {
		if (w === 0) continue;
		const term = Math.abs(w) === 1 ? name : `${Math.abs(w)} * ${name}`;
		text += text === '' ? (w < 0 ? `-${term}` : term) : w < 0 ? ` - ${term}` : ` + ${term}`;
	}
	return text === '' ? '0' : text;
}

const one = () => 1;
const first = (e: number) => e;
const second = (e: number) => e * (e - 1);
const third = (e: number) => e * (e - 1) * (e - 2);

/** Value only: the backward equations. */
export function valueFunction(s: Series): string {
	const body = [...terms(s), ...groupSums(s, [['s', one]])];
	return `
/**
 * ${s.summary},
 * with x = ${s.x} and y = ${s.y}.
 */
export function ${s.name}(x: number, y: number): number {
	${body.join('\n')}
	return ${total(s, 's', one, body)};
}`;
}

/**
 * A Gibbs series with its first and second partial derivatives (<name>Into) and with its
 * y-derivatives up to the third (<name>TauInto), into the slots of power-series.ts. Each
 * derivative weight brings down one power of its variable, divided out once at the end.
 */
export function gibbsFunctions(s: Series): string {
	if (s.root) throw new Error('Gibbs series have integer exponents');
	const full = [
		...terms(s),
		...groupSums(s, [
			['s', one],
			['t', first],
			['u', second]
		])
	];
	const tau = [
		...terms(s),
		...groupSums(s, [
			['s', one],
			['t', first],
			['u', second],
			['v', third]
		])
	];
	return `
/**
 * ${s.summary}
 * with x = ${s.x} and y = ${s.y}, and its first and second partial derivatives,
 * into out[F], out[F_X], out[F_XX], out[F_Y], out[F_YY], out[F_XY]. s, t and u sum each group of
 * rows of equal I weighted by 1, J and J(J − 1); the x-derivatives weight the groups by I and
 * I(I − 1). The weights bring down one power of the variable, divided out once at the end, so
 * x and y must not be zero (see power-series.ts for why they never are).
 */
export function ${s.name}Into(x: number, y: number, out: Float64Array): void {
	${full.join('\n')}
	const rx = 1 / x;
	const ry = 1 / y;
	out[F] = ${total(s, 's', one, full)};
	out[F_X] = (${total(s, 's', first, full)}) * rx;
	out[F_XX] = (${total(s, 's', second, full)}) * rx * rx;
	out[F_Y] = (${total(s, 't', one, full)}) * ry;
	out[F_YY] = (${total(s, 'u', one, full)}) * ry * ry;
	out[F_XY] = (${total(s, 't', first, full)}) * rx * ry;
}

/**
 * Only the y-derivatives of the same series, up to the third, into out[F], out[F_Y],
 * out[F_YY], out[F_YYY] (y ≠ 0): enough for h, s, cp and dcp/dT, all a temperature iteration
 * needs; v sums the rows weighted by J(J − 1)(J − 2).
 */
export function ${s.name}TauInto(x: number, y: number, out: Float64Array): void {
	${tau.join('\n')}
	const ry = 1 / y;
	out[F] = ${total(s, 's', one, tau)};
	out[F_Y] = (${total(s, 't', one, tau)}) * ry;
	out[F_YY] = (${total(s, 'u', one, tau)}) * ry * ry;
	out[F_YYY] = (${total(s, 'v', one, tau)}) * ry * ry * ry;
}`;
}

/**
 * A series in y alone (the ideal-gas parts of regions 2 and 5, all Iᵢ = 0) with its first three
 * derivatives, into out[F], out[F_Y], out[F_YY], out[F_YYY].
 */
export function idealFunction(s: Series): string {
	if (s.I.some((I) => I !== 0)) throw new Error(`${s.name}: an ideal-gas part has no x`);
	const body = [
		...terms(s),
		...groupSums(s, [
			['s', one],
			['t', first],
			['u', second],
			['v', third]
		])
	];
	return `
/**
 * ${s.summary}
 * with y = ${s.y}, and its first three derivatives, into out[F], out[F_Y], out[F_YY], out[F_YYY];
 * s, t, u, v sum the rows weighted by 1, J, J(J − 1), J(J − 1)(J − 2).
 */
export function ${s.name}(y: number, out: Float64Array): void {
	${body.join('\n')}
	const ry = 1 / y;
	out[F] = ${total(s, 's', one, body)};
	out[F_Y] = (${total(s, 't', one, body)}) * ry;
	out[F_YY] = (${total(s, 'u', one, body)}) * ry * ry;
	out[F_YYY] = (${total(s, 'v', one, body)}) * ry * ry * ry;
}`;
}
