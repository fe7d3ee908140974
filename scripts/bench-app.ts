import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

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

/** Signs in through the sign-in form like a browser; the session cookie ("name=value"). */
export async function benchSignIn(
	origin: string,
	email: string,
	password: string
): Promise<string> {
	const res = await fetch(`${origin}/signin`, {
		method: 'POST',
		redirect: 'manual',
		headers: { origin, 'content-type': 'application/x-www-form-urlencoded' },
		body: new URLSearchParams({ email, password })
	});
	const cookie = res.headers.getSetCookie().find((c) => c.startsWith('steamwisp_session='));
	if (!cookie) throw new Error(`Sign-in failed (${res.status})`);
	return cookie.split(';')[0];
}

/** The p-th percentile of sorted figures (nearest rank). */
export const percentile = (sorted: number[], p: number) =>
	sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))];

/** The built app (`node server`) on loopback at `port`, with a photo store of its own. */
export function startBenchApp(name: string, port: number): ChildProcess {
	return spawn('node', ['server'], {
		env: {
			...process.env,
			HOST: '127.0.0.1',
			PORT: String(port),
			ORIGIN: `http://127.0.0.1:${port}`,
			STEAMWISP_PHOTO_DIR: mkdtempSync(join(tmpdir(), `steamwisp-bench-${name}-photos-`))
		},
		stdio: ['ignore', 'ignore', 'inherit']
	});
}
