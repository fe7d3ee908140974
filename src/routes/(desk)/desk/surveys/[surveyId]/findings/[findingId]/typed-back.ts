/**
 * What the edit form sent, as the page shows it again after a refusal: the flat fields (the
 * Walk's keys, repair cost) and the insulation layer rows, exactly as typed.
 */
import type { LayerRow } from '$lib/schemas/desk-finding';
import type { FormObject } from '$lib/server/forms';

export function typedBack(fields: FormObject): {
	values: Record<string, string>;
	layers: LayerRow[];
} {
	const values: Record<string, string> = {};
	for (const [k, v] of Object.entries(fields)) if (typeof v === 'string') values[k] = v;
	const rows = Array.isArray(fields.layers) ? fields.layers : [];
	const text = (row: unknown, key: string) => {
		const v = row && typeof row === 'object' ? (row as Record<string, unknown>)[key] : '';
		return typeof v === 'string' ? v : '';
	};
	const layers = rows.map((r) => ({
		thickness: text(r, 'thickness'),
		material: text(r, 'material'),
		conductivity: text(r, 'conductivity')
	}));
	return { values, layers };
}
