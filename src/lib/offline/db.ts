import Dexie, { type EntityTable } from 'dexie';
import type { FindingCapture } from '$lib/schemas/capture';
import type { FindingKind, FindingStatus, TrapCondition } from '$lib/schemas/finding-vocabulary';
import type { CostBasis } from '$lib/schemas/site';
import type { Area, AssetSnapshot, SiteHeader, SurveySummary } from '$lib/schemas/snapshot';
import { upgradeToV2 } from './upgrade-v2';
import { upgradeToV3 } from './upgrade-v3';

/**
 * The device's own database (IndexedDB through Dexie). Everything an auditor records lands
 * here first, so nothing is lost on reload or without signal; the outbox then carries each
 * change to the server. Keys are UUIDs made on the device. Keep every version() block:
 * phones in the field upgrade from whatever version they hold. One database per signed-in
 * person (deviceDbName), so a shared phone keeps auditors apart; the shared version-1 name
 * 'steamwisp' is no longer opened by the app, but the constructor still opens any name.
 */

/** A survey taken offline: its summary plus where its snapshot was taken. */
export interface DeviceSurvey extends SurveySummary {
	/**
	 * Server change counter this survey is known up to: the snapshot's, then moved on by each
	 * pull page (sync-pull.ts); the pull starts from the smallest on the device.
	 */
	cursor: number;
	takenAt: string;
	/**
	 * 1 = the server withdrew the survey from this person (unassigned, closed) while something
	 * of it still waited to send here: kept so nothing is lost; the Walk should say so.
	 */
	withdrawn?: 1;
}

export interface DeviceSite {
	id: string;
	name: string;
	address: string | null;
	/** Metres above sea level. */
	elevation: number | null;
	clientName: string;
	/** null until the consultant sets it: the Walk records, but prices nothing. */
	costBasis: CostBasis | null;
	headers: SiteHeader[];
	/** The signed-in person's unit system. */
	unitSystem: 'SI' | 'US';
	/** MPa absolute, resolved once: cost basis value, else from elevation, else standard. */
	atmosphericPressure: number;
}

export type DeviceArea = Area;

/** A tagged trap. `local: 1` = made on this device from a trap capture; a snapshot replaces it. */
export interface DeviceAsset extends AssetSnapshot {
	local?: 1;
}

export interface DeviceFinding {
	id: string;
	surveyId: string;
	kind: FindingKind;
	capture: FindingCapture;
	/** Server version; 0 = never on the server. */
	version: number;
	status: FindingStatus;
	/** 1 = changed here, not yet accepted by the server. */
	pending: 0 | 1;
	deleted: 0 | 1;
	updatedAt: string;
	/**
	 * 1 = the server kept another edit of this finding and holds this device's as a conflict
	 * (see `conflicts`); the device keeps the auditor's version until the Desk settles it.
	 */
	conflict?: 1;
}

export interface DevicePhoto {
	id: string;
	findingId: string;
	surveyId: string;
	blob: Blob;
	thumbnail: Blob;
	contentType: string;
	/** Pixels; 0 when unknown (photos kept from version 1). */
	width: number;
	height: number;
	/** Size of `blob`, bytes. */
	bytes: number;
	uploaded: 0 | 1;
	createdAt: string;
	/** Why the server refused the last upload (plain words); the photo is skipped until changed. */
	lastError?: string;
}

export interface DeviceDraft {
	key: string;
	surveyId: string;
	kind: FindingKind;
	findingId: string;
	/** The form's fields as typed (raw strings, before any conversion). */
	values: Record<string, string>;
	updatedAt: string;
}

/** One change waiting for the server. `mutationId` makes a replayed push harmless. */
export interface OutboxEntry {
	seq?: number;
	mutationId: string;
	entity: 'finding';
	op: 'upsert' | 'delete';
	recordId: string;
	/** Server version the change was made on (0 = a finding new on this device). */
	baseVersion: number;
	/** The capture, exactly what `POST /api/sync/push` takes as `data`; null for a delete. */
	payload: FindingCapture | null;
	/** The finding's survey (set from version 3; a delete's push names it). */
	surveyId?: string;
	attempts: number;
	lastError?: string;
	createdAt: string;
}

/**
 * A row an upgrade could not carry into the new shape, kept as it was so nothing recorded is
 * lost silently (a support person can still read it out of the browser's storage).
 */
export interface SetAsideRow {
	seq?: number;
	/** The store the row came from and its key there. */
	store: string;
	key: string;
	row: unknown;
	reason: string;
	setAsideAt: string;
}

/** Small device facts kept by key (`MetaKey`). */
export interface MetaRow {
	key: MetaKey;
	value: unknown;
}
/**
 * deviceId: this device's UUID (made once); cursor: the server change counter pulled up to;
 * lastExchangeAt: ISO time of the last whole exchange; lastProblem: plain words or null.
 */
export type MetaKey = 'deviceId' | 'cursor' | 'lastExchangeAt' | 'lastProblem';

/** An edit of this device the server kept as a conflict (docs/sync.md): shown until settled. */
export interface DeviceConflict {
	mutationId: string;
	recordId: string;
	surveyId: string;
	/** The device's capture; null for a delete. */
	capture: FindingCapture | null;
	/** The server's version of the finding when it answered. */
	serverVersion: number;
	reason: string;
	createdAt: string;
}

/** What the round's list is narrowed to (round.ts filterFindings); every field optional. */
export interface FindingFilter {
	areaId?: string;
	kind?: FindingKind;
	condition?: TrapCondition;
	tag?: string;
	text?: string;
}

export class DeviceDatabase extends Dexie {
	surveys!: EntityTable<DeviceSurvey, 'id'>;
	sites!: EntityTable<DeviceSite, 'id'>;
	areas!: EntityTable<DeviceArea, 'id'>;
	assets!: EntityTable<DeviceAsset, 'id'>;
	findings!: EntityTable<DeviceFinding, 'id'>;
	photos!: EntityTable<DevicePhoto, 'id'>;
	drafts!: EntityTable<DeviceDraft, 'key'>;
	outbox!: EntityTable<OutboxEntry, 'seq'>;
	setAside!: EntityTable<SetAsideRow, 'seq'>;
	meta!: EntityTable<MetaRow, 'key'>;
	conflicts!: EntityTable<DeviceConflict, 'mutationId'>;

	constructor(name: string) {
		super(name);
		this.version(1).stores({
			surveys: 'id, updatedAt',
			findings: 'id, surveyId, [surveyId+updatedAt]',
			photos: 'id, findingId, uploaded',
			outbox: '++seq, &mutationId, entityId'
		});
		this.version(2)
			.stores({
				surveys: 'id, updatedAt, siteId',
				sites: 'id',
				areas: 'id, siteId',
				assets: 'id, siteId, &[siteId+tag]',
				findings: 'id, surveyId, [surveyId+kind], [surveyId+updatedAt]',
				photos: 'id, findingId, surveyId, uploaded',
				drafts: 'key, surveyId',
				outbox: '++seq, &mutationId, recordId',
				setAside: '++seq, store'
			})
			.upgrade(upgradeToV2);
		// Version 3: sync. [recordId+seq] gives a finding's queued entries in order, which the
		// drain reads after each answer; every other store is kept as it was.
		this.version(3)
			.stores({
				outbox: '++seq, &mutationId, recordId, [recordId+seq]',
				meta: 'key',
				conflicts: 'mutationId, recordId, surveyId'
			})
			.upgrade(upgradeToV3);
	}
}

/** The database name of one signed-in person's device data. */
export function deviceDbName(userId: string): string {
	if (typeof userId !== 'string' || userId.trim() === '') {
		throw new Error('The device database belongs to a signed-in person: no person given');
	}
	return `steamwisp-user-${userId}`;
}

const open = new Map<string, DeviceDatabase>();

/** The device database of one person, opened on first use and kept open (browser only). */
export function openDeviceDb(userId: string): DeviceDatabase {
	const name = deviceDbName(userId);
	let db = open.get(name);
	if (!db) {
		db = new DeviceDatabase(name);
		open.set(name, db);
	}
	return db;
}

/** Closes a person's database (on sign-out), so the next openDeviceDb starts afresh. */
export function closeDeviceDb(userId: string): void {
	const name = deviceDbName(userId);
	open.get(name)?.close();
	open.delete(name);
}
