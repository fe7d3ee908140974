/**
 * A seeded pseudo-random source for the sync chaos runs (mulberry32): the same seed always
 * gives the same scenario, faults and ids, so a failing seed can be replayed exactly.
 */
export interface Rng {
	/** Uniform in [0, 1). */
	next(): number;
	/** Whole number in [min, max]. */
	int(min: number, max: number): number;
	chance(p: number): boolean;
	pick<T>(items: readonly T[]): T;
	/** A version-4-shaped UUID made from the stream (fresh ids per seed, no collisions between seeds). */
	uuid(): string;
}

export function mulberry32(seed: number): Rng {
	let a = seed >>> 0;
	const next = () => {
		a = (a + 0x6d2b79f5) >>> 0;
		let t = a;
		t = Math.imul(t ^ (t >>> 15), t | 1);
		t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
		return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
	};
	const int = (min: number, max: number) => min + Math.floor(next() * (max - min + 1));
	const hex = (n: number) => Array.from({ length: n }, () => int(0, 15).toString(16)).join('');
	return {
		next,
		int,
		chance: (p) => next() < p,
		pick: (items) => items[int(0, items.length - 1)],
		uuid: () => `${hex(8)}-${hex(4)}-4${hex(3)}-${'89ab'[int(0, 3)]}${hex(3)}-${hex(12)}`
	};
}
