/**
 * The ZXing-based detector (the `barcode-detector` ponyfill), for browsers without a built-in
 * BarcodeDetector. Imported only when scanning starts, so neither this code nor its 1.1 MB
 * .wasm weighs on the Walk's first load.
 */
import { BarcodeDetector, prepareZXingModule } from 'barcode-detector/ponyfill';
import wasmUrl from 'zxing-wasm/reader/zxing_reader.wasm?url';
import { TAG_FORMATS } from './formats';
import { wasmLocator } from './locate';

/** The app's own URL of the reader's .wasm (hashed, under /_app/immutable/assets/). */
export const zxingWasmUrl: string = wasmUrl;

/**
 * A detector for the tag formats with the reader loaded from the app. Loading is awaited here
 * so a failure is reported when the scanner opens, not silently on every frame.
 */
export async function zxingDetector(): Promise<BarcodeDetector> {
	await prepareZXingModule({
		overrides: { locateFile: wasmLocator(wasmUrl) },
		fireImmediately: true
	});
	return new BarcodeDetector({ formats: [...TAG_FORMATS] });
}
