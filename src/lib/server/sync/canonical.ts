/** A capture as one string whatever its key order or time notation: "is this the same edit?" */
import type { FindingCapture } from '../../schemas/capture';

function sorted(value: unknown): unknown {
	if (Array.isArray(value)) return value.map(sorted);
	if (value && typeof value === 'object') {
		return Object.fromEntries(
			Object.entries(value as Record<string, unknown>)
				.filter(([, v]) => v !== undefined)
				.sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))
				.map(([k, v]) => [k, sorted(v)])
		);
	}
	return value;
}

export function captureKey(capture: FindingCapture): string {
	return JSON.stringify(
		sorted({
			...capture,
			assetTag: capture.assetTag?.trim() || undefined,
			createdAt: new Date(capture.createdAt).toISOString(),
			updatedAt: new Date(capture.updatedAt).toISOString()
		})
	);
}
