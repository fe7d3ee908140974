/**
 * The text of a PDF, page by page, read with pdfjs-dist (Mozilla's PDF.js, pure JavaScript;
 * its legacy build runs on Node 20), for tests that check what a report says.
 */
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';

export async function pdfPages(bytes: Uint8Array): Promise<string[]> {
	const doc = await getDocument({
		data: new Uint8Array(bytes),
		isEvalSupported: false,
		useSystemFonts: false,
		disableFontFace: true,
		verbosity: 0
	}).promise;
	const pages: string[] = [];
	for (let n = 1; n <= doc.numPages; n++) {
		const page = await doc.getPage(n);
		const content = await page.getTextContent();
		pages.push(
			content.items
				.map((item) => ('str' in item ? item.str + (item.hasEOL ? '\n' : ' ') : ''))
				.join('')
				.replace(/[ \t]+/g, ' ')
		);
	}
	await doc.destroy();
	return pages;
}
