/**
 * The rule "data access per aggregate" (DEVELOPERS.md, "Forms"): no route file queries the
 * database itself. Routes call data functions in src/lib/server; those own every query. This
 * spec reads every file under src/routes and fails on an import of Drizzle, mysql2 or the
 * database module (client or tables), and on a Drizzle query written in a route.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const here = dirname(fileURLToPath(import.meta.url));
const routes = resolve(here, '../../routes');
const dbModule = resolve(here, 'db');

/**
 * Machine endpoints that hand the app's database to a data function taking an executor (so
 * the integration specs can pass a transaction); they import `db` and nothing else of it, and
 * make no query themselves (checked below). A file listed here that stops importing `db` fails
 * too, so the list cannot go stale.
 */
const handsOverDb = new Set([
	'api/me/+server.ts',
	'api/photos/[id]/+server.ts',
	'api/surveys/+server.ts',
	'api/surveys/[id]/snapshot/+server.ts',
	'api/sync/pull/+server.ts',
	'api/sync/push/+server.ts'
]);

function filesUnder(dir: string): string[] {
	return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
		const path = join(dir, entry.name);
		if (entry.isDirectory()) return filesUnder(path);
		return /\.(ts|js|svelte)$/.test(entry.name) ? [path] : [];
	});
}

/** Every module a source file imports, statically or dynamically. */
export function importsOf(source: string): string[] {
	const found: string[] = [];
	const patterns = [
		/\bfrom\s*['"]([^'"]+)['"]/g,
		/\bimport\s*['"]([^'"]+)['"]/g,
		/\bimport\s*\(\s*['"]([^'"]+)['"]\s*\)/g
	];
	for (const pattern of patterns) for (const m of source.matchAll(pattern)) found.push(m[1]);
	return found;
}

/** Whether an import (from the file at `file`) reaches Drizzle, mysql2 or the db module. */
export function reachesDatabase(specifier: string, file: string): boolean {
	if (/^(drizzle-orm|mysql2)(\/|$)/.test(specifier)) return true;
	if (/^\$lib\/server\/db(\/|$)/.test(specifier)) return true;
	if (!specifier.startsWith('.')) return false;
	const target = resolve(dirname(file), specifier);
	return target === dbModule || target.startsWith(dbModule + '/');
}

/**
 * A Drizzle query or raw SQL written in place on a database handle: `db.select(`,
 * `tx.insert(`, `db.query.users`, `sql\`…\``. (The Walk's Dexie `db.outbox.…` is no match.)
 */
const QUERY =
	/\b(db|tx|trx)\s*\.\s*(select|selectDistinct|insert|update|delete|execute)\s*\(|\b(db|tx)\.query\.\w+|\bsql\s*`/;

const files = filesUnder(routes).map((path) => ({
	path,
	name: relative(routes, path),
	source: readFileSync(path, 'utf8')
}));

describe('route files make no database queries', () => {
	it('finds the route files to check', () => {
		expect(files.some((f) => f.name === 'signin/+page.server.ts')).toBe(true);
		expect(files.some((f) => f.name === '(ladder)/ladder/+page.server.ts')).toBe(true);
	});

	it('imports no Drizzle, mysql2 or database module', () => {
		const offending = files.flatMap((f) =>
			importsOf(f.source)
				.filter((s) => reachesDatabase(s, f.path))
				.filter((s) => !(handsOverDb.has(f.name) && s === '$lib/server/db'))
				.map((s) => `${f.name} imports ${s}`)
		);
		expect(offending, 'move the query into a data module under src/lib/server').toEqual([]);
	});

	it('writes no query in place', () => {
		const offending = files.filter((f) => !f.name.endsWith('.svelte') && QUERY.test(f.source));
		expect(offending.map((f) => f.name)).toEqual([]);
	});

	it('lists only endpoints that still hand over the database', () => {
		const stale = [...handsOverDb].filter((name) => {
			const file = files.find((f) => f.name === name);
			return !file || !importsOf(file.source).includes('$lib/server/db');
		});
		expect(stale).toEqual([]);
	});
});

describe('the checks themselves', () => {
	const file = join(routes, 'desk', '+page.server.ts');

	it('see static, bare and dynamic imports', () => {
		const source = `import { eq } from 'drizzle-orm';\nimport 'x';\nconst m = await import('./y');`;
		expect(importsOf(source)).toEqual(['drizzle-orm', 'x', './y']);
	});

	it('tell database modules from others, relative paths included', () => {
		for (const s of ['drizzle-orm', 'drizzle-orm/mysql-core', 'mysql2/promise', '$lib/server/db']) {
			expect(reachesDatabase(s, file), s).toBe(true);
		}
		expect(reachesDatabase('$lib/server/db/schema', file)).toBe(true);
		expect(reachesDatabase('../../lib/server/db/schema', file)).toBe(true);
		for (const s of [
			'$lib/server/dbx',
			'$lib/server/ladder',
			'./$types',
			'../../lib/server/forms'
		]) {
			expect(reachesDatabase(s, file), s).toBe(false);
		}
	});

	it('see a query written in place and not a data function call', () => {
		expect(QUERY.test('await db.select().from(users)')).toBe(true);
		expect(QUERY.test('await tx\n\t.update(users)')).toBe(true);
		expect(QUERY.test('db.query.users.findFirst()')).toBe(true);
		expect(QUERY.test('sql`1`')).toBe(true);
		expect(QUERY.test('await publishedSurveys(user)')).toBe(false);
		expect(QUERY.test('await pullChanges(db, user, since, limit)')).toBe(false);
		expect(QUERY.test('seen.delete(id); await db.outbox.update(id, row)')).toBe(false);
	});
});
