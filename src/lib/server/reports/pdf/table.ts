/**
 * The ranked table: one line per finding in rank order, the column headers (with units in the
 * site's system and currency) repeated at the top of every page, a light band on every other
 * row, and the totals at the end.
 */
import { cellText, columnTitle, type FigureColumn, type Figures } from '../../../figures';
import type { UnitSystemId } from '../../../units';
import type { ReportRow } from '../rows';
import { COLOUR, CONTENT_WIDTH, FONT, PAGE, oneLine, spaceLeft, type Doc } from './frame';

interface Col {
	title: string;
	width: number;
	align: 'left' | 'right';
	text: (r: ReportRow) => string;
	/** A second, muted line under the first. */
	second?: (r: ReportRow) => string;
}

const FIGURE_COLUMNS: [FigureColumn, number][] = [
	['cost', 62],
	['repair', 58],
	['payback', 46],
	['co2', 54],
	['steam', 50]
];

function columns(system: UnitSystemId, currency: string): Col[] {
	const figures = FIGURE_COLUMNS.map(([c, width]): Col => ({
		title: columnTitle(c, system, currency),
		width,
		align: 'right',
		text: (r) => cellText(r, c, system)
	}));
	const fixed = 24 + 78 + figures.reduce((s, c) => s + c.width, 0);
	return [
		{ title: '#', width: 24, align: 'right', text: (r) => String(r.rank) },
		{
			title: 'Finding',
			width: CONTENT_WIDTH - fixed,
			align: 'left',
			text: (r) => [r.kindWords, r.conditionWords].filter(Boolean).join(' · '),
			second: (r) => [r.tag, r.location].filter(Boolean).join(' · ')
		},
		{ title: 'Area', width: 78, align: 'left', text: (r) => r.area ?? '—' },
		...figures
	];
}

const ROW_H = 22;
const PAD = 3;

function headerRow(doc: Doc, cols: Col[]) {
	doc.font(FONT.bold).fontSize(7.5);
	const h =
		Math.max(...cols.map((c) => doc.heightOfString(c.title, { width: c.width - 2 * PAD }))) + 8;
	const top = doc.y;
	doc.rect(PAGE.margin, top, CONTENT_WIDTH, h).fill(COLOUR.wisp);
	let x = PAGE.margin;
	for (const c of cols) {
		doc
			.fillColor('#ffffff')
			.text(c.title, x + PAD, top + 4, { width: c.width - 2 * PAD, align: c.align });
		x += c.width;
	}
	doc.y = top + h;
}

function line(
	doc: Doc,
	cols: Col[],
	row: ReportRow | null,
	cells: string[],
	band: boolean,
	bold = false
) {
	const top = doc.y;
	if (band) doc.rect(PAGE.margin, top, CONTENT_WIDTH, ROW_H).fill(COLOUR.band);
	let x = PAGE.margin;
	cols.forEach((c, i) => {
		doc
			.font(bold ? FONT.bold : FONT.regular)
			.fontSize(7.5)
			.fillColor(COLOUR.ink);
		const second = row && c.second ? c.second(row) : '';
		oneLine(doc, cells[i], x + PAD, top + (second ? 3.5 : 7.5), c.width - 2 * PAD, c.align);
		if (second) {
			doc.fontSize(7).fillColor(COLOUR.muted);
			oneLine(doc, second, x + PAD, top + 12.5, c.width - 2 * PAD, c.align);
		}
		x += c.width;
	});
	doc.fillColor(COLOUR.ink);
	doc.y = top + ROW_H;
}

/**
 * Draws the rows as they come; returns how many were drawn. `totals` closes the table (none
 * for a measure's findings: the measure's own figures stand above them).
 */
export async function rankedTable(
	doc: Doc,
	rows: AsyncIterable<ReportRow>,
	system: UnitSystemId,
	currency: string,
	totals: Figures | null,
	/** Awaited every page: the download's pace. */
	paced: () => Promise<void>
): Promise<number> {
	const cols = columns(system, currency);
	headerRow(doc, cols);
	let n = 0;
	for await (const r of rows) {
		if (spaceLeft(doc) < ROW_H) {
			await paced();
			doc.addPage();
			headerRow(doc, cols);
		}
		line(
			doc,
			cols,
			r,
			cols.map((c) => c.text(r)),
			n % 2 === 1
		);
		n += 1;
	}
	if (spaceLeft(doc) < ROW_H * 2) {
		doc.addPage();
		headerRow(doc, cols);
	}
	doc
		.moveTo(PAGE.margin, doc.y)
		.lineTo(PAGE.margin + CONTENT_WIDTH, doc.y)
		.lineWidth(1)
		.strokeColor(COLOUR.ink)
		.stroke();
	if (totals) totalLine(doc, cols, totals, system);
	doc.x = PAGE.margin;
	doc.moveDown(0.5);
	return n;
}

function totalLine(doc: Doc, cols: Col[], totals: Figures, system: UnitSystemId) {
	const totalCells = cols.map((c, i) => {
		if (i === 1) return 'Total';
		const figure = FIGURE_COLUMNS[i - 3];
		return figure
			? cellText({ ...totals, paybackYears: totals.paybackYears ?? null }, figure[0], system)
			: '';
	});
	line(doc, cols, null, totalCells, false, true);
}
