/**
 * Reads the messages the local SMTP fake keeps: header unfolding, RFC 2047 encoded words,
 * multipart bodies, quoted-printable and base64. Enough for what nodemailer writes (and most
 * else); not a general mail parser. Pure (no Node or framework imports), so the fake, the
 * Desk mailbox page and the tests share it.
 */
export interface ParsedMessage {
	headers: Map<string, string[]>;
	subject: string;
	from: string;
	to: string;
	text: string | null;
	html: string | null;
}

/** Parses a whole message given as a "binary" string (one char per byte, as latin1 reads it). */
export function parseMessage(raw: string): ParsedMessage {
	const part = parsePart(raw);
	// The line break ending a message (like the one before a boundary) is not body text.
	part.body = part.body.replace(/\r?\n$/, '');
	const header = (name: string) => decodeWords(part.headers.get(name)?.[0] ?? '');
	const bodies = { text: null as string | null, html: null as string | null };
	collectBodies(part, bodies);
	return {
		headers: part.headers,
		subject: header('subject'),
		from: header('from'),
		to: header('to'),
		...bodies
	};
}

/** Just the headers (cheap: stops at the blank line). */
export function parseHeaders(raw: string): Map<string, string[]> {
	return splitHead(raw).headers;
}

export function headerValue(headers: Map<string, string[]>, name: string): string {
	return decodeWords(headers.get(name.toLowerCase())?.[0] ?? '');
}

interface Part {
	headers: Map<string, string[]>;
	body: string;
}

function splitHead(raw: string): Part {
	const match = /\r?\n\r?\n/.exec(raw);
	const head = match ? raw.slice(0, match.index) : raw;
	const body = match ? raw.slice(match.index + match[0].length) : '';
	const headers = new Map<string, string[]>();
	// Unfold: a line starting with white space continues the previous header.
	for (const line of head.replace(/\r?\n[ \t]+/g, ' ').split(/\r?\n/)) {
		const colon = line.indexOf(':');
		if (colon <= 0) continue;
		const name = line.slice(0, colon).trim().toLowerCase();
		const list = headers.get(name) ?? [];
		list.push(line.slice(colon + 1).trim());
		headers.set(name, list);
	}
	return { headers, body };
}

const parsePart = splitHead;

interface ContentType {
	type: string;
	params: Record<string, string>;
}

function contentType(headers: Map<string, string[]>): ContentType {
	const value = headers.get('content-type')?.[0] ?? 'text/plain; charset=us-ascii';
	const [type, ...rest] = value.split(';');
	const params: Record<string, string> = {};
	for (const p of rest) {
		const eq = p.indexOf('=');
		if (eq < 0) continue;
		params[p.slice(0, eq).trim().toLowerCase()] = p
			.slice(eq + 1)
			.trim()
			.replace(/^"(.*)"$/, '$1');
	}
	return { type: type.trim().toLowerCase(), params };
}

function collectBodies(part: Part, into: { text: string | null; html: string | null }): void {
	const ct = contentType(part.headers);
	if (ct.type.startsWith('multipart/') && ct.params.boundary) {
		for (const child of splitMultipart(part.body, ct.params.boundary)) collectBodies(child, into);
		return;
	}
	const disposition = part.headers.get('content-disposition')?.[0] ?? '';
	if (/^attachment/i.test(disposition)) return;
	if (ct.type === 'text/plain' && into.text === null) into.text = decodeBody(part, ct);
	if (ct.type === 'text/html' && into.html === null) into.html = decodeBody(part, ct);
}

function splitMultipart(body: string, boundary: string): Part[] {
	const lines = body.split(/\r?\n/);
	const parts: Part[] = [];
	let current: string[] | null = null;
	for (const line of lines) {
		if (line === `--${boundary}--`) break;
		if (line === `--${boundary}`) {
			if (current) parts.push(parsePart(current.join('\r\n')));
			current = [];
		} else if (current) {
			current.push(line);
		}
	}
	if (current) parts.push(parsePart(current.join('\r\n')));
	return parts;
}

function decodeBody(part: Part, ct: ContentType): string {
	const encoding = (part.headers.get('content-transfer-encoding')?.[0] ?? '7bit').toLowerCase();
	let bytes: Uint8Array;
	if (encoding === 'base64') bytes = base64Bytes(part.body);
	else if (encoding === 'quoted-printable') bytes = qpBytes(part.body);
	else bytes = binaryBytes(part.body);
	return decodeText(bytes, ct.params.charset).replace(/\r\n/g, '\n');
}

function binaryBytes(s: string): Uint8Array {
	const out = new Uint8Array(s.length);
	for (let i = 0; i < s.length; i++) out[i] = s.charCodeAt(i) & 0xff;
	return out;
}

function base64Bytes(s: string): Uint8Array {
	return binaryBytes(atob(s.replace(/[^A-Za-z0-9+/=]/g, '')));
}

/** Quoted-printable (RFC 2045 §6.7); `underscores` is the Q encoding of headers (RFC 2047). */
function qpBytes(s: string, underscores = false): Uint8Array {
	const text = s.replace(/=\r?\n/g, '');
	const out: number[] = [];
	for (let i = 0; i < text.length; i++) {
		const c = text[i];
		const hex = text.slice(i + 1, i + 3);
		if (c === '=' && /^[0-9A-Fa-f]{2}$/.test(hex)) {
			out.push(parseInt(hex, 16));
			i += 2;
		} else if (underscores && c === '_') {
			out.push(0x20);
		} else {
			out.push(text.charCodeAt(i) & 0xff);
		}
	}
	return Uint8Array.from(out);
}

function decodeText(bytes: Uint8Array, charset = 'utf-8'): string {
	try {
		return new TextDecoder(charset.toLowerCase()).decode(bytes);
	} catch {
		return new TextDecoder('utf-8').decode(bytes);
	}
}

/** RFC 2047 encoded words; white space between two encoded words is dropped. */
export function decodeWords(value: string): string {
	// A header sent as raw UTF-8 (SMTPUTF8) arrives here as one char per byte.
	const raw = /[\u0080-\u00ff]/.test(value) ? utf8OrSame(value) : value;
	const joined = raw.replace(/(=\?[^?\s]+\?[BbQq]\?[^?\s]*\?=)\s+(?==\?)/g, '$1');
	return joined.replace(
		/=\?([^?\s]+)\?([BbQq])\?([^?\s]*)\?=/g,
		(_, charset: string, kind: string, text: string) =>
			decodeText(kind.toUpperCase() === 'B' ? base64Bytes(text) : qpBytes(text, true), charset)
	);
}

function utf8OrSame(s: string): string {
	try {
		return new TextDecoder('utf-8', { fatal: true }).decode(binaryBytes(s));
	} catch {
		return s;
	}
}
