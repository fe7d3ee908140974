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

const hasZipHeader = (b: Uint8Array, from: number, to: number) => {
	for (let i = from; i + 3 < to; i++) {
		if (b[i] === 0x50 && b[i + 1] === 0x4b && b[i + 2] === 0x03 && b[i + 3] === 0x04) return true;
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
