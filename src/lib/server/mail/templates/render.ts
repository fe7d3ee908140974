/**
 * One message, two bodies: the plain-text and the HTML part are rendered from the same content,
 * so they always say the same thing. The HTML is deliberately plain (inline styles, one column,
 * no images, no tracking): it has to read well in any mail client, including text-only ones.
 */
export interface MessageContent {
	subject: string;
	greeting: string;
	paragraphs: string[];
	/** The one thing to do, as a button in HTML and a bare URL in text. */
	action?: { label: string; url: string };
	/** Lines after the action (expiry, what to do if this was not you). */
	after?: string[];
}

export interface RenderedMessage {
	subject: string;
	text: string;
	html: string;
}

const signature = 'Steamwisp — steam-system energy audits';

export function escapeHtml(s: string): string {
	return s
		.replaceAll('&', '&amp;')
		.replaceAll('<', '&lt;')
		.replaceAll('>', '&gt;')
		.replaceAll('"', '&quot;')
		.replaceAll("'", '&#39;');
}

export function render(content: MessageContent): RenderedMessage {
	return { subject: content.subject, text: toText(content), html: toHtml(content) };
}

function toText(c: MessageContent): string {
	const blocks = [c.greeting, ...c.paragraphs];
	if (c.action) blocks.push(`${c.action.label}:\n${c.action.url}`);
	blocks.push(...(c.after ?? []), `-- \n${signature}`);
	return blocks.join('\n\n') + '\n';
}

const p = 'margin:0 0 16px;font-size:16px;line-height:1.5;color:#111a1c';

function toHtml(c: MessageContent): string {
	const para = (s: string) => `<p style="${p}">${escapeHtml(s)}</p>`;
	const action = c.action
		? `<p style="margin:24px 0"><a href="${escapeHtml(c.action.url)}" style="display:inline-block;padding:14px 22px;border-radius:12px;background:#a04816;color:#ffffff;font-weight:bold;text-decoration:none">${escapeHtml(c.action.label)}</a></p>` +
			`<p style="${p};font-size:14px;color:#3f4b4e">If the button does not work, copy this address into your browser:<br>${escapeHtml(c.action.url)}</p>`
		: '';
	return [
		'<!doctype html>',
		'<html lang="en"><head><meta charset="utf-8">',
		`<title>${escapeHtml(c.subject)}</title></head>`,
		'<body style="margin:0;padding:24px;background:#f6f4ef;font-family:Arial,Helvetica,sans-serif">',
		'<div style="max-width:560px;margin:0 auto;padding:24px;background:#ffffff;border:2px solid #8a9597;border-radius:14px">',
		`<p style="margin:0 0 20px;font-size:20px;font-weight:bold;color:#1d4a52">Steamwisp</p>`,
		para(c.greeting),
		...c.paragraphs.map(para),
		action,
		...(c.after ?? []).map(para),
		`<p style="margin:24px 0 0;font-size:13px;color:#3f4b4e">${escapeHtml(signature)}</p>`,
		'</div></body></html>'
	].join('\n');
}
