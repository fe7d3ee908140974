/**
 * The table's view is its address: sort, filters, search and page live in the query string
 * (the API's own parameters), so a view can be shared and a reload restores it.
 */
import {
	defaultDir,
	findingsQuerySchema,
	findingsQueryString,
	readFindingsQuery,
	type FindingsQuery,
	type FindingSortKey
} from '$lib/schemas/desk-findings';

export const DEFAULT_VIEW: FindingsQuery = findingsQuerySchema.parse({});

/** The view an address asks for; a query the API would refuse falls back to the default, with why. */
export function viewOf(url: URL): { view: FindingsQuery; problem: string | null } {
	const read = readFindingsQuery(url.searchParams);
	return read.ok
		? { view: read.query, problem: null }
		: {
				view: DEFAULT_VIEW,
				problem: `This address asked for a view the table cannot show (${read.message}), so it shows every finding.`
			};
}

/** Sorting by a column: a second click turns it round; a new column starts at its default. */
export function sortedBy(view: FindingsQuery, key: FindingSortKey): FindingsQuery {
	const dir = view.sort === key ? (view.dir === 'asc' ? 'desc' : 'asc') : defaultDir(key);
	return { ...view, sort: key, dir, page: 1 };
}

export const queryString = (view: FindingsQuery) => {
	const qs = findingsQueryString(view);
	return qs ? `?${qs}` : '';
};

export function ariaSort(view: FindingsQuery, key: FindingSortKey) {
	if (view.sort !== key) return 'none' as const;
	return view.dir === 'asc' ? ('ascending' as const) : ('descending' as const);
}
