import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import { ZXING_WASM_SHA256 } from 'barcode-detector/ponyfill';
import { wasmLocator } from './locate';
import { zxingWasmUrl } from './zxing';

describe('wasmLocator', () => {
	const locate = wasmLocator('/_app/immutable/assets/zxing_reader.abc123.wasm');

	it('sends the reader’s .wasm to the app’s own copy, whatever prefix the loader has', () => {
		expect(locate('zxing_reader.wasm', 'https://fastly.jsdelivr.net/npm/zxing-wasm/')).toBe(
			'/_app/immutable/assets/zxing_reader.abc123.wasm'
		);
		expect(locate('zxing_reader.wasm', '')).toBe('/_app/immutable/assets/zxing_reader.abc123.wasm');
	});

	it('leaves every other file beside the script', () => {
		expect(locate('zxing_reader.data', '/_app/immutable/chunks/')).toBe(
			'/_app/immutable/chunks/zxing_reader.data'
		);
	});
});

describe('the reader the app serves', () => {
	it('is imported from the installed zxing-wasm, not a CDN', () => {
		expect(zxingWasmUrl).toMatch(/zxing_reader[^/]*\.wasm$/);
		expect(zxingWasmUrl).not.toMatch(/^https?:/);
	});

	it('is the very build the barcode-detector glue expects (same SHA-256)', () => {
		const require = createRequire(import.meta.url);
		const file = require.resolve('zxing-wasm/reader/zxing_reader.wasm');
		const digest = createHash('sha256').update(readFileSync(file)).digest('hex');
		expect(digest).toBe(ZXING_WASM_SHA256);
	});
});
