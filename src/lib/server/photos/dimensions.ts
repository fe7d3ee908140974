/** Width and height read from an image's header bytes (null when not found). */
import type { PhotoType } from './sniff';

export function dimensions(
	b: Uint8Array,
	type: PhotoType
): { width: number; height: number } | null {
	const view = new DataView(b.buffer, b.byteOffset, b.byteLength);
	if (type === 'image/png') return { width: view.getUint32(16), height: view.getUint32(20) };
	if (type === 'image/webp') {
		const chunk = String.fromCharCode(...b.subarray(12, 16));
		if (chunk === 'VP8X' && b.length >= 30) {
			const w = 1 + (b[24] | (b[25] << 8) | (b[26] << 16));
			const h = 1 + (b[27] | (b[28] << 8) | (b[29] << 16));
			return { width: w, height: h };
		}
		if (chunk === 'VP8 ' && b.length >= 30) {
			return {
				width: view.getUint16(26, true) & 0x3fff,
				height: view.getUint16(28, true) & 0x3fff
			};
		}
		if (chunk === 'VP8L' && b.length >= 25) {
			const bits = view.getUint32(21, true);
			return { width: (bits & 0x3fff) + 1, height: ((bits >> 14) & 0x3fff) + 1 };
		}
		return null;
	}
	// JPEG: the first start-of-frame segment (SOF0–SOF15 except DHT, JPG and DAC).
	let at = 2;
	while (at + 9 < b.length && b[at] === 0xff) {
		const marker = b[at + 1];
		const len = view.getUint16(at + 2);
		const sof = marker >= 0xc0 && marker <= 0xcf && ![0xc4, 0xc8, 0xcc].includes(marker);
		if (sof) return { height: view.getUint16(at + 5), width: view.getUint16(at + 7) };
		if (marker === 0xda) return null;
		at += 2 + len;
	}
	return null;
}
