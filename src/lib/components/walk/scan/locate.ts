/**
 * Where the ZXing reader finds its .wasm. By default zxing-wasm fetches it from a public CDN,
 * which a phone in a plant room cannot reach and which we would not want to depend on: the app
 * serves its own copy (precached by the service worker), and every other file the Emscripten
 * loader asks for keeps its usual place beside the script.
 */
export function wasmLocator(wasmUrl: string): (path: string, prefix: string) => string {
	return (path, prefix) => (path.endsWith('.wasm') ? wasmUrl : prefix + path);
}
