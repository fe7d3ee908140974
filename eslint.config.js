import prettier from 'eslint-config-prettier';
import js from '@eslint/js';
import svelte from 'eslint-plugin-svelte';
import globals from 'globals';
import ts from 'typescript-eslint';
import svelteConfig from './svelte.config.js';

/** Modules the pure engine and unit code must never import. */
const frameworkImports = [
	{
		group: ['svelte', 'svelte/*', '$app/*', '$env/*', '$lib', '$lib/*'],
		message: 'The engine is pure: relative imports only, no framework.'
	},
	{
		group: ['dexie', 'drizzle-orm', 'drizzle-orm/*', 'mysql2', 'mysql2/*', 'node:*', 'fs', 'path'],
		message: 'The engine is pure: no database or Node imports.'
	},
	{
		// The schemas import the engine's types and ids, never the other way round.
		group: ['**/schemas', '**/schemas/**', '$lib/schemas', '$lib/schemas/**', '$lib/schemas*'],
		message:
			'The engine owns its input types and vocabulary: src/lib/schemas imports them, not the reverse.'
	}
];

/** Engine modules import their neighbours directly: a barrel that re-exports them makes a cycle. */
const barrelImports = {
	// A path ending in index, a bare '.', '..', '../..', or one of the engine's barrel folders.
	regex: '(^|/)index(\\.[jt]s)?$|^\\.{1,2}(/\\.\\.)*/?$|(^|/)(steam|units|heat|losses|plant)/?$',
	message: 'Import the module itself (e.g. ../saturation), not a barrel index that re-exports it.'
};

export default ts.config(
	{
		ignores: [
			'build/',
			'.svelte-kit/',
			'dist/',
			'dev-dist/',
			'node_modules/',
			'.data/',
			'drizzle/',
			'test-results/',
			'playwright-report/',
			'tests/reference/.cache/'
		]
	},
	js.configs.recommended,
	...ts.configs.recommended,
	...svelte.configs.recommended,
	prettier,
	...svelte.configs.prettier,
	{
		languageOptions: { globals: { ...globals.browser, ...globals.node } },
		rules: {
			'no-undef': 'off',
			'@typescript-eslint/no-unused-vars': [
				'error',
				{ argsIgnorePattern: '^_', varsIgnorePattern: '^_' }
			]
		}
	},
	{
		files: ['**/*.ts', '**/*.svelte.ts'],
		ignores: ['*.config.ts', 'drizzle.config.ts'],
		languageOptions: {
			parserOptions: { projectService: true, tsconfigRootDir: import.meta.dirname }
		},
		rules: { '@typescript-eslint/no-floating-promises': 'error' }
	},
	{
		files: ['**/*.svelte', '**/*.svelte.ts', '**/*.svelte.js'],
		languageOptions: {
			parserOptions: {
				projectService: true,
				extraFileExtensions: ['.svelte'],
				parser: ts.parser,
				svelteConfig
			}
		},
		rules: { '@typescript-eslint/no-floating-promises': 'error' }
	},
	{
		files: ['src/lib/steam/**', 'src/lib/units/**', 'src/lib/economics/**'],
		rules: { 'no-restricted-imports': ['error', { patterns: frameworkImports }] }
	},
	{
		// Barrels themselves, and the spec of the public barrel, are the only index importers.
		files: ['src/lib/steam/**', 'src/lib/units/**', 'src/lib/economics/**'],
		ignores: ['**/index.ts', '**/index.spec.ts'],
		rules: {
			'no-restricted-imports': ['error', { patterns: [...frameworkImports, barrelImports] }]
		}
	},
	{
		// Server-only code stays out of the browser: only server files and routes may import it.
		files: ['src/lib/components/**', 'src/lib/offline/**', 'src/lib/schemas/**'],
		rules: {
			'no-restricted-imports': [
				'error',
				{ patterns: [{ group: ['$lib/server', '$lib/server/*'], message: 'Server-only code.' }] }
			]
		}
	}
);
