/**
 * The review table keeps its views — ids, totals and each page's rows — under the firm's change
 * counter (findings-cache), so every module that writes what a row shows (findings, their
 * conflicts, the tags, areas and headers named on them) must move that counter: take a
 * change_seq (nextChangeSeq) or touch it (touchFirm / touchSiteFirm). This spec reads every
 * module under src/lib/server and fails on one that inserts, updates or deletes those tables
 * without either; the few exceptions are listed with their reason, and an exception that stops
 * writing them fails too.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const server = resolve(dirname(fileURLToPath(import.meta.url)), '..');

const exempt: Record<string, string> = {
	// The demo seed runs before the app serves (npm start, the test set-up).
	'seed/seed-desk.ts': 'runs before the app serves',
	'seed/seed-findings.ts': 'runs before the app serves',
	'seed/index.ts': 'runs before the app serves',
	// Called only inside transactions that take the finding's change_seq (checked below).
	'assets.ts': 'called only by writers that take a change_seq in the same transaction',
	// Settles a conflict in the transaction where writeNextVersion takes the finding's change_seq.
	'desk/conflicts.ts': 'settles in the transaction where writeNextVersion takes a change_seq',
	// writeFigures' only callers are refresh.ts's batches, which touch the counter after them.
	'pricing/write.ts': 'called only by pricing/refresh.ts, which touches the counter'
};

const TABLES = ['findings', 'finding_conflicts', 'assets', 'areas', 'headers'];
const WRITES = [
	/\.(insert|update|delete)\(\s*(findings|F|schema\.findings|(schema\.)?(findingConflicts|assets|areas|headers))\s*\)/,
	new RegExp(`\\b(UPDATE|INSERT\\s+INTO|DELETE\\s+FROM)\\s+\`?(${TABLES.join('|')})\`?\\b`, 'i')
];
const MOVES = /\b(nextChangeSeq|touchFirm|touchSiteFirm)\(/;

function modules(dir: string): string[] {
	return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
		const path = join(dir, entry.name);
		if (entry.isDirectory()) return modules(path);
		return /\.ts$/.test(entry.name) && !/\.spec\.ts$/.test(entry.name) ? [path] : [];
	});
}

const writers = modules(server)
	.map((path) => ({ file: relative(server, path), source: readFileSync(path, 'utf8') }))
	.filter(({ source }) => WRITES.some((w) => w.test(source)));

describe('writers of what the review table shows move the firm’s change counter', () => {
	it('finds the writers (the patterns still match the code)', () => {
		const files = writers.map((w) => w.file);
		expect(files).toContain('desk/review.ts');
		expect(files).toContain('sync/upsert.ts');
		expect(files).toContain('pricing/write.ts');
		expect(files).toContain('sync/journal.ts'); // a device's edit kept as a conflict
		expect(files).toContain('desk/areas.ts');
	});

	for (const { file, source } of writers) {
		if (file in exempt) continue;
		it(file, () => {
			expect(MOVES.test(source), `${file} writes findings without moving the counter`).toBe(true);
		});
	}

	it('every exception still writes findings', () => {
		const files = new Set(writers.map((w) => w.file));
		for (const file of Object.keys(exempt)) expect(files.has(file), file).toBe(true);
	});

	it('the writers that call assetForCapture or writeNextVersion take a change_seq themselves', () => {
		const callers = modules(server).filter((p) =>
			/\b(assetForCapture|writeNextVersion)\(/.test(readFileSync(p, 'utf8'))
		);
		const files = callers.map((p) => relative(server, p)).sort();
		expect(files).toEqual(
			expect.arrayContaining(['desk/conflicts.ts', 'desk/finding-edit.ts', 'sync/upsert.ts'])
		);
		for (const file of files) {
			if (file.startsWith('seed/') || file === 'assets.ts' || file === 'desk/conflicts.ts')
				continue;
			expect(readFileSync(join(server, file), 'utf8'), file).toMatch(/\bnextChangeSeq\(/);
		}
		// conflicts.ts settles only through writeNextVersion (finding-edit.ts, checked above).
		expect(readFileSync(join(server, 'desk/conflicts.ts'), 'utf8')).toMatch(/\bwriteNextVersion\(/);
	});

	it('refresh.ts, the only caller of writeFigures, touches the counter', () => {
		const callers = modules(server).filter((p) => /\bwriteFigures\(/.test(readFileSync(p, 'utf8')));
		expect(callers.map((p) => relative(server, p)).sort()).toEqual([
			'pricing/refresh.ts',
			'pricing/write.ts'
		]);
		expect(readFileSync(join(server, 'pricing/refresh.ts'), 'utf8')).toMatch(/touchSiteFirm\(/);
	});
});
