/**
 * One way to read codes from the camera's picture: the browser's own BarcodeDetector where it
 * has one that reads our formats (Android Chrome, Safari 17+ on some devices), else ZXing
 * compiled to WebAssembly and served by the app.
 */
import { formatsToUse } from './formats';

/** A camera frame, or (in specs) a picture file or pixel array. */
export type ScanSource = HTMLVideoElement | Blob | ImageData;

export interface TagDetector {
	/** Which reader this is, for the screen's small print. */
	engine: 'built-in' | 'zxing';
	/** Raw values of the codes seen in the picture (none when there are none). */
	detect(source: ScanSource): Promise<string[]>;
}

interface NativeDetector {
	detect(source: ScanSource): Promise<{ rawValue: string }[]>;
}

// ZXing reports a picture it cannot make out as an empty "unknown" code: that is no code.
const values = (codes: { rawValue: string }[]) =>
	codes.map((c) => c.rawValue).filter((v) => v.trim() !== '');
interface NativeDetectorClass {
	new (options: { formats: string[] }): NativeDetector;
	getSupportedFormats(): Promise<string[]>;
}

/** The built-in detector if it reads a QR code at least, else null. */
async function builtIn(): Promise<TagDetector | null> {
	const Native = (globalThis as { BarcodeDetector?: NativeDetectorClass }).BarcodeDetector;
	if (typeof Native?.getSupportedFormats !== 'function') return null;
	try {
		const formats = formatsToUse(await Native.getSupportedFormats());
		if (!formats.includes('qr_code')) return null;
		const native = new Native({ formats });
		return {
			engine: 'built-in',
			detect: async (source) => values(await native.detect(source))
		};
	} catch {
		// Some builds expose the class without a working backend: fall back to ZXing.
		return null;
	}
}

/** A detector for the tag formats; throws when neither reader can be loaded. */
export async function openDetector(): Promise<TagDetector> {
	const native = await builtIn();
	if (native) return native;
	const { zxingDetector } = await import('./zxing');
	const zxing = await zxingDetector();
	return {
		engine: 'zxing',
		detect: async (source) => values(await zxing.detect(source))
	};
}
