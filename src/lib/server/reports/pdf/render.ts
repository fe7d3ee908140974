/**
 * The PDF report, drawn from a report's content (content.ts) and its data functions — the
 * renderer makes no query of its own. Sections in order: cover, summary (totals, Pareto curve,
 * breakdown by kind and area, each with its numbers in text), the ranked table, a page per
 * measure (its costs, saving, payback and findings), a page per finding, then safety and the
 * limits of the figures.
 */
import type { PassThrough } from 'node:stream';
import { moneyText } from '../../../components/savings/money';
import { paybackShort } from '../../../figures';
import { STANDING_CAUTIONS, STANDING_CAUTION_TITLE } from '../../../safety';
import { choiceWords } from '../../publish/choose';
import type { ReportContent } from '../content';
import type { FindingSection } from '../finding-sections';
import type { ReportRow } from '../rows';
import { pace } from '../streams';
import { summaryLines } from '../summary';
import { breakdownBars, paretoChart, paretoWords, type ParetoPoint } from './charts';
import { findingPage } from './finding-page';
import { measurePage } from './measure-page';
import {
	COLOUR,
	CONTENT_WIDTH,
	FONT,
	PAGE,
	heading,
	keep,
	newDocument,
	notice,
	pairs,
	paragraph,
	subheading,
	type Doc
} from './frame';
import { rankedTable } from './table';

export interface ReportSources {
	/** The ranked rows, in rank order (for the table), at most `tableRows`. */
	rows: () => AsyncIterable<ReportRow>;
	/** The Pareto curve's points, in rank order (at most a few hundred). */
	pareto: () => AsyncIterable<ParetoPoint>;
	/** The finding pages, in rank order. */
	findings: () => AsyncIterable<FindingSection>;
	/** A measure's saving findings, in rank order. */
	measureRows: (measureId: string) => AsyncIterable<ReportRow>;
	/** How many rows `rows` gives at most, and finding pages `findings`. */
	tableRows: number;
	findingPages: number;
}

const dateText = (d: Date) =>
	new Intl.DateTimeFormat('en-GB', {
		day: 'numeric',
		month: 'long',
		year: 'numeric',
		timeZone: 'UTC'
	}).format(d);
const isoDate = (s: string) => dateText(new Date(`${s}T00:00:00Z`));

function figuresLine(c: ReportContent) {
	if (c.revision) return `Revision ${c.revision.number}`;
	return c.choice.kind === 'live' && c.choice.marker.state !== 'published'
		? 'Draft'
		: 'As published';
}

function cover(doc: Doc, c: ReportContent) {
	doc.addPage();
	const s = c.survey;
	doc.rect(0, 0, PAGE.width, 250).fill(COLOUR.wisp);
	doc.rect(0, 250, PAGE.width, 6).fill(COLOUR.copper);
	doc
		.font(FONT.bold)
		.fontSize(11)
		.fillColor('#cfe3e6')
		.text('STEAM SYSTEM SURVEY', PAGE.margin, 70, { characterSpacing: 2 });
	doc
		.font(FONT.bold)
		.fontSize(28)
		.fillColor('#ffffff')
		.text(s.name, PAGE.margin, 96, { width: CONTENT_WIDTH });
	doc
		.font(FONT.regular)
		.fontSize(14)
		.fillColor('#e3eef0')
		.text(`${s.site} · ${s.client}`, { width: CONTENT_WIDTH });
	doc.y = 290;
	const draft = c.choice.kind === 'live' && c.choice.marker.state !== 'published';
	if (draft) {
		notice(
			doc,
			choiceWords(c.choice),
			[
				'This report shows the figures as they stand in the consultant’s workspace today. They are not the figures published to the client.'
			],
			{ rule: COLOUR.loss, band: '#fbeaea', title: COLOUR.loss }
		);
	}
	const period = s.startsOn
		? s.endsOn && s.endsOn !== s.startsOn
			? `${isoDate(s.startsOn)} – ${isoDate(s.endsOn)}`
			: isoDate(s.startsOn)
		: '—';
	pairs(
		doc,
		[
			{ label: 'Client', value: s.client },
			{ label: 'Site', value: s.site },
			{ label: 'Prepared by', value: s.firm },
			{ label: 'Survey period', value: period },
			{ label: 'Figures', value: choiceWords(c.choice) },
			...(c.revision ? [{ label: 'Published', value: dateText(c.revision.publishedAt) }] : []),
			...(c.revision?.note
				? [{ label: 'What changed in this revision', value: c.revision.note }]
				: []),
			{
				label: 'Units',
				value: `${s.unitSystem === 'US' ? 'US customary' : 'SI'}; money in ${c.currency}`
			},
			{
				label: 'Report made',
				value: `${dateText(c.generatedAt)}, ${c.generatedAt.toISOString().slice(11, 16)} UTC`
			}
		],
		150
	);
	doc.moveDown(1);
	const t = c.totals;
	const tiles = [
		{ label: `Annual saving (${c.currency}/yr)`, value: moneyText(t.costMinor, c.currency) },
		t.extraCostMinor > 0
			? {
					label: `Investment: repairs and measures (${c.currency})`,
					value: moneyText(t.investmentMinor, c.currency)
				}
			: {
					label: `Known repair cost (${c.currency})`,
					value: moneyText(t.repairCostMinor, c.currency)
				},
		{
			label: 'Simple payback',
			value: paybackShort(t.paybackYears)
		},
		{ label: 'Findings that save', value: t.count.toLocaleString('en-US') }
	];
	const gap = 8;
	const w = (CONTENT_WIDTH - gap * 3) / 4;
	const top = doc.y;
	tiles.forEach((tile, i) => {
		const x = PAGE.margin + i * (w + gap);
		doc.rect(x, top, w, 62).fill(COLOUR.band);
		doc.rect(x, top, w, 3).fill(COLOUR.copper);
		doc
			.font(FONT.regular)
			.fontSize(8)
			.fillColor(COLOUR.muted)
			.text(tile.label, x + 8, top + 10, { width: w - 16 });
		doc
			.font(FONT.bold)
			.fontSize(15)
			.fillColor(COLOUR.ink)
			.text(tile.value, x + 8, top + 34, { width: w - 16, lineBreak: false });
	});
	doc.y = top + 80;
	doc.x = PAGE.margin;
	paragraph(
		doc,
		'Figures are engineering estimates, not guarantees. Local codes and licensed practice come first; see “Safety and the limits of these figures” at the end of this report.',
		{ size: 8.5, colour: COLOUR.muted }
	);
}

async function summary(doc: Doc, c: ReportContent, src: ReportSources) {
	doc.addPage();
	heading(doc, 'Summary');
	paragraph(
		doc,
		`What the ${c.totals.count.toLocaleString('en-US')} findings that save money are worth each year once repaired, on the site’s cost basis. Only findings whose figures are current on that basis are counted.`,
		{ size: 9.5, colour: COLOUR.muted }
	);
	pairs(
		doc,
		summaryLines(c).map((l) => ({ label: l.label, value: l.text })),
		230
	);
	doc.moveDown(0.6);
	subheading(doc, 'Saving against repair cost, findings in rank order');
	const points: ParetoPoint[] = [];
	for await (const p of src.pareto()) points.push(p);
	paretoChart(doc, points, c.currency);
	for (const line of paretoWords(points, c.totals.count, c.currency))
		paragraph(doc, line, { size: 9 });
	doc.addPage();
	heading(doc, 'Where the saving is');
	breakdownBars(
		doc,
		`By kind of finding: annual saving (${c.currency}/yr) and findings`,
		c.breakdown.kind,
		c.currency
	);
	breakdownBars(
		doc,
		`By area: annual saving (${c.currency}/yr) and findings`,
		c.breakdown.area,
		c.currency
	);
}

function safety(doc: Doc) {
	doc.addPage();
	heading(doc, 'Safety and the limits of these figures');
	notice(doc, STANDING_CAUTION_TITLE, [...STANDING_CAUTIONS]);
	subheading(doc, 'What the figures are');
	for (const line of [
		'Steam losses are engineering estimates worked out from what was seen and measured on the walk: steam properties from IAPWS-IF97, flow through an orifice for traps and leaks, convection and radiation for bare surfaces. Each finding’s page lists its assumptions and their sources.',
		'A leak’s size class and a trap’s condition are judged on site; real losses vary with load, hours and pressure. Savings are per year at the site’s stated operating hours, fuel price and boiler efficiency.',
		'Repair costs are those entered by the consultant; a finding without one is counted as saving but left out of the repair total and the payback.',
		'Nothing here is a guarantee of savings, or a design for a repair. Repairs to pressure systems are for competent people under the site’s permit-to-work and the codes that apply locally.'
	])
		paragraph(doc, line, { size: 9.5 });
}

/** Writes the report into `out` and ends it. */
export async function renderReportPdf(
	c: ReportContent,
	src: ReportSources,
	out: PassThrough
): Promise<void> {
	const s = c.survey;
	const doc = newDocument({
		footer: `${s.name} · ${s.site} · ${figuresLine(c)} · ${s.firm}`,
		title: `${s.name}: steam system survey report`,
		author: s.firm,
		subject: `${s.site}, ${s.client}`
	});
	const done = new Promise<void>((resolve, reject) => {
		out.on('finish', resolve);
		out.on('error', reject);
		doc.on('error', reject);
	});
	doc.pipe(out);
	cover(doc, c);
	await summary(doc, c, src);
	doc.moveDown(1);
	keep(doc, 140);
	heading(doc, 'Findings ranked by annual saving');
	if (c.totals.count > src.tableRows) {
		paragraph(
			doc,
			`The ${src.tableRows.toLocaleString('en-US')} findings that save most are listed; the totals count all ${c.totals.count.toLocaleString('en-US')}. The findings export (XLSX or CSV) lists every one.`,
			{ size: 9, colour: COLOUR.muted }
		);
	}
	await rankedTable(doc, src.rows(), s.unitSystem, c.currency, c.totals, () => pace(out));
	if (c.totals.count > 0) {
		paragraph(
			doc,
			c.totals.count > src.findingPages
				? `The ${src.findingPages.toLocaleString('en-US')} findings that save most follow, a page each, in rank order: what was found, its figures, photos, how the figures are worked out, and the assumptions with their sources.`
				: 'Each finding follows on a page of its own, in rank order: what was found, its figures, photos, how the figures are worked out, and the assumptions with their sources.',
			{ size: 9, colour: COLOUR.muted }
		);
	}
	if (c.measures.length > 0) {
		paragraph(
			doc,
			`${c.measures.length === 1 ? 'One measure follows' : `${c.measures.length} measures follow`}, a page each: jobs of several repairs done together, each costing its findings’ repairs and its own access, scaffold, shutdown and other costs.`,
			{ size: 9, colour: COLOUR.muted }
		);
	}
	for (const m of c.measures) {
		await pace(out);
		await measurePage(doc, m, src.measureRows(m.id), s.unitSystem, c.currency, () => pace(out));
	}
	for await (const section of src.findings()) {
		await pace(out);
		findingPage(doc, section, s.unitSystem, c.currency);
	}
	safety(doc);
	doc.end();
	await done;
}
