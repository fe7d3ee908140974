import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Plugin } from 'vite';

const iconsDir = join(import.meta.dirname, 'icons');
const types: Record<string, string> = { png: 'image/png', svg: 'image/svg+xml' };

/**
 * The app icons live in pwa/icons (with the rest of the PWA's identity), not in static/.
 * This plugin serves them at /icons/* in dev and emits them into the client build, where
 * adapter-node serves them and the service worker precaches them.
 */
export function pwaIcons(): Plugin {
	const files = () => readdirSync(iconsDir).filter((f) => f.split('.').pop()! in types);
	return {
		name: 'steamwisp-pwa-icons',
		configureServer(server) {
			server.middlewares.use((req, res, next) => {
				const m = /^\/icons\/([\w.-]+)$/.exec(req.url ?? '');
				if (!m || !files().includes(m[1])) return next();
				res.setHeader('Content-Type', types[m[1].split('.').pop()!]);
				res.end(readFileSync(join(iconsDir, m[1])));
			});
		},
		generateBundle(options) {
			// SvelteKit runs a client and a server build; icons belong to the client one.
			if (!String(options.dir ?? '').includes(join('output', 'client'))) return;
			for (const file of files()) {
				this.emitFile({
					type: 'asset',
					fileName: `icons/${file}`,
					source: readFileSync(join(iconsDir, file))
				});
			}
		}
	};
}
