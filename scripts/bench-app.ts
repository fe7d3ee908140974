import { spawnSync } from 'node:child_process';

/** Pieces the benchmarks share. The built app as they start it: waits until it answers its health route. */
export async function waitForApp(origin: string): Promise<void> {
	for (let i = 0; i < 100; i++) {
		try {
			if ((await fetch(`${origin}/api/health`)).ok) return;
		} catch {
			// not listening yet
		}
		await new Promise((r) => setTimeout(r, 200));
	}
	throw new Error('The built app did not start');
}

/** Runs a command to its end, its output dropped; throws when it fails. */
export function run(command: string, args: string[], env: NodeJS.ProcessEnv = process.env) {
	const r = spawnSync(command, args, { env, stdio: ['ignore', 'ignore', 'inherit'] });
	if (r.status !== 0) throw new Error(`${command} ${args.join(' ')} failed (${r.status})`);
}

/**
 * A benchmark's own fresh database with the demo scenario, made the one this process and its
 * children use. Returns `done`, which stops MariaDB again when the benchmark started it.
 */
export function freshBenchDatabase(name: string): { done: () => void } {
	const wasRunning =
		spawnSync('bash', ['scripts/db.sh', 'status'], { stdio: 'ignore' }).status === 0;
	const { STEAMWISP_DB_NAME: _unset, ...withoutName } = process.env;
	run('bash', ['scripts/db.sh', 'fresh', name], withoutName);
	process.env.STEAMWISP_DB_NAME = name;
	run('npx', ['tsx', 'scripts/migrate.ts']);
	run('npx', ['tsx', 'scripts/seed.ts']);
	return { done: () => (wasRunning ? undefined : run('bash', ['scripts/db.sh', 'stop'])) };
}
