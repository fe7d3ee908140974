import { config } from 'zod';

/**
 * In the browser, zod never compiles parsers with `new Function`: the Content-Security-Policy
 * forbids eval (docs/security.md), and zod's probe for it would be reported as a violation on
 * every page. SvelteKit evaluates this module before any page's code, so before any schema is
 * built (zod decides when a schema is made).
 */
config({ jitless: true });
