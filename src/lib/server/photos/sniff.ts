/**
 * What a photo's bytes really are. Only whole JPEG, PNG and WebP files pass: anything else
 * (SVG, HTML, GIF, a zip) or an image with bytes after its end (a polyglot) is refused, and
 * the request's own Content-Type is never trusted.
 */
export type PhotoType = 'image/jpeg' | 'image/png' | 'image/webp';

const PNG_SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];

function ascii(b: Uint8Array, at: number, len: number): string {
	return String.fromCharCode(...b.subarray(at, at + len));
}

function isJpeg(b: Uint8Array): boolean {
	// Starts with SOI + a marker, ends with EOI and nothing after it.
	if (b.length < 4 || b[0] !== 0xff || b[1] !== 0xd8 || b[2] !== 0xff) return false;
	if (b[b.length - 2] !== 0xff || b[b.length - 1] !== 0xd9) return false;
	// A zip appended after an EOI and ending in its own bytes would not end in FFD9; a file
	// that does (zip inside, EOI repeated at the end) still carries a zip's local header.
	for (let i = 2; i + 3 < b.length; i++) {
		if (b[i] === 0x50 && b[i + 1] === 0x4b && b[i + 2] === 0x03 && b[i + 3] === 0x04) {
			return false;
		}
	}
	return true;
}

function isPng(b: Uint8Array): boolean {
	if (b.length < 8 + 12 + 13 + 12) return false;
	if (!PNG_SIGNATURE.every((v, i) => b[i] === v)) return false;
	const view = new DataView(b.buffer, b.byteOffset, b.byteLength);
	let at = 8;
	let first = true;
	while (at + 12 <= b.length) {
		const len = view.getUint32(at);
		const type = ascii(b, at + 4, 4);
		if (first && type !== 'IHDR') return false;
		first = false;
		const next = at + 12 + len;
		if (next > b.length) return false;
		if (type === 'IEND') return next === b.length;
		at = next;
	}
	return false;
}

function isWebp(b: Uint8Array): boolean {
	if (b.length < 16 || ascii(b, 0, 4) !== 'RIFF' || ascii(b, 8, 4) !== 'WEBP') return false;
	const size = new DataView(b.buffer, b.byteOffset, b.byteLength).getUint32(4, true);
	return size === b.length - 8;
}

/** The real type of `bytes`, or null when they are not one whole JPEG, PNG or WebP. */
export function sniffPhoto(bytes: Uint8Array): PhotoType | null {
	if (isJpeg(bytes)) return 'image/jpeg';
	if (isPng(bytes)) return 'image/png';
	if (isWebp(bytes)) return 'image/webp';
	return null;
}
