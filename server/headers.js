/**
 * The security headers of every answer Steamwisp gives — pages, the prerendered Walk shell and
 * offline page, static files under /_app and /sw.js, API answers and error pages. One
 * definition, read by three places: svelte.config.js (kit.csp, so SvelteKit adds its nonces and
 * hashes to these directives), src/hooks.server.ts (answers SvelteKit renders) and
 * server/index.js (the production server, which also covers the files adapter-node serves
 * before any hook runs). Plain JavaScript without dependencies, so Node runs it as it is.
 * docs/security.md explains each choice.
 */
import { createHash } from 'node:crypto';

/**
 * Content-Security-Policy in kit.csp's form: keywords without their quotes.
 * @type {NonNullable<NonNullable<import('@sveltejs/kit').KitConfig['csp']>['directives']>}
 */
export const cspDirectives = {
	'default-src': ['self'],
	// Scripts only from this origin (SvelteKit adds a nonce or hash for its own start-up script;
	// svelte.config.js adds the hash of the page template's theme script). 'wasm-unsafe-eval' lets
	// the tag scanner compile its WebAssembly decoder; it does not allow eval() of JavaScript.
	'script-src': ['self', 'wasm-unsafe-eval'],
	// Svelte writes style attributes (and the page template has one): styles may be inline,
	// scripts never.
	'style-src': ['self', 'unsafe-inline'],
	// Photos and their thumbnails are shown from blob: URLs of the device database.
	'img-src': ['self', 'blob:', 'data:'],
	'font-src': ['self'],
	'connect-src': ['self'],
	'media-src': ['self', 'blob:'],
	// The service worker (/sw.js) and the photo compressor's worker, which the library starts
	// from a blob: URL that loads this app's own copy of its script.
	'worker-src': ['self', 'blob:'],
	'manifest-src': ['self'],
	'frame-src': ['none'],
	'frame-ancestors': ['none'],
	'object-src': ['none'],
	'base-uri': ['self'],
	'form-action': ['self']
};

/** Keywords CSP wants in single quotes (as SvelteKit quotes them). */
const quoted = new Set([
	'self',
	'none',
	'unsafe-inline',
	'unsafe-eval',
	'unsafe-hashes',
	'wasm-unsafe-eval',
	'strict-dynamic',
	'report-sample',
	'script'
]);

/**
 * A policy as the header's text.
 * @param {object} directives names to sources (kit.csp's form), or `true` for a bare directive
 * @returns {string}
 */
export function cspText(directives) {
	return /** @type {[string, string[] | boolean | undefined][]} */ (Object.entries(directives))
		.filter(([, sources]) => sources)
		.map(([name, sources]) => {
			if (!Array.isArray(sources)) return name;
			const words = sources.map((s) =>
				quoted.has(s) || /^(nonce|sha\d{3})-/.test(s) ? `'${s}'` : s
			);
			return [name, ...words].join(' ');
		})
		.join('; ');
}

/**
 * A policy's text back as directives (keywords unquoted), e.g. the one SvelteKit wrote into a
 * prerendered page's <meta http-equiv>.
 * @param {string} text
 * @returns {Record<string, string[]>}
 */
export function parseCsp(text) {
	/** @type {Record<string, string[]>} */
	const directives = {};
	for (const part of text.split(';')) {
		const [name, ...sources] = part.trim().split(/\s+/);
		if (!name) continue;
		directives[name.toLowerCase()] = sources.map((s) => s.replace(/^'(.*)'$/, '$1'));
	}
	return directives;
}

/** The policy of answers SvelteKit does not write one for (static files, API, redirects). */
export const baseCsp = cspText(cspDirectives);

/**
 * The policy of a prerendered page: what SvelteKit wrote into its <meta http-equiv> (with the
 * hashes of its inline scripts), completed with the directives a <meta> cannot carry
 * (frame-ancestors). Both are enforced, so the header must allow the page's own scripts too.
 * @param {string} html
 * @returns {string}
 */
export function prerenderedCsp(html) {
	const meta = /<meta http-equiv="content-security-policy" content="([^"]*)"/i.exec(html);
	if (!meta) return baseCsp;
	const content = meta[1]
		.replace(/&quot;/g, '"')
		.replace(/&lt;/g, '<')
		.replace(/&amp;/g, '&');
	return cspText({ ...cspDirectives, ...parseCsp(content) });
}

/** HSTS when the app is served over https: a year, this host only, unless configured. */
export const DEFAULT_HSTS = 'max-age=31536000';

/**
 * The headers besides Content-Security-Policy, for an app whose public URL is `origin`
 * (adapter-node's ORIGIN). `hsts`: STEAMWISP_HSTS — unset: DEFAULT_HSTS over https; `off`:
 * none; anything else: that header value (e.g. with includeSubDomains or preload).
 * @param {{ origin?: string, hsts?: string }} [settings]
 * @returns {Record<string, string>}
 */
export function securityHeaders({ origin, hsts } = {}) {
	/** @type {Record<string, string>} */
	const headers = {
		// No framing anywhere (clickjacking on sign-in and admin forms); frame-ancestors says
		// the same to browsers that read CSP.
		'x-frame-options': 'DENY',
		'x-content-type-options': 'nosniff',
		'referrer-policy': 'strict-origin-when-cross-origin',
		// Another site's window cannot script ours, nor embed our files in its pages.
		'cross-origin-opener-policy': 'same-origin',
		'cross-origin-resource-policy': 'same-origin',
		// The camera is for the tag scanner on our own pages; nothing else is asked for.
		'permissions-policy': 'camera=(self), microphone=(), geolocation=(), payment=(), usb=()'
	};
	const setting = hsts?.trim();
	if (origin?.startsWith('https://') && setting !== 'off') {
		headers['strict-transport-security'] = setting || DEFAULT_HSTS;
	}
	return headers;
}

/**
 * The hashes of the inline scripts of a page template (src/app.html), as CSP sources: SvelteKit
 * hashes only the scripts it writes itself.
 * @param {string} html
 * @returns {`sha256-${string}`[]}
 */
export function inlineScriptHashes(html) {
	return [...html.matchAll(/<script>([\s\S]*?)<\/script>/g)].map(
		(m) =>
			/** @type {const} */ (`sha256-${createHash('sha256').update(m[1], 'utf8').digest('base64')}`)
	);
}
