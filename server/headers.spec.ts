import { describe, expect, it } from 'vitest';
import {
	baseCsp,
	cspDirectives,
	cspText,
	DEFAULT_HSTS,
	inlineScriptHashes,
	parseCsp,
	prerenderedCsp,
	securityHeaders
} from './headers.js';

describe('securityHeaders', () => {
	it('sends no HSTS over plain http (a developer on loopback)', () => {
		const headers = securityHeaders({ origin: 'http://127.0.0.1:4180' });
		expect(headers['strict-transport-security']).toBeUndefined();
		expect(headers['x-frame-options']).toBe('DENY');
		expect(headers['x-content-type-options']).toBe('nosniff');
		expect(headers['referrer-policy']).toBe('strict-origin-when-cross-origin');
	});

	it('sends HSTS when ORIGIN is https, as configured, or not at all when turned off', () => {
		const origin = 'https://audits.cinderbrook.example';
		expect(securityHeaders({ origin })['strict-transport-security']).toBe(DEFAULT_HSTS);
		expect(DEFAULT_HSTS).toMatch(/^max-age=\d{8,}$/);
		const own = 'max-age=63072000; includeSubDomains; preload';
		expect(securityHeaders({ origin, hsts: own })['strict-transport-security']).toBe(own);
		expect(securityHeaders({ origin, hsts: 'off' })['strict-transport-security']).toBeUndefined();
		expect(securityHeaders({ origin: undefined })['strict-transport-security']).toBeUndefined();
	});
});

describe('the policy text', () => {
	it('quotes keywords, hashes and nonces, and leaves schemes and hosts bare', () => {
		expect(
			cspText({
				'script-src': ['self', 'sha256-abc=', 'nonce-xyz', 'wasm-unsafe-eval'],
				'img-src': ['self', 'blob:', 'data:', 'https://tiles.example'],
				'upgrade-insecure-requests': true,
				'report-uri': undefined
			})
		).toBe(
			"script-src 'self' 'sha256-abc=' 'nonce-xyz' 'wasm-unsafe-eval'; " +
				"img-src 'self' blob: data: https://tiles.example; upgrade-insecure-requests"
		);
	});

	it('reads a policy back into directives', () => {
		expect(parseCsp("default-src 'self'; img-src 'self' blob:;; Object-Src 'none'")).toEqual({
			'default-src': ['self'],
			'img-src': ['self', 'blob:'],
			'object-src': ['none']
		});
		expect(parseCsp(baseCsp)).toEqual(cspDirectives);
	});

	it('never lets scripts run inline or through eval, nor the app be framed', () => {
		const base = parseCsp(baseCsp);
		expect(base['script-src']).toEqual(['self', 'wasm-unsafe-eval']);
		expect(base['frame-ancestors']).toEqual(['none']);
		expect(base['object-src']).toEqual(['none']);
		expect(base['base-uri']).toEqual(['self']);
		expect(base['form-action']).toEqual(['self']);
		expect(base['connect-src']).toEqual(['self']);
		expect(base['img-src']).toEqual(['self', 'blob:', 'data:']);
		expect(base['worker-src']).toEqual(['self', 'blob:']);
	});
});

describe('prerenderedCsp', () => {
	it("takes the page's own <meta> policy and adds what a <meta> cannot carry", () => {
		const html =
			`<head><meta http-equiv="content-security-policy" content="default-src 'self'; ` +
			`script-src 'self' 'sha256-PAGE=' 'sha256-THEME='; form-action 'self'"></head>`;
		const policy = parseCsp(prerenderedCsp(html));
		expect(policy['script-src']).toEqual(['self', 'sha256-PAGE=', 'sha256-THEME=']);
		expect(policy['frame-ancestors']).toEqual(['none']);
		expect(policy['object-src']).toEqual(['none']);
	});

	it('unescapes the attribute as SvelteKit escaped it', () => {
		const html = `<meta http-equiv="content-security-policy" content="img-src 'self' https://a.example/?x=1&amp;y=2">`;
		expect(parseCsp(prerenderedCsp(html))['img-src']).toEqual([
			'self',
			'https://a.example/?x=1&y=2'
		]);
	});

	it('falls back to the base policy for a page without one', () => {
		expect(prerenderedCsp('<html><head></head></html>')).toBe(baseCsp);
	});
});

describe('inlineScriptHashes', () => {
	it('hashes each inline script as CSP does', () => {
		// The hash-source example of the W3C Content Security Policy specification.
		expect(inlineScriptHashes("<p><script>alert('Hello, world.');</script></p>")).toEqual([
			'sha256-qznLcsROx4GACP2dm0UCKCzCG+HiZ1guq6ZZDob/Tng='
		]);
		expect(inlineScriptHashes('<script src="/a.js"></script>')).toEqual([]);
	});
});
