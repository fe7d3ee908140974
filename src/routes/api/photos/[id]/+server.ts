import { error } from '@sveltejs/kit';
import { z } from 'zod';
import { uuidSchema } from '$lib/schemas/common';
import { MAX_PHOTO_BYTES, PHOTO_HEADERS } from '$lib/schemas/sync';
import { db } from '$lib/server/db';
import { readPhotoBody } from '$lib/server/photos/body';
import { photoForReading, storePhoto } from '$lib/server/photos/upload';
import { requireRole, requireSurveyAccess } from '$lib/server/policy';
import { photoStore } from '$lib/server/storage';
import type { RequestHandler } from './$types';

const headersSchema = z.object({
	finding: uuidSchema,
	survey: uuidSchema,
	sha256: z
		.string({ error: `Send the photo's SHA-256 in ${PHOTO_HEADERS.sha256}` })
		.regex(/^[0-9a-f]{64}$/, { error: 'The SHA-256 must be 64 lower-case hex digits' })
});

const photoId = (raw: string) => {
	const id = uuidSchema.safeParse(raw);
	if (!id.success) error(404, 'Not found.');
	return id.data;
};

/** One photo, bytes in the body (docs/sync.md): 201 stored, 200 already stored, 4xx refused. */
export const PUT: RequestHandler = async (event) => {
	const user = requireRole(event, 'survey.record');
	const id = photoId(event.params.id);
	const h = event.request.headers;
	const parsed = headersSchema.safeParse({
		finding: h.get(PHOTO_HEADERS.finding) ?? undefined,
		survey: h.get(PHOTO_HEADERS.survey) ?? undefined,
		sha256: h.get(PHOTO_HEADERS.sha256) ?? undefined
	});
	if (!parsed.success) {
		const issue = parsed.error.issues[0];
		error(400, `This photo cannot be stored: ${issue.path.join('.')}: ${issue.message}`);
	}
	const survey = await requireSurveyAccess(user, parsed.data.survey, 'write');
	const bytes = await readPhotoBody(event.request, MAX_PHOTO_BYTES);
	const answer = await storePhoto(db, photoStore(), user, {
		id,
		findingId: parsed.data.finding,
		surveyId: survey.id,
		firmId: survey.firmId,
		sha256: parsed.data.sha256,
		bytes
	});
	return new Response(JSON.stringify(answer.body), {
		status: answer.status,
		headers: { 'content-type': 'application/json', 'cache-control': 'private, no-store' }
	});
};

/** The bytes of one photo, for whoever may read its survey. */
export const GET: RequestHandler = async (event) => {
	const user = requireRole(event, 'survey.read');
	const row = await photoForReading(db, user.firmId, photoId(event.params.id));
	if (!row) error(404, 'Not found.');
	await requireSurveyAccess(user, row.surveyId, 'read');
	const etag = `"${row.sha256}"`;
	const common = {
		etag,
		'cache-control': 'private, no-store',
		'x-content-type-options': 'nosniff'
	};
	if (event.request.headers.get('if-none-match') === etag) {
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
