/** The formats Moment.svelte writes moments in, each built once per style and clock zone. */
const formats = new Map<string, Intl.DateTimeFormat>();

/** "2 Dec 2026, 14:05 CET" (short: "02/12/2026, 14:05 CET"); zone undefined: the reader's own. */
export function momentFormat(short: boolean, zone: string | undefined): Intl.DateTimeFormat {
	const key = `${short}|${zone ?? ''}`;
	let f = formats.get(key);
	if (!f) {
		f = new Intl.DateTimeFormat('en-GB', {
			day: 'numeric',
			month: short ? '2-digit' : 'short',
			year: 'numeric',
			hour: '2-digit',
			minute: '2-digit',
			timeZone: zone,
			timeZoneName: 'short'
		});
		formats.set(key, f);
	}
	return f;
}
