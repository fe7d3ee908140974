import Dexie from 'dexie';
import { surveySnapshotSchema, type SurveySnapshot } from '$lib/schemas/snapshot';
import { atmosphericPressureAtElevation, STANDARD_ATMOSPHERE_MPA } from '$lib/units';
import type {
	DeviceArea,
	DeviceAsset,
	DeviceDatabase,
	DeviceFinding,
	DeviceSite,
	DeviceSurvey
} from './db';

/**
 * Taking a survey offline: the snapshot from `GET /api/surveys/[id]/snapshot` is checked,
 * then written in one transaction, so the device holds either the whole new copy or the old
 * one. Local edits the server has not accepted yet (pending 1) are never overwritten.
 */

export interface StoredSnapshot {
	surveyId: string;
	/** Server findings in the snapshot, and how many of them kept the device's own unsent edit. */
	findings: number;
	keptLocal: number;
	assets: number;
}

/** Site atmospheric pressure, MPa absolute: the cost basis value, else from elevation, else standard. */
export function siteAtmosphere(snapshot: Pick<SurveySnapshot, 'costBasis' | 'site'>): number {
	const basis = snapshot.costBasis;
	if (basis?.atmosphericPressure !== undefined) return basis.atmosphericPressure;
	const elevation = basis?.elevation ?? snapshot.site.elevation;
	if (elevation === null || elevation === undefined) return STANDARD_ATMOSPHERE_MPA;
	try {
		return atmosphericPressureAtElevation(elevation);
	} catch {
		// An elevation outside the standard atmosphere's range: a standard day is the safer guess.
		return STANDARD_ATMOSPHERE_MPA;
	}
}

export async function storeSnapshot(db: DeviceDatabase, raw: unknown): Promise<StoredSnapshot> {
	const parsed = surveySnapshotSchema.safeParse(raw);
	if (!parsed.success) {
		const issue = parsed.error.issues[0];
		const where = issue?.path.map(String).join('.') ?? '';
		throw new Error(
			`The server's copy of this survey could not be read, so nothing was changed on this device` +
				(issue ? ` (${where ? `${where}: ` : ''}${issue.message})` : '')
		);
	}
	const snap = parsed.data;
	const surveyId = snap.survey.id;
	const siteId = snap.site.id;
	const survey: DeviceSurvey = { ...snap.survey, cursor: snap.cursor, takenAt: snap.takenAt };
	const site: DeviceSite = {
		...snap.site,
		costBasis: snap.costBasis,
		headers: snap.headers,
		unitSystem: snap.unitSystem,
		atmosphericPressure: siteAtmosphere(snap)
	};
	let keptLocal = 0;

	const write = db.transaction(
		'rw',
		[db.surveys, db.sites, db.areas, db.assets, db.findings, db.photos],
		async () => {
			await db.surveys.put(survey);
			await db.sites.put(site);

			await db.areas.where('siteId').equals(siteId).delete();
			await db.areas.bulkPut(snap.areas);

			// Server assets are replaced outright; a device-made asset stays until the server
			// knows its tag (its capture may still be waiting to send).
			const serverTags = new Set(snap.assets.map((a) => a.tag));
			await db.assets
				.where('siteId')
				.equals(siteId)
				.filter((a) => a.local !== 1 || serverTags.has(a.tag))
				.delete();
			await db.assets.bulkPut(snap.assets);

			const onDevice = await db.findings.where('surveyId').equals(surveyId).toArray();
			const byId = new Map(onDevice.map((f) => [f.id, f]));
			const listed = new Set<string>();
			const fresh: DeviceFinding[] = [];
			for (const f of snap.findings) {
				listed.add(f.capture.id);
				if (byId.get(f.capture.id)?.pending === 1) {
					keptLocal++;
					continue;
				}
				fresh.push({
					id: f.capture.id,
					surveyId,
					kind: f.capture.kind,
					capture: f.capture,
					version: f.version,
					status: f.status,
					pending: 0,
					deleted: 0,
					// Normalised to UTC so the [surveyId+updatedAt] index sorts by time.
					updatedAt: new Date(f.capture.updatedAt).toISOString()
				});
			}
			await db.findings.bulkPut(fresh);
			// Gone from the server and nothing unsent here: the device lets it go too. Its
			// photos go with it only once uploaded; a photo not yet sent is never thrown away.
			const gone = onDevice.filter((f) => !listed.has(f.id) && f.pending === 0).map((f) => f.id);
			if (gone.length > 0) {
				await db.findings.bulkDelete(gone);
				await db.photos
					.where('findingId')
					.anyOf(gone)
					.filter((p) => p.uploaded === 1)
					.delete();
			}
		}
	);
	try {
		await write;
	} catch (error) {
		// The transaction rolled back: the device still holds its previous copy.
		throw new Error(
			`This device could not store the survey, so it keeps the copy it had (${(error as Error).message})`,
			{ cause: error }
		);
	}
	return { surveyId, findings: snap.findings.length, keptLocal, assets: snap.assets.length };
}

export interface SurveyBundle {
	survey: DeviceSurvey;
	site: DeviceSite;
	/** In the site's own order. */
	areas: DeviceArea[];
	assets: DeviceAsset[];
	/** Not deleted, newest change first. */
	findings: DeviceFinding[];
	/** Photos on the device per finding id (findings without photos are absent). */
	photoCounts: Map<string, number>;
}

/** Everything the Walk shows of one survey, read in one transaction; null if not on the device. */
export async function surveyBundle(
	db: DeviceDatabase,
	surveyId: string
): Promise<SurveyBundle | null> {
	return db.transaction(
		'r',
		[db.surveys, db.sites, db.areas, db.assets, db.findings, db.photos],
		async () => {
			const survey = await db.surveys.get(surveyId);
			if (!survey) return null;
			const site = await db.sites.get(survey.siteId);
			if (!site) return null;
			const areas = await db.areas.where('siteId').equals(site.id).sortBy('sortOrder');
			const assets = await db.assets.where('siteId').equals(site.id).toArray();
			const findings = (
				await db.findings
					.where('[surveyId+updatedAt]')
					.between([surveyId, Dexie.minKey], [surveyId, Dexie.maxKey])
					.reverse()
					.toArray()
			).filter((f) => f.deleted === 0);
			const photoCounts = new Map<string, number>();
			await db.photos
				.where('surveyId')
				.equals(surveyId)
				.each((p) => photoCounts.set(p.findingId, (photoCounts.get(p.findingId) ?? 0) + 1));
			return { survey, site, areas, assets, findings, photoCounts };
		}
	);
}
