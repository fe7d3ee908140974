/**
 * The totals of a report as labelled lines in the site's units and currency: a number in the
 * line's unit (for the XLSX summary sheet) and its text (for the PDF). One list, so the two
 * can never show different totals.
 */
import {
	cellText,
	cellValue,
	columnUnit,
	irrWords,
	paybackWords,
	type FigureColumn
} from '../../figures';
import { fromMinorUnits } from '../../steam';
import { formatSignificant } from '../../units';
import { moneyText } from '../../components/savings/money';
import type { ReportContent } from './content';

export interface SummaryLine {
	label: string;
	value: number | null;
	unit: string;
	text: string;
}

const FIGURES: [FigureColumn, string][] = [
	['steam', 'Steam saved'],
	['heat', 'Heat saved'],
	['energy', 'Fuel energy saved'],
	['cost', 'Cost saved'],
	['co2', 'CO2 avoided'],
	['water', 'Water saved'],
	['repair', 'Repair cost (known)']
];

export function summaryLines(content: ReportContent): SummaryLine[] {
	const { totals: t, survey, currency } = content;
	const system = survey.unitSystem;
	const figures = { ...t, paybackYears: undefined };
	const lines: SummaryLine[] = FIGURES.map(([column, label]) => {
		const unit = columnUnit(column, system, currency);
		return {
			label,
			value: cellValue(figures, column, system),
			unit,
			text:
				column === 'cost'
					? `${moneyText(t.costMinor, currency)} per year`
					: column === 'repair'
						? moneyText(t.repairCostMinor, currency)
						: `${cellText(figures, column, system)} ${unit}`
		};
	});
	const money = (label: string, minor: number): SummaryLine => ({
		label,
		value: fromMinorUnits(minor, currency),
		unit: currency,
		text: moneyText(minor, currency)
	});
	if (t.extraCostMinor > 0) {
		lines.push(
			money('Measures’ own costs (access, scaffold, shutdown, other)', t.extraCostMinor),
			money('Investment in all (repairs and measures)', t.investmentMinor)
		);
	}
	const count = (label: string, n: number): SummaryLine => ({
		label,
		value: n,
		unit: 'findings',
		text: n.toLocaleString('en-US')
	});
	lines.push(
		{
			label: 'Payback of the whole',
			value: t.paybackYears,
			unit: 'years',
			text: t.paybackYears === null ? 'not known yet' : paybackWords(t.paybackYears)
		},
		count('Findings that save', t.count),
		count('Of which without a repair cost yet', t.withoutRepairCost)
	);
	if (t.outOfDate > 0) lines.push(count('Left out: figures out of date', t.outOfDate));
	if (t.withoutFigures > 0) lines.push(count('Left out: no figures', t.withoutFigures));
	const e = t.economics;
	if (e) {
		const npv = Math.round(e.npvMinor);
		lines.push(
			{
				label: `Net present value (${formatSignificant(e.discountRate * 100)} %, ${e.lifeYears} years)`,
				value: fromMinorUnits(npv, currency),
				unit: currency,
				text: moneyText(npv, currency)
			},
			{
				label: 'Internal rate of return',
				value: e.irr === null ? null : e.irr * 100,
				unit: '% per year',
				text: irrWords(e.irr)
			}
		);
	}
	return lines;
}
