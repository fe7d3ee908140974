import type { ManifestOptions } from 'vite-plugin-pwa';

/** The installed app's identity: name, colours and icons are Steamwisp's own. */
export const manifest: Partial<ManifestOptions> = {
	name: 'Steamwisp — steam-system audits',
	short_name: 'Steamwisp',
	description:
		'Record steam traps, leaks, insulation gaps and header readings offline; price the lost steam; rank the repairs.',
	id: '/',
	start_url: '/walk',
	scope: '/',
	display: 'standalone',
	orientation: 'any',
	background_color: '#f6f4ef',
	theme_color: '#1d4a52',
	icons: [
		{ src: '/icons/steamwisp-192.png', sizes: '192x192', type: 'image/png' },
		{ src: '/icons/steamwisp-512.png', sizes: '512x512', type: 'image/png' },
		{
			src: '/icons/steamwisp-maskable-512.png',
			sizes: '512x512',
			type: 'image/png',
			purpose: 'maskable'
		},
		{ src: '/icons/steamwisp.svg', sizes: 'any', type: 'image/svg+xml' }
	]
};
