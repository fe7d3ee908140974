/**
 * The PDF's frame: an A4 pdfkit document set in the app's own Atkinson Hyperlegible (the WOFF
 * files of @fontsource/atkinson-hyperlegible, Latin subset — fontkit reads WOFF, not WOFF2),
 * the theme's colours, a running footer and page number on every page, and the small drawing
 * helpers every section shares. Pages are written out as they are finished (no page buffer),
 * so the body streams; the footer is drawn when a page is added.
 */
import { createRequire } from 'node:module';
import PDFDocument from 'pdfkit';

const require = createRequire(import.meta.url);
const fontFile = (weight: 400 | 700, style: 'normal' | 'italic') =>
	require.resolve(
		`@fontsource/atkinson-hyperlegible/files/atkinson-hyperlegible-latin-${weight}-${style}.woff`
	);

/** The light theme's tokens (src/app.css), as PDF colours. */
export const COLOUR = {
	ink: '#111a1c',
	muted: '#3f4b4e',
	line: '#8a9597',
	rule: '#d5dadb',
	band: '#eef1f1',
	canvas: '#f6f4ef',
	wisp: '#1d4a52',
	copper: '#a04816',
	saving: '#1f6b3a',
	loss: '#9b1c1c',
	caution: '#7a4e00',
	cautionBand: '#fbf3e0'
} as const;

export const FONT = { regular: 'body', bold: 'body-bold', italic: 'body-italic' } as const;

export type Doc = PDFKit.PDFDocument;

export const PAGE = { width: 595.28, height: 841.89, margin: 56, footer: 30 } as const;
export const CONTENT_WIDTH = PAGE.width - 2 * PAGE.margin;

export interface FrameText {
	/** Left of the footer: the survey and the figures ("… · Revision 2"). */
	footer: string;
	title: string;
	author: string;
	subject: string;
}

/** A new document with fonts, metadata and the running footer. */
export function newDocument(frame: FrameText): Doc {
	const doc = new PDFDocument({
		size: 'A4',
		margins: {
			top: PAGE.margin,
			bottom: PAGE.margin + PAGE.footer,
			left: PAGE.margin,
			right: PAGE.margin
		},
		info: {
			Title: frame.title,
			Author: frame.author,
			Subject: frame.subject,
			Creator: 'Steamwisp'
		},
		displayTitle: true,
		lang: 'en',
		autoFirstPage: false
	});
	doc.registerFont(FONT.regular, fontFile(400, 'normal'));
	doc.registerFont(FONT.bold, fontFile(700, 'normal'));
	doc.registerFont(FONT.italic, fontFile(400, 'italic'));
	let page = 0;
	doc.on('pageAdded', () => {
		page += 1;
		footer(doc, frame.footer, page);
	});
	return doc;
}

function footer(doc: Doc, left: string, page: number) {
	const { x, y } = doc;
	const bottom = doc.page.margins.bottom;
	doc.page.margins.bottom = 0;
	const top = PAGE.height - PAGE.margin - 8;
	doc
		.moveTo(PAGE.margin, top - 6)
		.lineTo(PAGE.width - PAGE.margin, top - 6)
		.lineWidth(0.5)
		.strokeColor(COLOUR.rule)
		.stroke();
	doc.font(FONT.regular).fontSize(8).fillColor(COLOUR.muted);
	oneLine(doc, left, PAGE.margin, top, CONTENT_WIDTH - 80);
	doc.text(`Page ${page}`, PAGE.width - PAGE.margin - 70, top, {
		width: 70,
		align: 'right',
		lineBreak: false
	});
	doc.page.margins.bottom = bottom;
	doc.x = x;
	doc.y = y;
	doc.fillColor(COLOUR.ink);
}

/** Space left on the page below the cursor, points. */
export const spaceLeft = (doc: Doc) => doc.page.height - doc.page.margins.bottom - doc.y;

/** A new page unless `height` points still fit below the cursor. */
export function keep(doc: Doc, height: number) {
	if (spaceLeft(doc) < height) doc.addPage();
}

/** A section heading: a copper rule and the title. */
export function heading(doc: Doc, text: string, size = 18) {
	keep(doc, size * 3);
	doc.x = PAGE.margin;
	doc.font(FONT.bold).fontSize(size).fillColor(COLOUR.wisp).text(text, { width: CONTENT_WIDTH });
	const y = doc.y + 2;
	doc
		.moveTo(PAGE.margin, y)
		.lineTo(PAGE.margin + 48, y)
		.lineWidth(2)
		.strokeColor(COLOUR.copper)
		.stroke();
	doc.y = y + 10;
	doc.fillColor(COLOUR.ink);
}

export function subheading(doc: Doc, text: string) {
	keep(doc, 40);
	doc.x = PAGE.margin;
	doc.moveDown(0.4);
	doc.font(FONT.bold).fontSize(11.5).fillColor(COLOUR.wisp).text(text, { width: CONTENT_WIDTH });
	doc.moveDown(0.2);
	doc.fillColor(COLOUR.ink);
}

export function paragraph(
	doc: Doc,
	text: string,
	opts: { size?: number; colour?: string; font?: string } = {}
) {
	doc.x = PAGE.margin;
	doc
		.font(opts.font ?? FONT.regular)
		.fontSize(opts.size ?? 10)
		.fillColor(opts.colour ?? COLOUR.ink)
		.text(text, { width: CONTENT_WIDTH, lineGap: 2 });
	doc.moveDown(0.4);
	doc.fillColor(COLOUR.ink);
}

/** Label/value pairs in two columns, ruled lightly. */
export function pairs(
	doc: Doc,
	rows: readonly { label: string; value: string }[],
	labelWidth = 200,
	size = 9.5
) {
	const valueWidth = CONTENT_WIDTH - labelWidth - 8;
	const pad = size < 9 ? 2 : 3;
	for (const r of rows) {
		doc.font(FONT.regular).fontSize(size);
		const h = Math.max(
			doc.heightOfString(r.label, { width: labelWidth }),
			doc.heightOfString(r.value, { width: valueWidth })
		);
		keep(doc, h + 2 * pad);
		const y = doc.y;
		doc.fillColor(COLOUR.muted).text(r.label, PAGE.margin, y, { width: labelWidth });
		doc
			.font(FONT.bold)
			.fillColor(COLOUR.ink)
			.text(r.value, PAGE.margin + labelWidth + 8, y, { width: valueWidth });
		const bottom = y + h + pad;
		doc
			.moveTo(PAGE.margin, bottom)
			.lineTo(PAGE.width - PAGE.margin, bottom)
			.lineWidth(0.4)
			.strokeColor(COLOUR.rule)
			.stroke();
		doc.y = bottom + pad;
	}
	doc.x = PAGE.margin;
	doc.font(FONT.regular);
}

/** A boxed note (cautions, the draft marker): a coloured rule on the left and a light band. */
export function notice(
	doc: Doc,
	title: string,
	lines: readonly string[],
	tone: { rule: string; band: string; title: string } = {
		rule: COLOUR.caution,
		band: COLOUR.cautionBand,
		title: COLOUR.caution
	}
) {
	const width = CONTENT_WIDTH - 24;
	doc.font(FONT.regular).fontSize(9.5);
	const body = lines.map((l) => `•  ${l}`).join('\n');
	const h =
		16 +
		doc.heightOfString(title, { width }) +
		(lines.length ? doc.heightOfString(body, { width, lineGap: 2 }) + 6 : 0) +
		4;
	keep(doc, h + 8);
	const top = doc.y;
	doc.rect(PAGE.margin, top, CONTENT_WIDTH, h).fill(tone.band);
	doc.rect(PAGE.margin, top, 4, h).fill(tone.rule);
	doc
		.font(FONT.bold)
		.fontSize(10.5)
		.fillColor(tone.title)
		.text(title, PAGE.margin + 14, top + 8, { width });
	if (lines.length) {
		doc.moveDown(0.3);
		doc
			.font(FONT.regular)
			.fontSize(9.5)
			.fillColor(COLOUR.ink)
			.text(body, PAGE.margin + 14, doc.y, { width, lineGap: 2 });
	}
	doc.x = PAGE.margin;
	doc.y = top + h + 10;
	doc.fillColor(COLOUR.ink);
}

/** `text` cut with "…" to fit `width` at the current font and size. */
export function fitText(doc: Doc, text: string, width: number): string {
	if (doc.widthOfString(text) <= width) return text;
	let lo = 0;
	let hi = text.length;
	while (lo < hi) {
		const mid = Math.ceil((lo + hi) / 2);
		if (doc.widthOfString(`${text.slice(0, mid).trimEnd()}…`) <= width) lo = mid;
		else hi = mid - 1;
	}
	return `${text.slice(0, lo).trimEnd()}…`;
}

/** One line of text at (x, y), never wrapped: cut with "…" when it does not fit. */
export function oneLine(
	doc: Doc,
	text: string,
	x: number,
	y: number,
	width: number,
	align: 'left' | 'right' | 'center' = 'left'
) {
	doc.text(fitText(doc, text, width), x, y, { width, align, lineBreak: false });
}
