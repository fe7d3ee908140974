/**
 * `npm run bench`: evaluations per second of the steam engine, single-threaded, beside the same
 * operations through Debian's python3-iapws (scripts/bench_iapws.py), with the targets of the
 * engine's issue. Benchmarks print figures; tests never time things.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import {
	saturationTemperature,
	stateFromPH,
	stateFromPS,
	stateFromPT
} from '../src/lib/steam/index';
import { heapFigures, heapUsed } from './bench-heap';
import { benchInputs, type BenchInputs, type Operation } from './bench-inputs';

const WARM_UP_S = 0.5;
const MEASURE_S = 3;
const PYTHON_S = 2;
const PYTHON_INPUTS = 1024;
const MIN_RATIO = 200;
const PYTHON = '/usr/bin/python3';
const PY_SCRIPT = fileURLToPath(new URL('./bench_iapws.py', import.meta.url));

type Pass = (a: Float64Array, b: Float64Array) => number;

/**
 * One pass over the inputs per operation, each its own function so every call site in the
 * hot loop sees one callee. The sums are returned and kept, so no call can be optimised away.
 */
const ROWS: { op: Operation; label: string; pass: Pass; target?: number }[] = [
	{
		op: 'ptRegion1',
		label: 'stateFromPT, region 1',
		target: 2e6,
		pass: (a, b) => {
			let sum = 0;
			for (let i = 0; i < a.length; i++) sum += stateFromPT(a[i], b[i]).h;
			return sum;
		}
	},
	{
		op: 'ptRegion2',
		label: 'stateFromPT, region 2',
		target: 2e6,
		pass: (a, b) => {
			let sum = 0;
			for (let i = 0; i < a.length; i++) sum += stateFromPT(a[i], b[i]).h;
			return sum;
		}
	},
	{
		op: 'saturationTemperature',
		label: 'saturationTemperature',
		pass: (a) => {
			let sum = 0;
			for (let i = 0; i < a.length; i++) sum += saturationTemperature(a[i]);
			return sum;
		}
	},
	{
		op: 'ph',
		label: 'stateFromPH',
		target: 1e6,
		pass: (a, b) => {
			let sum = 0;
			for (let i = 0; i < a.length; i++) sum += stateFromPH(a[i], b[i]).T;
			return sum;
		}
	},
	{
		op: 'ps',
		label: 'stateFromPS',
		pass: (a, b) => {
			let sum = 0;
			for (let i = 0; i < a.length; i++) sum += stateFromPS(a[i], b[i]).T;
			return sum;
		}
	}
];

let sink = 0;

/** Evaluations per second, timing whole passes so the clock is not read per call. */
function rate(pass: Pass, a: Float64Array, b: Float64Array, seconds: number): number {
	let count = 0;
	const start = performance.now();
	for (;;) {
		sink += pass(a, b);
		count += a.length;
		const elapsed = (performance.now() - start) / 1000;
		if (elapsed >= seconds) return count / elapsed;
	}
}

interface PythonRates {
	library: string;
	evalsPerSecond: Record<Operation, number>;
	core: Partial<Record<Operation, number>>;
}

/** The same operations through python3-iapws, or null when it is not installed. */
function pythonRates(inputs: BenchInputs): PythonRates | null {
	if (spawnSync(PYTHON, ['-c', 'import iapws'], { stdio: 'ignore' }).status !== 0) return null;
	const job = { seconds: PYTHON_S, inputs: {} as Record<string, number[] | number[][]> };
	for (const { op } of ROWS) {
		const { a, b } = inputs[op];
		const firsts = Array.from(a.subarray(0, PYTHON_INPUTS));
		job.inputs[op] = op === 'saturationTemperature' ? firsts : firsts.map((x, i) => [x, b[i]]);
	}
	const out = execFileSync(PYTHON, [PY_SCRIPT], { input: JSON.stringify(job), encoding: 'utf8' });
	return JSON.parse(out) as PythonRates;
}

function si(n: number): string {
	if (n >= 1e6) return `${(n / 1e6).toFixed(2)} M`;
	if (n >= 1e3) return `${(n / 1e3).toFixed(1)} k`;
	return n.toFixed(0);
}

const verdict = (ok: boolean) => (ok ? 'pass' : 'FAIL');
const cells = (...c: string[]) =>
	c[0].padEnd(24) +
	c
		.slice(1, 4)
		.map((x) => x.padStart(12))
		.join('') +
	`  ${c[4]}`;

function main(): void {
	const inputs = benchInputs();
	const startHeap = heapUsed();
	const ours = new Map<Operation, number>();
	for (const { op, pass } of ROWS) {
		rate(pass, inputs[op].a, inputs[op].b, WARM_UP_S);
		ours.set(op, rate(pass, inputs[op].a, inputs[op].b, MEASURE_S));
	}
	const memory = heapFigures(startHeap);
	const python = pythonRates(inputs);
	const lines = [
		`Node ${process.version}, one thread, ${MEASURE_S} s per operation after ${WARM_UP_S} s warm-up`,
		python
			? `beside ${python.library} (IAPWS-IF97), IAPWS97() calls (its _TSat_P for saturationTemperature), ${PYTHON_S} s each`
			: 'python3-iapws not found (apt-get install -y python3-iapws): engine figures only',
		'',
		cells('operation', 'Steamwisp/s', 'iapws/s', 'ratio', 'targets')
	];
	for (const { op, label, target } of ROWS) {
		const mine = ours.get(op) ?? 0;
		const theirs = python?.evalsPerSecond[op];
		const ratio = theirs ? mine / theirs : undefined;
		const targets = [
			target ? `≥ ${si(target)}/s ${verdict(mine >= target)}` : '',
			ratio === undefined ? '' : `≥ ${MIN_RATIO}× python ${verdict(ratio >= MIN_RATIO)}`
		];
		const theirCell = theirs ? si(theirs) : '–';
		const ratioCell = ratio ? `${ratio.toFixed(0)}×` : '–';
		lines.push(cells(label, si(mine), theirCell, ratioCell, targets.filter(Boolean).join('; ')));
	}
	if (python) {
		lines.push(
			'',
			'IAPWS97() also computes transport and derived properties; the bare region functions:'
		);
		for (const [op, name] of [
			['ptRegion1', '_Region1'],
			['ptRegion2', '_Region2']
		] as const) {
			const core = python.core[op] ?? 0;
			lines.push(
				`  ${name}(T, p) ${si(core)}/s, Steamwisp ${((ours.get(op) ?? 0) / core).toFixed(0)}× that`
			);
		}
	}
	lines.push('', ...memory, `(checksum ${sink.toPrecision(6)})`);
	console.log(lines.join('\n'));
}

main();
