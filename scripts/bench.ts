/**
 * `npm run bench`: evaluations per second of the steam engine, single-threaded, beside the same
 * operations through Debian's python3-iapws (scripts/bench_iapws.py), with the targets of the
 * engine's issue; then the loss engine's orifice flow and finding evaluation (bench-losses.ts),
 * which have no python counterpart. Benchmarks print figures; tests never time things.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { availableParallelism, loadavg } from 'node:os';
import { fileURLToPath } from 'node:url';
import {
	saturationTemperature,
	stateFromPH,
	stateFromPS,
	stateFromPT
} from '../src/lib/steam/index';
import { heapFigures, heapUsed } from './bench-heap';
import { benchInputs, type BenchInputs, type Operation } from './bench-inputs';
import { lossRows, type LossRow } from './bench-losses';

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

/** Seconds of CPU this process has used (all its threads, so GC and JIT count against us). */
const cpuSeconds = () => {
	const { user, system } = process.cpuUsage();
	return (user + system) / 1e6;
};

/**
 * Evaluations per CPU second and per wall-clock second, timing whole passes so the clocks are
 * not read per call. CPU time is what the table shows: on a shared machine other work steals
 * wall-clock time from both sides unevenly, while CPU time stays the cost of the operation.
 */
function rate(pass: () => number, calls: number, seconds: number) {
	let count = 0;
	const wall = performance.now();
	const cpu = cpuSeconds();
	for (;;) {
		sink += pass();
		count += calls;
		const used = cpuSeconds() - cpu;
		if (used >= seconds)
			return { cpu: count / used, wall: count / ((performance.now() - wall) / 1000) };
	}
}

type Rates = Record<Operation, number>;

interface PythonRates {
	library: string;
	cpu: Rates;
	wall: Rates;
	core: Partial<Rates>;
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
const row = (name: string, ...rest: string[]) => {
	const numbers = rest.slice(0, 3).map((c) => c.padStart(12));
	return `${name.padEnd(28)}${numbers.join('')}  ${rest[3]}`.trimEnd();
};

/** The side-by-side table: evaluations per CPU second, the ratio, and the targets. */
function table(ours: { cpu: Rates; wall: Rates }, python: PythonRates | null): string[] {
	const lines = [row('operation', 'Steamwisp/s', 'iapws/s', 'ratio', 'targets')];
	for (const { op, label, target } of ROWS) {
		const mine = ours.cpu[op];
		const theirs = python?.cpu[op];
		const ratio = theirs ? mine / theirs : undefined;
		const targets = [
			target ? `≥ ${si(target)}/s ${verdict(mine >= target)}` : '',
			ratio === undefined ? '' : `≥ ${MIN_RATIO}× python ${verdict(ratio >= MIN_RATIO)}`
		];
		const ratioCell = ratio ? `${ratio.toFixed(0)}×` : '–';
		lines.push(
			row(label, si(mine), theirs ? si(theirs) : '–', ratioCell, targets.filter(Boolean).join('; '))
		);
	}
	const wall = (r: Rates) => ROWS.map(({ op }) => si(r[op])).join(', ');
	lines.push('', `per wall-clock second, same order: Steamwisp ${wall(ours.wall)}`);
	if (!python) return lines;
	lines.push(`  python3-iapws ${wall(python.wall)}`);
	lines.push(
		'IAPWS97() also computes transport and derived properties; its bare functions, like for like:'
	);
	for (const [op, name] of [
		['ptRegion1', '_Region1(T, p)'],
		['ptRegion2', '_Region2(T, p)'],
		['saturationTemperature', '_TSat_P(p)']
	] as const) {
		const core = python.core[op] ?? NaN;
		lines.push(`  ${name} ${si(core)}/s, Steamwisp ${(ours.cpu[op] / core).toFixed(0)}× that`);
	}
	return lines;
}

interface Timed {
	run: () => number;
	calls: number;
}

/** The loss-engine rows: calls per CPU second (and wall-clock second), against their targets. */
function lossTable(rows: (LossRow & Timed)[]): string[] {
	const lines = [
		'',
		'loss engine, no python counterpart (calls per CPU second, and per wall-clock second):',
		row('operation', 'Steamwisp/s', 'wall/s', '', 'targets')
	];
	for (const { label, calls, target, run } of rows) {
		const { cpu, wall } = rate(run, calls, MEASURE_S);
		const goal = target ? `≥ ${si(target)}/s ${verdict(cpu >= target)}` : '';
		lines.push(row(label, si(cpu), si(wall), '', goal));
	}
	return lines;
}

function main(): void {
	const inputs = benchInputs();
	const engine = ROWS.map(({ op, pass }) => {
		const { a, b } = inputs[op];
		return { op, run: () => pass(a, b), calls: a.length };
	});
	const loss = lossRows().map((r) => ({ ...r, run: r.pass }));
	const startHeap = heapUsed();
	// Every operation is warmed up before any is timed, so each is timed as a long-running
	// server runs it: compiled with feedback from all paths, young generation grown to its size.
	for (const { run, calls } of [...engine, ...loss]) rate(run, calls, WARM_UP_S);
	const ours = { cpu: {} as Rates, wall: {} as Rates };
	for (const { op, run, calls } of engine) {
		({ cpu: ours.cpu[op], wall: ours.wall[op] } = rate(run, calls, MEASURE_S));
	}
	const losses = lossTable(loss);
	const memory = heapFigures(startHeap);
	const python = pythonRates(inputs);
	const load = loadavg()[0].toFixed(1);
	console.log(
		[
			`Node ${process.version}, one thread, ${MEASURE_S} CPU-seconds per operation, all warmed up ${WARM_UP_S} s each first;`,
			`load average ${load} on ${availableParallelism()} CPUs (rates are per CPU second of this process)`,
			python
				? `beside ${python.library} (IAPWS-IF97): its public IAPWS97() calls (saturationTemperature: IAPWS97(P, x=0).T)`
				: 'python3-iapws not found (apt-get install -y python3-iapws): engine figures only',
			'',
			...table(ours, python),
			...losses,
			'',
			...memory,
			`(checksum ${sink.toPrecision(6)})`
		].join('\n')
	);
}

main();
