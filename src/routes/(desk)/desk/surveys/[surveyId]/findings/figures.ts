/**
 * The table's figures in the person's units (stored figures are kg/h, kW, GJ, kg, m³ per year;
 * money in minor units of its currency). Numbers only: the column headers carry the units.
 */
import { cellText, type FigureColumn } from '$lib/figures';
import type { UnitSystemId } from '$lib/units';
import type { FindingItem, FindingTotals } from '$lib/server/desk/findings-query';

export { cellText, columnTitle, type FigureColumn } from '$lib/figures';

/** One row's cell. */
export const figureText = (item: FindingItem, column: FigureColumn, system: UnitSystemId) =>
	cellText(item, column, system);

/** A total's cell. */
export const totalText = (t: FindingTotals, column: FigureColumn, system: UnitSystemId) =>
	cellText(t, column, system);

/** Why a row's figures are not current, in words (null when they are). */
export function staleWords(item: FindingItem): string | null {
	switch (item.figureState) {
		case 'current':
			return null;
		case 'basis':
			return 'Out of date: priced on an earlier cost basis';
		case 'engine':
			return 'Out of date: worked out by an older version of the calculations';
		case 'none':
			return item.pricingNote ?? 'No figures for this finding';
	}
}
