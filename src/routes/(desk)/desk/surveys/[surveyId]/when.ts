/** A calendar day (YYYY-MM-DD) as words, e.g. "20 Nov 2026"; "no date" when missing. */
export function day(iso: string | null): string {
	if (!iso) return 'no date';
	const d = new Date(`${iso}T00:00:00Z`);
	if (Number.isNaN(d.getTime())) return iso;
	return d.toLocaleDateString('en-GB', { dateStyle: 'medium', timeZone: 'UTC' });
}

/** A survey's days in words, whichever of them are set. */
export function days(from: string | null, to: string | null): string {
	if (from && to) return `${day(from)} to ${day(to)}`;
	if (from) return `from ${day(from)}`;
	if (to) return `until ${day(to)}`;
	return 'no dates set';
}
