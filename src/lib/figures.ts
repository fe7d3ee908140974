/**
 * A finding's stored figures in a person's (or a site's) units: column titles that carry the
 * units, a cell's text, and a cell's number for spreadsheets. Stored figures are kg/h, kW, GJ,
 * kg and m³ per year; money in integer minor units of its currency. Shared by the Desk's tables,
 * the savings and publish pages, and the server's reports (CSV, XLSX, PDF).
 */
import { formatMoney } from './components/walk/form/display';
import { fromMinorUnits } from './steam';
import {
	displayUnit,
	formatQuantityParts,
	formatSignificant,
	fromBase,
	unitLabel,
	type Quantity,
	type UnitSystemId
} from './units';

export type FigureColumn =
	'steam' | 'heat' | 'energy' | 'cost' | 'co2' | 'water' | 'repair' | 'payback';

/** Stored value → base units, and the quantity it is shown as. */
const QUANTITY: Partial<Record<FigureColumn, [Quantity, number]>> = {
	steam: ['massFlow', 1 / 3600],
	heat: ['power', 1000],
	energy: ['energy', 1e9],
	co2: ['mass', 1],
	water: ['volume', 1]
};

/** The unit a figure column is shown in: "lb/h", "m³/yr", "EUR/yr"; null for payback (years). */
export function columnUnit(column: FigureColumn, system: UnitSystemId, currency: string): string {
	const unit = (q: Quantity) => unitLabel(displayUnit(q, system));
	switch (column) {
		case 'steam':
			return unit('massFlow');
		case 'heat':
			return unit('power');
		case 'energy':
			return `${unit('energy')}/yr`;
		case 'cost':
			return `${currency}/yr`;
		case 'co2':
			return `${unit('mass')}/yr`;
		case 'water':
			return `${unit('volume')}/yr`;
		case 'repair':
			return currency;
		case 'payback':
			return 'years';
	}
}

const TITLE: Record<FigureColumn, string> = {
	steam: 'Steam lost',
	heat: 'Heat lost',
	energy: 'Fuel',
	cost: 'Cost',
	co2: 'CO2',
	water: 'Water',
	repair: 'Repair',
	payback: 'Payback'
};

/** Column titles with the person's units: "Steam lost (lb/h)". */
export function columnTitle(column: FigureColumn, system: UnitSystemId, currency: string): string {
	return `${TITLE[column]} (${columnUnit(column, system, currency)})`;
}

/** Money as every figure cell shows it: three significant figures, the currency's sign; — for none. */
export const money = (minor: number | null, currency: string) =>
	minor === null ? '—' : formatMoney(fromMinorUnits(minor, currency), currency);

function quantity(column: FigureColumn, stored: number | null, system: UnitSystemId): string {
	const [q, scale] = QUANTITY[column]!;
	return formatQuantityParts(stored === null ? null : stored * scale, q, system).number;
}

/** The figures a row and the totals share (same names, same units; a row's may be missing). */
export type Figures = { currency: string; paybackYears?: number | null } & Record<
	| 'steamKgH'
	| 'heatKw'
	| 'fuelGjYear'
	| 'co2KgYear'
	| 'waterM3Year'
	| 'costMinor'
	| 'repairCostMinor',
	number | null
>;

const STORED: Record<Exclude<FigureColumn, 'payback'>, keyof Figures> = {
	steam: 'steamKgH',
	heat: 'heatKw',
	energy: 'fuelGjYear',
	co2: 'co2KgYear',
	water: 'waterM3Year',
	cost: 'costMinor',
	repair: 'repairCostMinor'
};

/** One cell's text, for a row or the totals (totals have no payback: an empty cell). */
export function cellText(f: Figures, column: FigureColumn, system: UnitSystemId): string {
	if (column === 'payback') {
		if (f.paybackYears === undefined) return '';
		return f.paybackYears === null ? '—' : formatSignificant(f.paybackYears);
	}
	const stored = f[STORED[column]] as number | null;
	if (column === 'cost' || column === 'repair') return money(stored, f.currency);
	return quantity(column, stored, system);
}

/**
 * One cell's number in the column's unit (columnUnit), unrounded, for a spreadsheet: money in
 * major units of the currency, payback in years; null when the figure is missing.
 */
export function cellValue(f: Figures, column: FigureColumn, system: UnitSystemId): number | null {
	if (column === 'payback') return f.paybackYears ?? null;
	const stored = f[STORED[column]] as number | null;
	if (stored === null) return null;
	if (column === 'cost' || column === 'repair') return fromMinorUnits(stored, f.currency);
	const [q, scale] = QUANTITY[column]!;
	return fromBase(q, stored * scale, displayUnit(q, system) as never);
}

/**
 * A payback in words for people, not spreadsheets: years with a short one also in months
 * ("0.42 years (about 5 months)"), "under a month", or "does not pay back" when there is none.
 */
export function paybackWords(years: number | null): string {
	if (years === null) return 'does not pay back';
	const number = formatSignificant(years);
	const text = `${number} ${number === '1' ? 'year' : 'years'}`;
	if (years >= 1) return text;
	return `${text} (${monthsWords(years)})`;
}

/** Under a year, in months: "about 5 months", "under a month". */
function monthsWords(years: number): string {
	const months = Math.round(years * 12);
	if (months < 1) return 'under a month';
	return `about ${months} ${months === 1 ? 'month' : 'months'}`;
}

/** A payback in a tile's few words: "about 5 months", "1.4 years", "—" for none. */
export function paybackShort(years: number | null): string {
	if (years === null) return '—';
	if (years < 1) return monthsWords(years);
	return `${years.toFixed(years < 10 ? 1 : 0)} years`;
}

/** Above this an IRR says little more than "pays back within months": it is shown as a bound. */
export const IRR_SHOWN_UP_TO = 1;

/** An internal rate of return in words: "14 % per year", "over 100 % per year", or none. */
export function irrWords(irr: number | null): string {
	if (irr === null) return 'none (no single rate)';
	if (irr > IRR_SHOWN_UP_TO) return `over ${formatSignificant(IRR_SHOWN_UP_TO * 100)} % per year`;
	return `${formatSignificant(irr * 100)} % per year`;
}
