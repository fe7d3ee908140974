/**
 * The review table's views, kept between requests: for one survey and one filter, the totals;
 * for one filter and one order, every matching finding's id in that order (a page is a slice);
 * and each page's rows once read. A consultant paging or re-sorting then costs one small query
 * for a page's rows instead of a scan of the survey's findings, and twenty people on the same
 * page cost none.
 *
 * Keys hold everything a view depends on, so an entry is never served for data it was not made
 * from: the survey, the basis its figures count as current on, and the firm's change counter
 * (change_counters, $lib/server/sync/counter), which every write the table can show moves on —
 * a push, an edit at the Desk, a resolved conflict, a photo, a header, area or tag change (each
 * takes a change_seq), a review and a site re-priced or recomputed (touchFirm). A view is read
 * with the counter as it stood before its queries ran, so a write racing it leaves it under an
 * old counter that no later request asks for. Entries also expire after VIEW_TTL_MS, for writes
 * made outside the app (an operator's SQL). Concurrent misses of one key share one query.
 */
import { LRUCache } from 'lru-cache';

/** Ids held at most (about 60 bytes each): the size bound of the id lists. */
export const VIEW_CACHE_IDS = 500_000;
/** Rows of kept pages held at most (under a kilobyte each). */
export const VIEW_CACHE_PAGE_ITEMS = 50_000;
/** Totals entries held at most. */
export const VIEW_CACHE_TOTALS = 2_000;
/** No view is served older than this, whatever the counter says. */
export const VIEW_TTL_MS = 5 * 60_000;

type Load<V> = () => Promise<V>;

/**
 * A view cache: `get(key, load)` answers the entry under `key`, or runs `load` once for every
 * caller waiting on that key and keeps its answer (a failed load rejects them all and keeps
 * nothing). Bounded by entries (`max`) or by the sum of `size` (`maxSize`).
 */
export function viewCache<V extends object>(
	bound: { max: number } | { maxSize: number; size: (v: V) => number }
) {
	const cache = new LRUCache<string, V, Load<V>>({
		...('max' in bound
			? { max: bound.max }
			: { maxSize: bound.maxSize, sizeCalculation: bound.size }),
		ttl: VIEW_TTL_MS,
		fetchMethod: (_key, _stale, { context }) => context()
	});
	return async (key: string, load: Load<V>): Promise<V> => {
		const value = await cache.fetch(key, { context: load });
		return value as V; // fetchMethod never answers undefined
	};
}
