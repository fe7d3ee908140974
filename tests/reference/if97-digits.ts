import { expect } from 'vitest';

/**
 * Asserts that `actual` rounds to a value published as a decimal string such as
 * '0.100215168e-2': the difference may be at most half a unit in the last published digit
 * (relative 5e-9 or tighter for the IF97 tables' nine significant digits).
 */
export function expectPublished(actual: number, published: string): void {
	const match = /^(-?)(\d*)\.(\d+)(?:e([+-]?\d+))?$/i.exec(published);
	if (!match) throw new Error(`not a published decimal: ${published}`);
	const decimals = match[3].length;
	const exponent = match[4] === undefined ? 0 : Number(match[4]);
	const value = Number(published);
	const halfUnit = 0.5 * 10 ** (exponent - decimals);
	// A few ulps of slack for the decimal-to-binary conversion of the bound itself.
	expect(Math.abs(actual - value), `${actual} vs published ${published}`).toBeLessThanOrEqual(
		halfUnit * (1 + 1e-9) + 4 * Number.EPSILON * Math.abs(value)
	);
}
