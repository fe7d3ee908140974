/**
 * The codes plants put on trap tags: QR and Data Matrix on newer plates, Code 128 and Code 39
 * on older printed labels, EAN-13 where a stock number doubles as the tag.
 */
export const TAG_FORMATS = ['qr_code', 'data_matrix', 'code_128', 'code_39', 'ean_13'] as const;

export type TagFormat = (typeof TAG_FORMATS)[number];

/** The tag formats among those a detector says it reads, in our order. */
export function formatsToUse(supported: readonly string[]): TagFormat[] {
	return TAG_FORMATS.filter((f) => supported.includes(f));
}
