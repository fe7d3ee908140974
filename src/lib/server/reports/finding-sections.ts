/**
 * The report's page of one finding: the same data and wording as the Desk's finding page
 * ($lib/server/desk/finding-detail: the engine run on the capture on the survey's pricing
 * context, its calculation step by step with every assumption and its source, the engine's
 * cautions) and its photos' bytes from the photo store. For a published revision, a finding
 * whose evidence was corrected after it (its version moved past the snapshot's) says so; its
 * figures stay the published ones and the corrected calculation is not shown beside them.
 */
import { photosOf, findingOfSurvey, liveFigures } from '../desk/finding-detail';
import type { Calculation } from '../desk/finding-steps';
import type { Executor } from '../db/types';
import { pricingContext } from '../pricing/context';
import { photoKey, photoStore, type PhotoStore } from '../storage';
import type { Caution } from '../../steam';
import type { ReportContent } from './content';
import { reportRows, type ReportRow } from './rows';

/** Finding pages in one PDF at most (the ranked table lists more; the exports list all). */
export const REPORT_FINDING_PAGES = 500;
/** Photos drawn per finding page. */
export const PHOTOS_PER_FINDING = 4;
/** A photo larger than this is not drawn (the page says so). */
const MAX_PHOTO_BYTES = 12 * 1024 * 1024;

export interface SectionPhoto {
	number: number;
	caption: string | null;
	takenAt: string | null;
	/** JPEG or PNG bytes; null when not uploaded yet, or in a format a PDF cannot hold. */
	bytes: Buffer | null;
	/** Why there are no bytes. */
	missing: string | null;
}

export interface FindingSection {
	row: ReportRow;
	notes: string;
	/** The evidence changed after the revision reported on: figures are as published. */
	corrected: boolean;
	calculation: Calculation | null;
	/** Why the engine gave nothing now (an input out of range, a missing header or basis). */
	problem: string | null;
	cautions: Caution[];
	photos: SectionPhoto[];
	/** Photos on the finding beyond PHOTOS_PER_FINDING. */
	morePhotos: number;
}

async function readAll(body: ReadableStream<Uint8Array>, limit: number): Promise<Buffer | null> {
	const parts: Uint8Array[] = [];
	let size = 0;
	for await (const part of body as unknown as AsyncIterable<Uint8Array>) {
		size += part.byteLength;
		if (size > limit) return null;
		parts.push(part);
	}
	return Buffer.concat(parts);
}

const isJpeg = (b: Buffer) => b[0] === 0xff && b[1] === 0xd8;
const isPng = (b: Buffer) =>
	b.subarray(0, 8).equals(Buffer.from([137, 80, 78, 71, 13, 10, 26, 10]));

async function photoBytes(store: PhotoStore, id: string) {
	const object = await store.get(photoKey(id));
	if (!object) return { bytes: null, missing: 'not in the photo store' };
	if (object.bytes > MAX_PHOTO_BYTES) {
		await object.body.cancel();
		return { bytes: null, missing: 'too large to print' };
	}
	const bytes = await readAll(object.body, MAX_PHOTO_BYTES);
	if (!bytes) return { bytes: null, missing: 'too large to print' };
	if (!isJpeg(bytes) && !isPng(bytes))
		return { bytes: null, missing: 'in a format a PDF cannot hold (see it in Steamwisp)' };
	return { bytes, missing: null };
}

/** The finding pages of a report, in rank order, at most `limit`, read one finding at a time. */
export async function* findingSections(
	db: Executor,
	content: ReportContent,
	{
		limit = REPORT_FINDING_PAGES,
		store = photoStore()
	}: { limit?: number; store?: PhotoStore } = {}
): AsyncGenerator<FindingSection> {
	const { survey } = content;
	const ctx = await pricingContext(db, survey.siteId, content.basisId);
	const units = {
		system: survey.unitSystem,
		atmosphere: survey.atmosphere,
		currency: content.currency
	};
	for await (const row of reportRows(db, content, { limit, pageRows: 100 })) {
		const found = await findingOfSurvey(db, survey.id, row.id);
		const corrected =
			row.publishedVersion !== null &&
			(!found || found.row.deletedAt !== null || found.row.version !== row.publishedVersion);
		const live =
			found && !corrected ? liveFigures(ctx, found.capture, found.row.repairCost, units) : null;
		const listed = found ? await photosOf(db, survey.firmId, row.id, found.capture.photoIds) : [];
		const photos: SectionPhoto[] = [];
		for (const p of listed.slice(0, corrected ? 0 : PHOTOS_PER_FINDING)) {
			const got = p.uploaded
				? await photoBytes(store, p.id)
				: { bytes: null, missing: 'not uploaded from the device yet' };
			photos.push({ number: p.number, caption: p.caption, takenAt: p.takenAt, ...got });
		}
		yield {
			row,
			notes: corrected ? '' : (found?.capture.notes ?? ''),
			corrected,
			calculation: live?.calculation ?? null,
			problem: live?.problem ?? null,
			cautions: live?.cautions ?? [],
			photos,
			morePhotos: corrected ? 0 : Math.max(0, listed.length - PHOTOS_PER_FINDING)
		};
	}
}
