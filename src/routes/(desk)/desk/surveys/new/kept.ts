/** Reading a form's kept values and field errors back (parseForm's failures) on a page. */
type Kept = Record<string, string | string[] | undefined>;

/** A kept text value ('' when none or when a list came back). */
export const kept = (values: Kept, name: string): string => {
	const v = values[name];
	return typeof v === 'string' ? v : '';
};

/** A kept list's values ([] when none). */
export const keptList = (values: Kept, name: string): string[] => {
	const v = values[name];
	return Array.isArray(v) ? v : typeof v === 'string' && v !== '' ? [v] : [];
};

/** The first error of a field or of any of its rows (`auditorIds`, `auditorIds.2`). */
export const firstError = (
	errors: Record<string, string | undefined>,
	name: string
): string | undefined =>
	errors[name] ?? Object.entries(errors).find(([k]) => k.startsWith(`${name}.`))?.[1] ?? undefined;
