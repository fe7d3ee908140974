/**
 * One finding's page: what and where, its figures as reported, its photos scaled to fit with
 * their captions, the notes from the walk, the calculation step by step, the assumptions with
 * their sources, and the cautions for this kind of work.
 */
import { cellText, columnTitle, type FigureColumn } from '../../../figures';
import type { UnitSystemId } from '../../../units';
import type { FindingSection } from '../finding-sections';
import {
	COLOUR,
	CONTENT_WIDTH,
	FONT,
	PAGE,
	heading,
	keep,
	notice,
	oneLine,
	pairs,
	paragraph,
	subheading,
	type Doc
} from './frame';

const FIGURES: FigureColumn[] = [
	'cost',
	'repair',
	'payback',
	'steam',
	'heat',
	'energy',
	'co2',
	'water'
];

/** The figures as a grid of tiles, four to a row. */
function figureTiles(doc: Doc, s: FindingSection, system: UnitSystemId, currency: string) {
	const per = 4;
	const gap = 6;
	const w = (CONTENT_WIDTH - gap * (per - 1)) / per;
	const h = 40;
	keep(doc, 2 * (h + gap));
	const top = doc.y;
	FIGURES.forEach((c, i) => {
		const x = PAGE.margin + (i % per) * (w + gap);
		const y = top + Math.floor(i / per) * (h + gap);
		doc.rect(x, y, w, h).fill(COLOUR.band);
		doc.font(FONT.regular).fontSize(7.5).fillColor(COLOUR.muted);
		oneLine(doc, columnTitle(c, system, currency), x + 6, y + 6, w - 12);
		doc
			.font(FONT.bold)
			.fontSize(12)
			.fillColor(c === 'cost' ? COLOUR.saving : COLOUR.ink);
		oneLine(doc, cellText(s.row, c, system), x + 6, y + 20, w - 12);
	});
	doc.y = top + 2 * (h + gap) + 4;
	doc.x = PAGE.margin;
	doc.fillColor(COLOUR.ink);
}

function photos(doc: Doc, s: FindingSection) {
	if (s.photos.length === 0) return;
	subheading(doc, 'Photos');
	const per = s.photos.length === 1 ? 1 : 2;
	const gap = 10;
	const w = (CONTENT_WIDTH - gap * (per - 1)) / per;
	const h = per === 1 ? 190 : 140;
	for (let i = 0; i < s.photos.length; i += per) {
		keep(doc, h + 28);
		const top = doc.y;
		s.photos.slice(i, i + per).forEach((p, j) => {
			const x = PAGE.margin + j * (w + gap);
			if (p.bytes) {
				try {
					doc.image(p.bytes, x, top, { fit: [w, h], align: 'center', valign: 'center' });
					doc.rect(x, top, w, h).lineWidth(0.4).strokeColor(COLOUR.rule).stroke();
				} catch {
					p = { ...p, bytes: null, missing: 'could not be read' };
				}
			}
			if (!p.bytes) {
				doc.rect(x, top, w, h).fill(COLOUR.band);
				doc
					.font(FONT.italic)
					.fontSize(8.5)
					.fillColor(COLOUR.muted)
					.text(`Photo ${p.number} ${p.missing ?? ''}`.trim(), x + 10, top + h / 2 - 6, {
						width: w - 20,
						align: 'center'
					});
			}
			const caption = [
				`Photo ${p.number}`,
				p.caption,
				p.takenAt ? `taken ${p.takenAt.slice(0, 10)}` : null
			]
				.filter(Boolean)
				.join(' · ');
			doc.font(FONT.regular).fontSize(8).fillColor(COLOUR.muted);
			oneLine(doc, caption, x, top + h + 4, w);
		});
		doc.x = PAGE.margin;
		doc.y = top + h + 20;
	}
	if (s.morePhotos > 0)
		paragraph(
			doc,
			`${s.morePhotos} more photo${s.morePhotos === 1 ? '' : 's'} of this finding in Steamwisp.`,
			{ size: 8.5, colour: COLOUR.muted }
		);
}

export function findingPage(doc: Doc, s: FindingSection, system: UnitSystemId, currency: string) {
	doc.addPage();
	const r = s.row;
	heading(
		doc,
		`${r.rank}. ${[r.kindWords, r.conditionWords].filter(Boolean).join(', ')}${r.tag ? ` — ${r.tag}` : ''}`,
		15
	);
	paragraph(
		doc,
		[
			r.location || null,
			r.area ? `Area: ${r.area}` : null,
			r.header ? `Header: ${r.header}` : null,
			`Status: ${r.statusWords}`
		]
			.filter(Boolean)
			.join('   ·   '),
		{ size: 9, colour: COLOUR.muted }
	);
	if (s.corrected) {
		notice(
			doc,
			'Evidence corrected after this revision',
			[
				'The consultant has corrected this finding since this revision was published. The figures below are as published; the corrected figures will appear in the next revision.'
			],
			{ rule: COLOUR.copper, band: COLOUR.canvas, title: COLOUR.copper }
		);
	}
	notice(
		doc,
		'Caution: live steam, pressure and hot surfaces',
		s.cautions.length > 0
			? s.cautions.map((c) => c.text)
			: ['Defer to local codes, the site’s rules and licensed practice.']
	);
	figureTiles(doc, s, system, currency);
	photos(doc, s);
	if (s.notes.trim()) {
		subheading(doc, 'Notes from the walk');
		paragraph(doc, s.notes.trim(), { size: 9.5 });
	}
	const calc = s.calculation;
	if (calc) {
		subheading(doc, 'How the figures are worked out');
		for (const step of calc.steps) {
			keep(doc, 50);
			doc
				.font(FONT.bold)
				.fontSize(9.5)
				.fillColor(COLOUR.ink)
				.text(step.title, PAGE.margin, doc.y, { width: CONTENT_WIDTH });
			doc
				.font(FONT.italic)
				.fontSize(8.5)
				.fillColor(COLOUR.muted)
				.text(step.explain, { width: CONTENT_WIDTH, lineGap: 1 });
			doc.moveDown(0.2);
			pairs(doc, step.lines, 220, 8.5);
			doc.moveDown(0.3);
		}
		if (calc.problem) paragraph(doc, calc.problem, { size: 9, colour: COLOUR.muted });
		if (calc.assumptions.length > 0) {
			subheading(doc, 'Assumptions and sources');
			for (const a of calc.assumptions) {
				doc.font(FONT.regular).fontSize(8);
				const text = `${a.label}: ${a.value}`;
				keep(doc, doc.heightOfString(text, { width: CONTENT_WIDTH }) + 12);
				doc
					.fillColor(COLOUR.ink)
					.font(FONT.bold)
					.text(text, PAGE.margin, doc.y, { width: CONTENT_WIDTH });
				doc
					.font(FONT.regular)
					.fillColor(COLOUR.muted)
					.text(`Source: ${a.source}`, { width: CONTENT_WIDTH });
				doc.moveDown(0.15);
			}
		}
	} else if (s.problem) {
		paragraph(doc, `The calculation could not be shown: ${s.problem}`, {
			size: 9,
			colour: COLOUR.muted
		});
	}
}
