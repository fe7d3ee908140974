/**
 * One measure's page: the job and what it holds, what it costs (its findings' repairs and its
 * own access, scaffold, shutdown and other costs), what it saves, its payback and, on a basis
 * with a life and a discount rate, its NPV and IRR; then its saving findings in rank order.
 */
import { moneyText } from '../../../components/savings/money';
import { irrWords, paybackWords } from '../../../figures';
import { formatSignificant, type UnitSystemId } from '../../../units';
import type { MeasureRow } from '../../measures/sums';
import type { ReportRow } from '../rows';
import { COLOUR, heading, pairs, paragraph, subheading, type Doc } from './frame';
import { rankedTable } from './table';

export function measureFacts(m: MeasureRow, currency: string): { label: string; value: string }[] {
	const money = (minor: number) => moneyText(minor, currency);
	const own = [
		['Access', m.extras.access],
		['Scaffold', m.extras.scaffold],
		['Shutdown', m.extras.shutdown],
		[m.otherLabel ? `Other: ${m.otherLabel}` : 'Other', m.extras.other]
	] as const;
	return [
		{ label: 'Findings in it', value: m.findings.toLocaleString('en-US') },
		{ label: `Annual saving (${currency}/yr)`, value: money(m.annualSaving) },
		{
			label: `Its findings’ repairs (${currency})`,
			value:
				money(m.repairCost) +
				(m.withoutRepairCost > 0 ? ` (${m.withoutRepairCost} not priced yet)` : '')
		},
		...own.filter(([, v]) => v > 0).map(([label, v]) => ({ label, value: money(v) })),
		{
			label: `Cost in all (${currency})`,
			value: m.cost === null ? 'not known yet' : money(m.cost)
		},
		{ label: 'Simple payback', value: paybackWords(m.paybackYears) },
		...(m.economics
			? [
					{
						label: `Net present value (${formatSignificant(m.economics.discountRate * 100)} %, ${m.economics.lifeYears} years)`,
						value: moneyText(Math.round(m.economics.npvMinor), currency)
					},
					{
						label: 'Internal rate of return',
						value: irrWords(m.economics.irr)
					}
				]
			: [])
	];
}

export async function measurePage(
	doc: Doc,
	m: MeasureRow & { rank?: number },
	rows: AsyncIterable<ReportRow>,
	system: UnitSystemId,
	currency: string,
	pace: () => Promise<void>
): Promise<void> {
	doc.addPage();
	heading(doc, `Measure: ${m.name}`, 16);
	if (m.description) paragraph(doc, m.description, { size: 10 });
	pairs(doc, measureFacts(m, currency), 200);
	subheading(doc, 'Its findings that save, in rank order');
	const listed = await rankedTable(doc, rows, system, currency, null, pace);
	if (listed === 0) {
		paragraph(doc, 'None of its findings saves anything on these figures.', {
			size: 9,
			colour: COLOUR.muted
		});
	}
}
