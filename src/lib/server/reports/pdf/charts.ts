/**
 * The summary's charts, drawn as vectors: the Pareto curve (cumulative annual saving against
 * cumulative repair cost, findings in rank order) and bars of the saving by kind and by area.
 * Every chart's numbers are also printed as text beside or below it.
 */
import { compactMoney, moneyText } from '../../../components/savings/money';
import type { SavingsGroup } from '../../savings/totals';
import { COLOUR, CONTENT_WIDTH, FONT, PAGE, keep, oneLine, type Doc } from './frame';

export interface ParetoPoint {
	rank: number;
	saving: number;
	repair: number;
}

/** A round step for an axis from 0 to max with about `ticks` steps. */
function niceStep(max: number, ticks: number) {
	const raw = max / ticks;
	const p = 10 ** Math.floor(Math.log10(raw));
	const m = raw / p;
	return (m <= 1 ? 1 : m <= 2 ? 2 : m <= 2.5 ? 2.5 : m <= 5 ? 5 : 10) * p;
}

export function paretoChart(doc: Doc, points: readonly ParetoPoint[], currency: string) {
	const height = 210;
	keep(doc, height + 70);
	const left = PAGE.margin + 52;
	const top = doc.y + 8;
	const width = CONTENT_WIDTH - 64;
	const last = points[points.length - 1] ?? { rank: 0, saving: 0, repair: 0 };
	const xMax = Math.max(last.repair, 1);
	const yMax = Math.max(last.saving, 1);
	const xStep = niceStep(xMax, 5);
	const yStep = niceStep(yMax, 5);
	const xTop = Math.ceil(xMax / xStep) * xStep;
	const yTop = Math.ceil(yMax / yStep) * yStep;
	const X = (v: number) => left + (v / xTop) * width;
	const Y = (v: number) => top + height - (v / yTop) * height;

	doc.font(FONT.regular).fontSize(7.5).fillColor(COLOUR.muted);
	for (let v = 0; v <= yTop + 1e-9; v += yStep) {
		doc
			.moveTo(left, Y(v))
			.lineTo(left + width, Y(v))
			.lineWidth(0.4)
			.strokeColor(COLOUR.rule)
			.stroke();
		doc.text(compactMoney(Math.round(v), currency), PAGE.margin, Y(v) - 4, {
			width: 46,
			align: 'right',
			lineBreak: false
		});
	}
	for (let v = 0; v <= xTop + 1e-9; v += xStep) {
		doc
			.moveTo(X(v), top + height)
			.lineTo(X(v), top + height + 3)
			.lineWidth(0.6)
			.strokeColor(COLOUR.line)
			.stroke();
		doc.text(compactMoney(Math.round(v), currency), X(v) - 30, top + height + 6, {
			width: 60,
			align: 'center',
			lineBreak: false
		});
	}
	doc
		.moveTo(left, top)
		.lineTo(left, top + height)
		.lineTo(left + width, top + height)
		.lineWidth(0.8)
		.strokeColor(COLOUR.line)
		.stroke();

	if (points.length > 0) {
		doc.moveTo(X(0), Y(0));
		for (const p of points) doc.lineTo(X(p.repair), Y(p.saving));
		doc.lineWidth(1.8).strokeColor(COLOUR.wisp).lineJoin('round').stroke();
		if (points.length <= 60) {
			for (const p of points) doc.circle(X(p.repair), Y(p.saving), 1.8).fill(COLOUR.copper);
		}
	}
	doc.font(FONT.regular).fontSize(8).fillColor(COLOUR.muted);
	doc.text(`Cumulative repair cost (${currency})`, left, top + height + 20, {
		width,
		align: 'center'
	});
	doc.save();
	doc.rotate(-90, { origin: [PAGE.margin - 8, top + height / 2] });
	doc.text(`Cumulative saving (${currency}/yr)`, PAGE.margin - 8 - 80, top + height / 2 - 12, {
		width: 160,
		align: 'center',
		lineBreak: false
	});
	doc.restore();
	doc.x = PAGE.margin;
	doc.y = top + height + 38;
	doc.fillColor(COLOUR.ink);
}

/** The Pareto curve in words: what the first findings in rank order give, and at what cost. */
export function paretoWords(
	points: readonly ParetoPoint[],
	count: number,
	currency: string
): string[] {
	const last = points[points.length - 1];
	if (!last || last.saving <= 0) return ['No finding saves anything yet.'];
	const out: string[] = [];
	for (const share of [0.5, 0.8]) {
		const p = points.find((q) => q.saving >= share * last.saving);
		if (!p) continue;
		const ofRepair =
			last.repair > 0
				? ` for ${moneyText(p.repair, currency)} of repairs (${Math.round((100 * p.repair) / last.repair)} % of the known repair cost)`
				: '';
		out.push(
			`The first ${p.rank.toLocaleString('en-US')} of ${count.toLocaleString('en-US')} findings give ${Math.round(share * 100)} % of the saving (${moneyText(p.saving, currency)} a year)${ofRepair}.`
		);
	}
	out.push(
		`All ${count.toLocaleString('en-US')} findings: ${moneyText(last.saving, currency)} a year for ${moneyText(last.repair, currency)} of known repair costs.`
	);
	return out;
}

/** Horizontal bars of the annual saving per group, with the figures as text on each row. */
export function breakdownBars(
	doc: Doc,
	title: string,
	groups: readonly SavingsGroup[],
	currency: string,
	most = 10
) {
	const shown = groups.slice(0, most);
	const rest = groups.slice(most);
	const rows = rest.length
		? [
				...shown,
				{
					key: 'rest',
					label: `${rest.length} more`,
					count: rest.reduce((s, g) => s + g.count, 0),
					costMinor: rest.reduce((s, g) => s + g.costMinor, 0),
					repairCostMinor: rest.reduce((s, g) => s + g.repairCostMinor, 0),
					co2KgYear: rest.reduce((s, g) => s + g.co2KgYear, 0)
				}
			]
		: shown;
	const rowH = 17;
	keep(doc, 30 + rowH * rows.length);
	doc
		.font(FONT.bold)
		.fontSize(10)
		.fillColor(COLOUR.ink)
		.text(title, PAGE.margin, doc.y, { width: CONTENT_WIDTH });
	doc.moveDown(0.3);
	const labelW = 130;
	const valueW = 160;
	const barLeft = PAGE.margin + labelW + 6;
	const barW = CONTENT_WIDTH - labelW - valueW - 12;
	const max = Math.max(1, ...rows.map((g) => g.costMinor));
	for (const g of rows) {
		const y = doc.y;
		doc.font(FONT.regular).fontSize(8.5).fillColor(COLOUR.ink);
		oneLine(doc, g.label, PAGE.margin, y + 3, labelW);
		doc.rect(barLeft, y + 2, barW, rowH - 6).fill(COLOUR.band);
		doc
			.rect(barLeft, y + 2, Math.max(0.5, (g.costMinor / max) * barW), rowH - 6)
			.fill(g.key === 'rest' ? COLOUR.line : COLOUR.wisp);
		doc.font(FONT.regular).fontSize(8.5).fillColor(COLOUR.ink);
		doc.text(
			`${moneyText(g.costMinor, currency)}/yr · ${g.count.toLocaleString('en-US')} ${g.count === 1 ? 'finding' : 'findings'}`,
			barLeft + barW + 6,
			y + 3,
			{
				width: valueW,
				align: 'right',
				lineBreak: false
			}
		);
		doc.y = y + rowH;
	}
	doc.x = PAGE.margin;
	doc.moveDown(0.6);
}
