import type { Config } from 'tailwindcss';

/**
 * Steamwisp's own identity. Colours are CSS variables so the two themes
 * (sunlight: light, high contrast; plant room: dark) swap them in one place (src/app.css).
 * Status is never colour alone: every status colour is paired with a word and an icon.
 */
const token = (name: string) => `rgb(var(--sw-${name}) / <alpha-value>)`;

export default {
	content: ['./src/**/*.{html,js,svelte,ts}'],
	darkMode: ['selector', '[data-theme="plant-room"]'],
	theme: {
		fontFamily: {
			sans: ['"Atkinson Hyperlegible"', 'system-ui', 'sans-serif'],
			mono: ['"Atkinson Hyperlegible"', 'ui-monospace', 'monospace']
		},
		extend: {
			colors: {
				canvas: token('canvas'),
				panel: token('panel'),
				ink: token('ink'),
				muted: token('muted'),
				line: token('line'),
				// Brand: deep slate-teal ("wisp") and a copper accent for actions.
				wisp: token('wisp'),
				copper: token('copper'),
				'on-copper': token('on-copper'),
				// Meanings (always with a word and an icon).
				loss: token('loss'),
				saving: token('saving'),
				caution: token('caution'),
				calm: token('calm')
			},
			fontSize: {
				// Large type for phones in gloves and sunlight.
				base: ['1.0625rem', { lineHeight: '1.55' }]
			},
			minHeight: { touch: '48px' },
			minWidth: { touch: '48px' },
			borderRadius: { card: '0.875rem' }
		}
	}
} satisfies Config;
