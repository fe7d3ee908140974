/**
 * What a photo's bytes really are. Only whole JPEG, PNG and WebP files pass: anything else
 * (SVG, HTML, GIF, a zip) or an image with bytes after its end or an archive in its metadata
 * (a polyglot) is refused, and the request's own Content-Type is never trusted. Each format is
 * walked by its own structure, so compressed image data (random bytes) is never searched.
 */
export type PhotoType = 'image/jpeg' | 'image/png' | 'image/webp';

const PNG_SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];

function ascii(b: Uint8Array, at: number, len: number): string {
	return String.fromCharCode(...b.subarray(at, at + len));
}

/**
 * A zip's local file header (PK 03 04) or its end-of-directory record (PK 05 06) between `from`
 * and `to`: what a zip reader looks for, so a photo carrying one in its metadata is a polyglot.
 */
const hasZipHeader = (b: Uint8Array, from: number, to: number) => {
	for (let i = from; i + 3 < to; i++) {
		if (b[i] !== 0x50 || b[i + 1] !== 0x4b) continue;
		if ((b[i + 2] === 0x03 && b[i + 3] === 0x04) || (b[i + 2] === 0x05 && b[i + 3] === 0x06)) {
			return true;
		}
	}
	return false;
};

/**
 * A JPEG walked segment by segment from SOI to its first EOI, which must be the last two
 * bytes: anything appended (a zip, a script) is refused, and so is an archive hidden in a
 * metadata segment. Entropy-coded data is skipped by its byte stuffing, so the random bytes of
 * a real photo can never look like an archive.
 */
function isJpeg(b: Uint8Array): boolean {
	if (b.length < 4 || b[0] !== 0xff || b[1] !== 0xd8) return false;
	let at = 2;
	let sawScan = false;
	while (at + 1 < b.length) {
		if (b[at] !== 0xff) return false;
		const marker = b[at + 1];
		if (marker === 0xff) {
			at++; // fill byte
			continue;
		}
		if (marker === 0xd9) return sawScan && at + 2 === b.length;
		if (marker >= 0xd0 && marker <= 0xd7) {
			at += 2;
			continue;
		}
		if (at + 3 >= b.length) return false;
		const len = (b[at + 2] << 8) | b[at + 3];
		if (len < 2 || at + 2 + len > b.length) return false;
		const isMeta = (marker >= 0xe0 && marker <= 0xef) || marker === 0xfe;
		if (isMeta && hasZipHeader(b, at + 4, at + 2 + len)) return false;
		at += 2 + len;
		if (marker === 0xda) {
			sawScan = true;
			// Entropy-coded data: up to the next marker that is not stuffing or a restart.
			while (at + 1 < b.length) {
				if (b[at] === 0xff && b[at + 1] !== 0x00 && (b[at + 1] < 0xd0 || b[at + 1] > 0xd7)) break;
				at++;
			}
		}
	}
	return false;
}

/** PNG chunks of image data (compressed): their bytes are never read as an archive. */
const PNG_IMAGE_DATA = new Set(['IDAT', 'fdAT']);

/** A PNG walked chunk by chunk from IHDR to IEND, which must end the file. */
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
		if (!PNG_IMAGE_DATA.has(type) && hasZipHeader(b, at + 8, at + 8 + len)) return false;
		if (type === 'IEND') return next === b.length;
		at = next;
	}
	return false;
}

/** WebP chunks of image data (VP8, VP8L, alpha, animation frames). */
const WEBP_IMAGE_DATA = new Set(['VP8 ', 'VP8L', 'ALPH', 'ANMF']);

/** A RIFF/WEBP container whose size is the file's and whose chunks fill it exactly. */
function isWebp(b: Uint8Array): boolean {
	if (b.length < 20 || ascii(b, 0, 4) !== 'RIFF' || ascii(b, 8, 4) !== 'WEBP') return false;
	const view = new DataView(b.buffer, b.byteOffset, b.byteLength);
	if (view.getUint32(4, true) !== b.length - 8) return false;
	let at = 12;
	while (at + 8 <= b.length) {
		const type = ascii(b, at, 4);
		const len = view.getUint32(at + 4, true);
		const end = at + 8 + len;
		if (end > b.length) return false;
		if (!WEBP_IMAGE_DATA.has(type) && hasZipHeader(b, at + 8, end)) return false;
		at = end + (len & 1); // chunks are padded to an even length
	}
	return at === b.length;
}

/** The real type of `bytes`, or null when they are not one whole JPEG, PNG or WebP. */
export function sniffPhoto(bytes: Uint8Array): PhotoType | null {
	if (isJpeg(bytes)) return 'image/jpeg';
	if (isPng(bytes)) return 'image/png';
	if (isWebp(bytes)) return 'image/webp';
	return null;
}
