/**
 * The whole reading path in Node: codes printed by ZXing's writer, read by the detector the
 * scanner opens (the reader .wasm fetched from the app's own URL, never a CDN), turned into
 * tags by readTag. Node has no camera, DOMRect or ImageData, so the pictures are PNGs and
 * pixel arrays, with minimal stand-ins for the two classes.
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { prepareZXingModule as prepareWriter, writeBarcode } from 'zxing-wasm/writer';
import { openDetector } from './detector';
import { readTag } from './normalise';
import { zxingDetector, zxingWasmUrl } from './zxing';

const require = createRequire(import.meta.url);
const bytes = (id: string) => new Uint8Array(readFileSync(require.resolve(id)));
const fetched: string[] = [];

class ImageDataStandIn {
	readonly [Symbol.toStringTag] = 'ImageData';
	constructor(
		readonly data: Uint8ClampedArray,
		readonly width: number,
		readonly height: number
	) {}
}

class RectStandIn {
	constructor(
		readonly x = 0,
		readonly y = 0,
		readonly width = 0,
		readonly height = 0
	) {}
}

beforeAll(async () => {
	vi.stubGlobal('DOMRectReadOnly', RectStandIn);
	vi.stubGlobal('ImageData', ImageDataStandIn);
	// The only network the reader may use: the app serving its own copy of the .wasm.
	vi.stubGlobal('fetch', async (input: RequestInfo | URL) => {
		const url = String(input instanceof Request ? input.url : input);
		fetched.push(url);
		if (url !== zxingWasmUrl) return new Response('not here', { status: 404 });
		return new Response(bytes('zxing-wasm/reader/zxing_reader.wasm'), {
			headers: { 'content-type': 'application/wasm' }
		});
	});
	const writer = bytes('zxing-wasm/writer/zxing_writer.wasm');
	await prepareWriter({ overrides: { wasmBinary: writer.buffer }, fireImmediately: true });
});

afterAll(() => {
	vi.unstubAllGlobals();
});

async function printed(text: string, format: string): Promise<Blob> {
	const out = await writeBarcode(text, { format: format as 'QRCode', scale: 4 });
	if (!out.image) throw new Error(`the writer made no ${format}: ${out.error}`);
	return out.image;
}

describe('reading a trap tag’s code', () => {
	it('loads the reader from the app’s own URL and nowhere else', async () => {
		await zxingDetector();
		expect(fetched).toEqual([zxingWasmUrl]);
	});

	it.each([
		['QRCode', 'https://cmms.example/asset?tag=st-0412', 'ST-0412'],
		['DataMatrix', 'st-0412', 'ST-0412'],
		['Code128', ' st-0412', 'ST-0412'],
		['Code39', 'ST-0412', 'ST-0412'],
		// EAN-13 of 400638133393 with its check digit 1 (the writer adds it).
		['EAN13', '400638133393', '4006381333931']
	])('reads a %s holding %j as the tag %s', async (format, text, tag) => {
		const detector = await openDetector();
		expect(detector.engine).toBe('zxing');
		const codes = await detector.detect(await printed(text, format));
		expect(codes.map(readTag)).toEqual([{ ok: true, tag }]);
	});

	it('sees no code in a plain white picture', async () => {
		const detector = await openDetector();
		const white = new ImageDataStandIn(new Uint8ClampedArray(64 * 64 * 4).fill(255), 64, 64);
		expect(await detector.detect(white as unknown as ImageData)).toEqual([]);
	});

	it('passes on no empty value for a picture it cannot make out', async () => {
		const detector = await openDetector();
		const cut = (await printed('ST-0412', 'QRCode')).slice(0, 40);
		// The reader reports an empty "unknown" code for a broken image: not a tag to look up.
		expect(await detector.detect(cut)).toEqual([]);
	});
});
