/**
 * The columns of the findings exports (XLSX and CSV), one definition for both: a title that
 * carries the unit in the site's unit system and currency ("Water (m³/yr)", "Cost (EUR/yr)"),
 * and each row's value — text, or a number in that unit (money in major units).
 */
import { cellValue, columnTitle, columnUnit, type FigureColumn } from '../../figures';
import type { UnitSystemId } from '../../units';
import type { ReportRow } from './rows';

export interface ExportColumn {
	title: string;
	/** The unit alone (for a number format or a note); null for text. */
	unit: string | null;
	/** Width in characters for the spreadsheet. */
	width: number;
	/** Money: kept to the currency's minor units. */
	money: boolean;
	value: (row: ReportRow) => string | number | null;
}

const text = (title: string, width: number, value: (r: ReportRow) => string | number | null) => ({
	title,
	unit: null,
	width,
	money: false,
	value
});

export function exportColumns(system: UnitSystemId, currency: string): ExportColumn[] {
	const figure = (column: FigureColumn): ExportColumn => ({
		title: columnTitle(column, system, currency),
		unit: columnUnit(column, system, currency),
		width: 16,
		money: column === 'cost' || column === 'repair',
		value: (r) => cellValue(r, column, system)
	});
	const minor = (title: string, pick: (r: ReportRow) => number): ExportColumn => ({
		title: `${title} (${currency})`,
		unit: currency,
		width: 18,
		money: true,
		value: (r) => cellValue({ ...r, costMinor: pick(r) }, 'cost', system)
	});
	return [
		text('Rank', 6, (r) => r.rank),
		text('Finding', 38, (r) => r.id),
		text('Kind', 16, (r) => r.kindWords),
		text('Tag', 14, (r) => r.tag),
		text('Location', 28, (r) => r.location),
		text('Area', 18, (r) => r.area),
		text('Header', 18, (r) => r.header),
		text('Condition', 16, (r) => r.conditionWords),
		text('Status', 12, (r) => r.statusWords),
		figure('steam'),
		figure('heat'),
		figure('energy'),
		figure('cost'),
		figure('co2'),
		figure('water'),
		figure('repair'),
		figure('payback'),
		{
			...minor('Cumulative saving', (r) => r.cumulativeSavingMinor),
			title: `Cumulative saving (${currency}/yr)`,
			unit: `${currency}/yr`
		},
		minor('Cumulative repair', (r) => r.cumulativeRepairCostMinor)
	];
}
