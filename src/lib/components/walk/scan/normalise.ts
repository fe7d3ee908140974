/**
 * Turning what a code on a trap's tag carries into the tag the Walk looks up. Plants print
 * tags in many ways: the bare tag ("st-0412 "), the tag behind a web address of their own
 * maintenance system (`https://cmms.example/asset?tag=ST-0412`), or with the GS1 separator
 * characters some printers put into Code 128 and Data Matrix codes. Tags are compared in
 * capitals, as they are printed on the plate.
 */

/** The longest tag the capture schema accepts (`assetTagSchema`). */
export const TAG_MAX_LENGTH = 64;

/** Query parameters that carry the tag in a web address, tried in this order. */
const TAG_PARAMETERS = ['tag', 'assettag', 'asset_tag', 'asset-tag'];

// C0 and C1 control characters (GS1's group separator, NUL padding, stray line ends).
// eslint-disable-next-line no-control-regex
const CONTROL = /[\u0000-\u001f\u007f-\u009f]+/g;

/** A tag as typed or read: control characters dropped, spaces tidied, in capitals. */
export function normaliseTag(raw: string): string {
	return raw.replace(CONTROL, ' ').replace(/\s+/g, ' ').trim().toUpperCase();
}

export type TagReading = { ok: true; tag: string } | { ok: false; reason: string };

/** The tag a scanned code carries, or the reason in plain words why it carries none. */
export function readTag(raw: string): TagReading {
	const text = raw.replace(CONTROL, ' ').trim();
	let tag = text;
	if (/^[a-z][a-z0-9+.-]*:\/\//i.test(text)) {
		const fromAddress = tagFromAddress(text);
		if (fromAddress === null) {
			return { ok: false, reason: 'This code holds a web address with no tag in it.' };
		}
		tag = fromAddress;
	}
	tag = normaliseTag(tag);
	if (tag === '') return { ok: false, reason: 'This code is empty.' };
	if (tag.length > TAG_MAX_LENGTH) {
		return {
			ok: false,
			reason: `This code holds ${tag.length} characters; a tag is at most ${TAG_MAX_LENGTH}.`
		};
	}
	return { ok: true, tag };
}

/** The tag parameter of a web address (any letter case in its name), or null. */
function tagFromAddress(text: string): string | null {
	let url: URL;
	try {
		url = new URL(text);
	} catch {
		return null;
	}
	const params = new Map<string, string>();
	for (const [name, value] of url.searchParams) {
		const key = name.toLowerCase();
		if (!params.has(key)) params.set(key, value);
	}
	for (const name of TAG_PARAMETERS) {
		const value = params.get(name);
		if (value !== undefined && value.trim() !== '') return value;
	}
	return null;
}
