/**
 * Numbers as people type them on a phone: "3.5", "3,5" (decimal comma), " 12 ", "−4"
 * (a typographic minus), "1,234.5" or "1 234,5" (grouped). Returns null for an empty field and
 * NaN for text that is not a number, so the caller can tell "not given" from "not a number".
 */
export function parseNumber(text: string): number | null {
	let s = text.trim();
	if (s === '') return null;
	s = s.replace(/[\u2212\u2012\u2013]/g, '-').replace(/[\s\u00a0\u202f']/g, '');
	if (s.includes('.') && s.includes(',')) {
		// Both marks: the last one is the decimal mark, the other groups thousands.
		s =
			s.lastIndexOf(',') > s.lastIndexOf('.')
				? s.replace(/\./g, '').replace(',', '.')
				: s.replace(/,/g, '');
	} else if (/^-?\d{1,3}(,\d{3}){2,}$/.test(s)) {
		s = s.replace(/,/g, '');
	} else if ((s.match(/,/g) ?? []).length === 1) {
		s = s.replace(',', '.');
	}
	if (!/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(s)) return NaN;
	return Number(s);
}
