import { readFileSync } from 'node:fs';
import { deflateSync } from 'node:zlib';
import { describe, expect, it } from 'vitest';
import { sniffPhoto } from './sniff';

const jpeg = new Uint8Array(readFileSync('tests/fixtures/trap-photo.jpg'));

function crc32(b: Uint8Array): number {
	let c = ~0;
	for (const v of b) {
		c ^= v;
		for (let k = 0; k < 8; k++) c = (c >>> 1) ^ (0xedb88320 & -(c & 1));
	}
	return ~c >>> 0;
}

function chunk(type: string, data: Uint8Array): Buffer {
	const head = Buffer.alloc(8);
	head.writeUInt32BE(data.length, 0);
	head.write(type, 4, 'ascii');
	const crc = Buffer.alloc(4);
	crc.writeUInt32BE(crc32(Buffer.concat([head.subarray(4), data])), 0);
	return Buffer.concat([head, data, crc]);
}

/** A 1×1 RGB PNG, built by hand (PNG spec, W3C: signature, IHDR, IDAT, IEND). */
function png1x1(extra: Buffer[] = []): Uint8Array {
	const ihdr = Buffer.from([0, 0, 0, 1, 0, 0, 0, 1, 8, 2, 0, 0, 0]);
	const idat = deflateSync(Buffer.from([0, 200, 100, 50]));
	return new Uint8Array(
		Buffer.concat([
			Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
			chunk('IHDR', ihdr),
			...extra,
			chunk('IDAT', idat),
			chunk('IEND', new Uint8Array())
		])
	);
}

/** A 2×1 RGB PNG whose IDAT is stored (deflate level 0), so its pixels appear as they are. */
function pngWithPixels(pixels: number[]): Uint8Array {
	const ihdr = Buffer.from([0, 0, 0, 2, 0, 0, 0, 1, 8, 2, 0, 0, 0]);
	const idat = deflateSync(Buffer.from([0, ...pixels]), { level: 0 });
	return new Uint8Array(
		Buffer.concat([
			Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
			chunk('IHDR', ihdr),
			chunk('IDAT', idat),
			chunk('IEND', new Uint8Array())
		])
	);
}

/** A RIFF/WEBP file of the given chunks (WebP container spec: RIFF size = file size − 8). */
function webpOf(...chunks: [string, Buffer][]): Uint8Array {
	const parts = chunks.map(([type, data]) => {
		const head = Buffer.alloc(8);
		head.write(type, 0, 'ascii');
		head.writeUInt32LE(data.length, 4);
		return Buffer.concat([head, data, Buffer.alloc(data.length & 1)]);
	});
	const body = Buffer.concat([Buffer.from('WEBP'), ...parts]);
	const head = Buffer.alloc(8);
	head.write('RIFF', 0, 'ascii');
	head.writeUInt32LE(body.length, 4);
	return new Uint8Array(Buffer.concat([head, body]));
}

const ZIP_LOCAL = Buffer.from([0x50, 0x4b, 0x03, 0x04]);
const ZIP_END = Buffer.from([0x50, 0x4b, 0x05, 0x06, 0, 0, 0, 0]);

function webp(): Uint8Array {
	const body = Buffer.concat([Buffer.from('WEBPVP8L'), Buffer.alloc(12)]);
	const head = Buffer.alloc(8);
	head.write('RIFF', 0, 'ascii');
	head.writeUInt32LE(body.length, 4);
	return new Uint8Array(Buffer.concat([head, body]));
}

const text = (s: string) => new TextEncoder().encode(s);

describe('sniffPhoto', () => {
	it('reads JPEG, PNG and WebP from their bytes', () => {
		expect(sniffPhoto(jpeg)).toBe('image/jpeg');
		expect(sniffPhoto(png1x1())).toBe('image/png');
		expect(sniffPhoto(webp())).toBe('image/webp');
	});

	it('refuses SVG, HTML and GIF', () => {
		expect(sniffPhoto(text('<svg xmlns="http://www.w3.org/2000/svg"></svg>'))).toBeNull();
		expect(sniffPhoto(text('<!doctype html><script>alert(1)</script>'))).toBeNull();
		expect(sniffPhoto(text('GIF89a\x01\x00\x01\x00'))).toBeNull();
	});

	it('refuses a JPEG with a zip appended, even one ending in FF D9', () => {
		const zip = Buffer.from([0x50, 0x4b, 0x03, 0x04, 1, 2, 3, 4]);
		expect(sniffPhoto(new Uint8Array(Buffer.concat([jpeg, zip])))).toBeNull();
		const sly = Buffer.concat([jpeg, zip, Buffer.from([0xff, 0xd9])]);
		expect(sniffPhoto(new Uint8Array(sly))).toBeNull();
	});

	it('reads a JPEG whose compressed data happens to hold the bytes of a zip header', () => {
		// Splice "PK\x03\x04" into the entropy-coded data, just before the EOI marker: a real
		// photo's random bytes may hold them; they are image data, not an archive.
		const body = jpeg.subarray(0, jpeg.length - 2);
		const spliced = Buffer.concat([body, Buffer.from([0x50, 0x4b, 0x03, 0x04]), jpeg.subarray(-2)]);
		expect(sniffPhoto(new Uint8Array(spliced))).toBe('image/jpeg');
	});

	it('refuses a JPEG with a zip hidden in a comment segment', () => {
		const zip = Buffer.from([0x50, 0x4b, 0x03, 0x04, 1, 2, 3, 4]);
		const com = Buffer.concat([Buffer.from([0xff, 0xfe, 0x00, zip.length + 2]), zip]);
		const hidden = Buffer.concat([jpeg.subarray(0, 2), com, jpeg.subarray(2)]);
		expect(sniffPhoto(new Uint8Array(hidden))).toBeNull();
	});

	it('refuses a PNG with trailing data, a truncated JPEG and a WebP of the wrong size', () => {
		const p = png1x1();
		expect(sniffPhoto(new Uint8Array([...p, 0]))).toBeNull();
		expect(sniffPhoto(jpeg.subarray(0, jpeg.length - 10))).toBeNull();
		expect(sniffPhoto(new Uint8Array([...webp(), 0, 0]))).toBeNull();
	});

	it('refuses a JPEG with a zip directory record in a comment segment', () => {
		const com = Buffer.concat([Buffer.from([0xff, 0xfe, 0x00, ZIP_END.length + 2]), ZIP_END]);
		const hidden = Buffer.concat([jpeg.subarray(0, 2), com, jpeg.subarray(2)]);
		expect(sniffPhoto(new Uint8Array(hidden))).toBeNull();
	});

	it('reads a PNG whose pixels hold the bytes of a zip header, refuses one in a text chunk', () => {
		expect(sniffPhoto(pngWithPixels([0x50, 0x4b, 0x03, 0x04, 9, 9]))).toBe('image/png');
		const text = chunk('tEXt', Buffer.concat([Buffer.from('Comment\0'), ZIP_LOCAL]));
		expect(sniffPhoto(png1x1([text]))).toBeNull();
		const secret = chunk('zzZp', ZIP_END);
		expect(sniffPhoto(png1x1([secret]))).toBeNull();
	});

	it('walks WebP chunks: odd sizes padded, image data not searched, metadata is', () => {
		const vp8l = Buffer.from([0x2f, 0, 0, 0, 0x50, 0x4b, 0x03, 0x04, 0x88]); // 9 bytes: padded
		expect(sniffPhoto(webpOf(['VP8L', vp8l]))).toBe('image/webp');
		const exif = Buffer.concat([Buffer.from('Exif\0\0'), ZIP_LOCAL]);
		expect(sniffPhoto(webpOf(['VP8L', vp8l], ['EXIF', exif]))).toBeNull();
		// A chunk claiming more bytes than the file has.
		const short = webpOf(['VP8L', vp8l]);
		short[16] = 0x40;
		expect(sniffPhoto(short)).toBeNull();
	});
});
