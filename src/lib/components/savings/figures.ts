/**
 * The table's figures in the person's units (stored figures are kg/h, kW, GJ, kg, m³ per year;
 * money in minor units of its currency). Numbers only: the column headers carry the units.
 */
import { formatMoney } from '$lib/components/walk/form/display';
import { fromMinorUnits } from '$lib/steam';
import {
	displayUnit,
	formatQuantityParts,
	formatSignificant,
	unitLabel,
	type Quantity,
	type UnitSystemId
} from '$lib/units';

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

/** Column titles with the person's units: "Steam lost (lb/h)". */
export function columnTitle(column: FigureColumn, system: UnitSystemId, currency: string): string {
	const unit = (q: Quantity) => unitLabel(displayUnit(q, system));
	switch (column) {
		case 'steam':
			return `Steam lost (${unit('massFlow')})`;
		case 'heat':
			return `Heat lost (${unit('power')})`;
		case 'energy':
			return `Fuel (${unit('energy')}/yr)`;
		case 'cost':
			return `Cost (${currency}/yr)`;
		case 'co2':
			return `CO2 (${unit('mass')}/yr)`;
		case 'water':
			return `Water (${unit('volume')}/yr)`;
		case 'repair':
			return `Repair (${currency})`;
		case 'payback':
			return 'Payback (years)';
	}
}

const money = (minor: number | null, currency: string) =>
	minor === null ? '—' : formatMoney(fromMinorUnits(minor, currency), currency);

function quantity(column: FigureColumn, stored: number | null, system: UnitSystemId): string {
	const [q, scale] = QUANTITY[column]!;
	return formatQuantityParts(stored === null ? null : stored * scale, q, system).number;
}

/** The figures a row and the totals share (same names, same units; a row's may be missing). */
type Figures = { currency: string; paybackYears?: number | null } & Record<
	| 'steamKgH'
	| 'heatKw'
	| 'fuelGjYear'
	| 'co2KgYear'
	| 'waterM3Year'
	| 'costMinor'
	| 'repairCostMinor',
	number | null
>;

/** One cell's text, for a row or the totals (totals have no payback: an empty cell); the savings page shares it. */
export function cellText(f: Figures, column: FigureColumn, system: UnitSystemId): string {
	switch (column) {
		case 'steam':
			return quantity(column, f.steamKgH, system);
		case 'heat':
			return quantity(column, f.heatKw, system);
		case 'energy':
			return quantity(column, f.fuelGjYear, system);
		case 'co2':
			return quantity(column, f.co2KgYear, system);
		case 'water':
			return quantity(column, f.waterM3Year, system);
		case 'cost':
			return money(f.costMinor, f.currency);
		case 'repair':
			return money(f.repairCostMinor, f.currency);
		case 'payback':
			if (f.paybackYears === undefined) return '';
			return f.paybackYears === null ? '—' : formatSignificant(f.paybackYears);
	}
}
