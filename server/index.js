/**
 * The production server: adapter-node's handler (build/handler.js) inside a small HTTP server
 * that gives every answer the security headers of server/headers.js. adapter-node serves the
 * files under /_app, /sw.js, the icons and the prerendered pages (the Walk shell, the offline
 * page) before any SvelteKit hook runs, so without this they would carry none of them.
 *
 *   node server            (after `vite build`; npm start does both)
 *
 * Settings as adapter-node's own `node build`: HOST, PORT, ORIGIN, BODY_SIZE_LIMIT,
 * ADDRESS_HEADER, XFF_DEPTH, SHUTDOWN_TIMEOUT; plus STEAMWISP_HSTS (README: Configuration).
 */
import { readdirSync, readFileSync } from 'node:fs';
import { createServer } from 'node:http';
import { join, relative, sep } from 'node:path';
import process from 'node:process';
import { fileURLToPath } from 'node:url';
import { baseCsp, prerenderedCsp, securityHeaders } from './headers.js';

const buildDir = fileURLToPath(new URL('../build/', import.meta.url));
const { handler } = await import(join(buildDir, 'handler.js')).catch((error) => {
	console.error(`steamwisp: no built app in ${buildDir} (run \`npm run build\` first)`);
	throw error;
});

const host = process.env.HOST ?? '0.0.0.0';
const port = Number(process.env.PORT ?? 3000);
const shutdownSeconds = Number(process.env.SHUTDOWN_TIMEOUT ?? 30);
const common = Object.entries(
	securityHeaders({ origin: process.env.ORIGIN, hsts: process.env.STEAMWISP_HSTS })
);

/**
 * The policy of each prerendered page by its path, read once from the files adapter-node will
 * serve: their inline scripts' hashes are in the <meta> SvelteKit wrote, which the header must
 * allow too (both policies apply).
 * @returns {Map<string, string>}
 */
function prerenderedPolicies() {
	/** @type {Map<string, string>} */
	const policies = new Map();
	const root = join(buildDir, 'prerendered');
	/** @param {string} dir */
	const walk = (dir) => {
		for (const entry of readdirSync(dir, { withFileTypes: true })) {
			const file = join(dir, entry.name);
			if (entry.isDirectory()) walk(file);
			else if (entry.name.endsWith('.html')) {
				const path = '/' + relative(root, file).split(sep).join('/');
				const page = path.replace(/(^|\/)index\.html$/, '$1').replace(/\.html$/, '');
				policies.set(page, prerenderedCsp(readFileSync(file, 'utf8')));
			}
		}
	};
	try {
		walk(root);
	} catch (error) {
		if (/** @type {NodeJS.ErrnoException} */ (error).code !== 'ENOENT') throw error;
	}
	return policies;
}

const policies = prerenderedPolicies();

/** @param {string | undefined} url */
function pathOf(url) {
	const path = (url ?? '/').split('?')[0];
	try {
		return decodeURIComponent(path);
	} catch {
		return path;
	}
}

const server = createServer((req, res) => {
	// Set before the handler answers: adapter-node's file server keeps headers already set, and
	// SvelteKit's own answers (a page with its nonce) replace them with their own.
	for (const [name, value] of common) res.setHeader(name, value);
	res.setHeader('content-security-policy', policies.get(pathOf(req.url)) ?? baseCsp);
	handler(req, res, () => {
		res.statusCode = 404;
		res.setHeader('content-type', 'text/plain; charset=utf-8');
		res.end('Not found');
	});
});

server.listen({ host, port }, () => {
	console.log(`Listening on http://${host.includes(':') ? `[${host}]` : host}:${port}`);
});

/** Stops taking requests, lets running ones finish, then lets the app close its database pool. */
function shutdown(/** @type {string} */ reason) {
	server.closeIdleConnections();
	server.close(() => {
		// @ts-expect-error custom event of adapter-node, listened for in src/hooks.server.ts
		process.emit('sveltekit:shutdown', reason);
	});
	setTimeout(() => server.closeAllConnections(), shutdownSeconds * 1000).unref();
}
process.once('SIGTERM', () => shutdown('SIGTERM'));
process.once('SIGINT', () => shutdown('SIGINT'));
