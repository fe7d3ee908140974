/**
 * Every route the app has, read from the src/routes tree the way SvelteKit reads it: a
 * directory with +page.svelte answers GET, each form action in its +page.server.ts answers a
 * POST (`POST` for the default action, `POST ?/name` for named ones), and a +server.ts answers
 * the HTTP methods it exports. The authorization matrix must have an entry for each.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative, sep } from 'node:path';

export interface AppRoute {
	/** SvelteKit's route id, groups included: "/(desk)/desk/people". */
	id: string;
	/** "GET", "POST", "POST ?/invite", "PUT"… */
	operations: string[];
	/** Built into a static file (`prerender = true` here or in a layout above): no server code runs. */
	prerendered: boolean;
}

const routesDir = join(import.meta.dirname, '../../../src/routes');
const METHODS = ['GET', 'HEAD', 'POST', 'PUT', 'PATCH', 'DELETE', 'OPTIONS'];

export function appRoutes(root = routesDir): AppRoute[] {
	const found: AppRoute[] = [];
	const visit = (dir: string, prerenderAbove: boolean) => {
		const names = readdirSync(dir);
		const prerendered = prerenderAbove || declaresPrerender(dir, names);
		const operations: string[] = [];
		if (names.includes('+page.svelte')) operations.push('GET');
		if (names.includes('+page.server.ts')) {
			for (const action of actionNames(readFileSync(join(dir, '+page.server.ts'), 'utf8'))) {
				operations.push(action === 'default' ? 'POST' : `POST ?/${action}`);
			}
		}
		if (names.includes('+server.ts')) {
			operations.push(...serverMethods(readFileSync(join(dir, '+server.ts'), 'utf8')));
		}
		if (operations.length > 0) {
			const path = relative(root, dir).split(sep).join('/');
			found.push({ id: `/${path}`, operations, prerendered });
		}
		for (const name of names) {
			const child = join(dir, name);
			if (statSync(child).isDirectory()) visit(child, prerendered);
		}
	};
	visit(root, false);
	return found.sort((a, b) => a.id.localeCompare(b.id));
}

function declaresPrerender(dir: string, names: string[]): boolean {
	return ['+page.ts', '+layout.ts', '+page.server.ts', '+layout.server.ts'].some(
		(n) =>
			names.includes(n) &&
			/export\s+const\s+prerender\s*=\s*true/.test(readFileSync(join(dir, n), 'utf8'))
	);
}

/** HTTP methods a +server.ts exports (`export const GET`, `export async function POST`…). */
export function serverMethods(source: string): string[] {
	const methods = new Set<string>();
	const declared = /export\s+(?:const|let|async\s+function|function)\s+([A-Z]+|fallback)\b/g;
	for (const m of source.matchAll(declared)) {
		if (METHODS.includes(m[1]) || m[1] === 'fallback') methods.add(m[1]);
	}
	for (const m of source.matchAll(/export\s*\{([^}]*)\}/g)) {
		for (const part of m[1].split(',')) {
			const name = part
				.split(/\s+as\s+/)
				.pop()!
				.trim();
			if (METHODS.includes(name) || name === 'fallback') methods.add(name);
		}
	}
	return [...methods];
}

/** The keys of `export const actions = { … }`, found by scanning its braces (depth 1 only). */
export function actionNames(source: string): string[] {
	const start = source.search(/export\s+const\s+actions\b/);
	if (start < 0) return [];
	const open = source.indexOf('{', source.indexOf('=', start));
	if (open < 0) return [];
	const names: string[] = [];
	let depth = 0;
	let atKeyPosition = false;
	for (let i = open; i < source.length; i++) {
		const c = source[i];
		if (c === '/' && source[i + 1] === '/') {
			i = source.indexOf('\n', i);
			if (i < 0) break;
			continue;
		}
		if (c === '/' && source[i + 1] === '*') {
			i = source.indexOf('*/', i) + 1;
			continue;
		}
		if (c === "'" || c === '"' || c === '`') {
			const end = skipString(source, i);
			// A quoted key ('name': …) names an action like a bare one.
			if (depth === 1 && atKeyPosition) {
				names.push(source.slice(i + 1, end));
				atKeyPosition = false;
			}
			i = end;
			continue;
		}
		if (c === '{' || c === '(' || c === '[') {
			depth++;
			if (depth === 1) atKeyPosition = true;
			continue;
		}
		if (c === '}' || c === ')' || c === ']') {
			depth--;
			if (depth === 0) break;
			continue;
		}
		if (depth === 1 && c === ',') {
			atKeyPosition = true;
			continue;
		}
		if (depth === 1 && atKeyPosition && /[A-Za-z_$]/.test(c)) {
			const word = /^(?:async\s+)?([A-Za-z_$][\w$]*)/.exec(source.slice(i))!;
			names.push(word[1]);
			i += word[0].length - 1;
			atKeyPosition = false;
		}
	}
	return names;
}

function skipString(source: string, i: number): number {
	const quote = source[i];
	for (let j = i + 1; j < source.length; j++) {
		if (source[j] === '\\') j++;
		else if (source[j] === quote) return j;
	}
	return source.length;
}
