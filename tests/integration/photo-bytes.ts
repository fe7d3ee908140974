/**
 * Small image files built from bytes for the photo tests (no image library needed): a 1×1 PNG
 * with correct CRCs, a lossless 1×1 WebP, and files that only pretend to be photos.
 */
import { readFileSync } from 'node:fs';
import { crc32, deflateSync } from 'node:zlib';

export const JPEG = new Uint8Array(readFileSync('tests/fixtures/trap-photo.jpg'));

function chunk(type: string, data: Buffer): Buffer {
	const len = Buffer.alloc(4);
	len.writeUInt32BE(data.length);
	const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
	const crc = Buffer.alloc(4);
	crc.writeUInt32BE(crc32(body));
	return Buffer.concat([len, body, crc]);
}

/** A valid 1×1 grey PNG (PNG specification: signature, IHDR, IDAT, IEND). */
export function png(): Uint8Array {
	const ihdr = Buffer.alloc(13);
	ihdr.writeUInt32BE(1, 0);
	ihdr.writeUInt32BE(1, 4);
	ihdr[8] = 8; // bit depth
	ihdr[9] = 0; // greyscale
	return new Uint8Array(
		Buffer.concat([
			Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
			chunk('IHDR', ihdr),
			chunk('IDAT', deflateSync(Buffer.from([0, 0x80]))),
			chunk('IEND', Buffer.alloc(0))
		])
	);
}

/** A RIFF/WEBP container with a VP8L (lossless) 1×1 header; its RIFF size matches. */
export function webp(): Uint8Array {
	const vp8l = Buffer.from([0x2f, 0x00, 0x00, 0x00, 0x00, 0x88, 0x88, 0x08]);
	const body = Buffer.concat([
		Buffer.from('WEBP'),
		Buffer.from('VP8L'),
		Buffer.from([vp8l.length, 0, 0, 0]),
		vp8l
	]);
	const size = Buffer.alloc(4);
	size.writeUInt32LE(body.length);
	return new Uint8Array(Buffer.concat([Buffer.from('RIFF'), size, body]));
}

const text = (s: string) => new Uint8Array(Buffer.from(s));

/** Files that are not a whole JPEG, PNG or WebP, each labelled as a JPEG by the test. */
export const impostors: Record<string, Uint8Array> = {
	svg: text('<svg xmlns="http://www.w3.org/2000/svg"><script>alert(1)</script></svg>'),
	html: text('<!doctype html><script>alert(1)</script>'),
	gif: text('GIF89a\x01\x00\x01\x00\x00\x00\x00;'),
	'jpeg with a zip appended': new Uint8Array(
		Buffer.concat([JPEG, Buffer.from([0x50, 0x4b, 0x03, 0x04, 0x14, 0, 0, 0])])
	),
	'png with trailing bytes': new Uint8Array(Buffer.concat([png(), text('<?php echo 1; ?>')]))
};
