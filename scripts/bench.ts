/**
 * `npm run bench`: evaluations per second of the steam engine, single-threaded, beside the same
 * operations through Debian's python3-iapws (scripts/bench_iapws.py), with the targets of the
 * engine's issue. Benchmarks print figures; tests never time things.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import * as steam from '../src/lib/steam/index';
import { heapFigures } from './bench-heap';
import { benchInputs, type Operation } from './bench-inputs';

const WARM_UP_S = 0.5;
const MEASURE_S = 3;
const PYTHON_S = 2;
const PYTHON_INPUTS = 1024;
const PYTHON = '/usr/bin/python3';
const PY_SCRIPT = fileURLToPath(new URL('./bench_iapws.py', import.meta.url));

interface Row {
	op: Operation;
	label: string;
	run: (a: number, b: number) => number;
	/** Minimum evaluations per second the issue asks for, if any. */
	target?: number;
}

const ROWS: Row[] = [
	{
		op: 'ptRegion1',
		label: 'stateFromPT, region 1',
		run: (p, T) => steam.stateFromPT(p, T).h,
		target: 2e6
	},
	{
		op: 'ptRegion2',
		label: 'stateFromPT, region 2',
		run: (p, T) => steam.stateFromPT(p, T).h,
		target: 2e6
	},
	{
		op: 'saturationTemperature',
		label: 'saturationTemperature',
		run: (p) => steam.saturationTemperature(p)
	},
	{ op: 'ph', label: 'stateFromPH', run: (p, h) => steam.stateFromPH(p, h).T, target: 1e6 },
	{ op: 'ps', label: 'stateFromPS', run: (p, s) => steam.stateFromPS(p, s).T }
];
const MIN_RATIO = 200;

/** Results are summed into this so the optimiser cannot drop the calls. */
let sink = 0;

function rate(run: Row['run'], a: Float64Array, b: Float64Array, seconds: number): number {
	let count = 0;
	const start = performance.now();
	for (;;) {
		for (let i = 0; i < a.length; i++) sink += run(a[i], b[i]);
		count += a.length;
		const elapsed = (performance.now() - start) / 1000;
		if (elapsed >= seconds) return count / elapsed;
	}
}

function pythonRates(inputs: ReturnType<typeof benchInputs>) {
	const probe = spawnSync(PYTHON, ['-c', 'import iapws'], { stdio: 'ignore' });
	if (probe.status !== 0) return null;
	const job = { seconds: PYTHON_S, inputs: {} as Record<string, number[][]> };
	for (const { op } of ROWS) {
		const { a, b } = inputs[op];
		job.inputs[op] = Array.from(a.subarray(0, PYTHON_INPUTS), (x, i) => [x, b[i]]);
	}
	job.inputs.saturationTemperature = job.inputs.saturationTemperature.map(([p]) => [p]);
	const out = execFileSync(PYTHON, [PY_SCRIPT], { input: JSON.stringify(job), encoding: 'utf8' });
	return JSON.parse(out) as {
		library: string;
		evalsPerSecond: Record<Operation, number>;
		core: Partial<Record<Operation, number>>;
	};
}

function si(n: number): string {
	if (n >= 1e6) return `${(n / 1e6).toFixed(2)} M`;
	if (n >= 1e3) return `${(n / 1e3).toFixed(1)} k`;
	return n.toFixed(0);
}

function verdict(ok: boolean): string {
	return ok ? 'pass' : 'FAIL';
}

function main(): void {
	const inputs = benchInputs();
	const engine = new Map<Operation, number>();
	for (const row of ROWS) {
		const { a, b } = inputs[row.op];
		rate(row.run, a, b, WARM_UP_S);
		engine.set(row.op, rate(row.run, a, b, MEASURE_S));
	}
	const python = pythonRates(inputs);
	const lines = [
		`Node ${process.version}, single thread, ${MEASURE_S} s per operation after ${WARM_UP_S} s warm-up`,
		python
			? `reference: ${python.library}, IAPWS97() calls`
			: 'python3-iapws not found (apt-get install -y python3-iapws): engine figures only',
		'',
		[
			'operation'.padEnd(24),
			'Steamwisp/s'.padStart(12),
			'iapws/s'.padStart(10),
			'ratio'.padStart(8),
			'  targets'
		].join('')
	];
	for (const row of ROWS) {
		const ours = engine.get(row.op) ?? 0;
		const theirs = python?.evalsPerSecond[row.op];
		const ratio = theirs ? ours / theirs : undefined;
		const targets = [
			row.target ? `≥ ${si(row.target)}/s ${verdict(ours >= row.target)}` : '',
			ratio === undefined ? '' : `≥ ${MIN_RATIO}× ${verdict(ratio >= MIN_RATIO)}`
		].filter(Boolean);
		lines.push(
			[
				row.label.padEnd(24),
				si(ours).padStart(12),
				(theirs ? si(theirs) : '–').padStart(10),
				(ratio ? `${ratio.toFixed(0)}×` : '–').padStart(8),
				`  ${targets.join('; ')}`
			].join('')
		);
	}
	if (python) {
		lines.push(
			'',
			'python3-iapws IAPWS97() also computes transport and derived properties; its bare'
		);
		for (const op of ['ptRegion1', 'ptRegion2'] as const) {
			const core = python.core[op] ?? 0;
			const ratio = (engine.get(op) ?? 0) / core;
			lines.push(
				`  ${op === 'ptRegion1' ? '_Region1' : '_Region2'}(T, p): ${si(core)}/s, ratio ${ratio.toFixed(0)}×`
			);
		}
	}
	lines.push('', ...heapFigures(), `(checksum ${sink.toPrecision(6)})`);
	console.log(lines.join('\n'));
}

main();
