import { error, json } from '@sveltejs/kit';
import { z } from 'zod';
import { uuidSchema } from '$lib/schemas/common';
import { MAX_PHOTO_BYTES, PHOTO_HEADERS } from '$lib/schemas/sync';
import { db } from '$lib/server/db';
import { readPhotoBody } from '$lib/server/photos/body';
import { photoForReading, storePhoto } from '$lib/server/photos/upload';
import { requireRole, requireSurveyAccess } from '$lib/server/policy';
import { photoStore } from '$lib/server/storage';
import type { RequestHandler } from './$types';

const uuidHeader = (name: string) =>
	z.uuid({ error: `${name} must be a UUID (the photo's finding and survey are named by it)` });

const headersSchema = z.object({
	finding: uuidHeader(PHOTO_HEADERS.finding),
	survey: uuidHeader(PHOTO_HEADERS.survey),
	sha256: z
		.string({ error: `Send the photo's SHA-256 in ${PHOTO_HEADERS.sha256}` })
		.regex(/^[0-9a-f]{64}$/, {
			error: `${PHOTO_HEADERS.sha256} must be the SHA-256 as 64 lower-case hex digits`
		})
});

/** The photo id of the address: the device names it (a UUID), the server keeps it. */
const photoId = (raw: string, status: 400 | 404) => {
	const id = uuidSchema.safeParse(raw);
	if (!id.success) error(status, status === 400 ? 'A photo id must be a UUID' : 'Not found.');
	return id.data;
};

/** If-None-Match names this ETag (a list, `*`, or the weak form of the same tag all count). */
const matches = (header: string | null, etag: string) =>
	header !== null &&
	header.split(',').some((t) => {
		const tag = t.trim().replace(/^W\//, '');
		return tag === '*' || tag === etag;
	});

function clientAddress(event: { getClientAddress: () => string }): string | null {
	try {
		return event.getClientAddress();
	} catch {
		return null; // no socket address (an in-process call)
	}
}

/** One photo, bytes in the body (docs/sync.md): 201 stored, 200 already stored, 4xx refused. */
export const PUT: RequestHandler = async (event) => {
	const user = requireRole(event, 'survey.record');
	const id = photoId(event.params.id, 400);
	const h = event.request.headers;
	const parsed = headersSchema.safeParse({
		finding: h.get(PHOTO_HEADERS.finding) ?? undefined,
		survey: h.get(PHOTO_HEADERS.survey) ?? undefined,
		sha256: h.get(PHOTO_HEADERS.sha256) ?? undefined
	});
	if (!parsed.success) {
		error(400, `This photo cannot be stored: ${parsed.error.issues[0].message}`);
	}
	const survey = await requireSurveyAccess(user, parsed.data.survey, 'write');
	const bytes = await readPhotoBody(event.request, MAX_PHOTO_BYTES);
	const answer = await storePhoto(db, photoStore(), user, {
		id,
		findingId: parsed.data.finding,
		surveyId: survey.id,
		firmId: survey.firmId,
		sha256: parsed.data.sha256,
		bytes,
		address: clientAddress(event) ?? undefined
	});
	return json(answer.body, {
		status: answer.status,
		headers: { 'cache-control': 'private, no-store' }
	});
};

/** The bytes of one photo, for whoever may read its survey. */
export const GET: RequestHandler = async (event) => {
	const user = requireRole(event, 'survey.read');
	const row = await photoForReading(db, user.firmId, photoId(event.params.id, 404));
	if (!row) error(404, 'Not found.');
	await requireSurveyAccess(user, row.surveyId, 'read');
	const etag = `"${row.sha256}"`;
	const common = {
		etag,
		'cache-control': 'private, no-store',
		'x-content-type-options': 'nosniff'
	};
	if (matches(event.request.headers.get('if-none-match'), etag)) {
		return new Response(null, { status: 304, headers: common });
	}
	const stored = await photoStore().get(row.storageKey);
	if (!stored) error(404, 'This photo’s bytes are not in storage.');
	return new Response(stored.body, {
		headers: {
			...common,
			'content-type': row.contentType,
			'content-length': String(row.bytes),
			'content-disposition': 'inline'
		}
	});
};
