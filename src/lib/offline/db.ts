import Dexie, { type EntityTable } from 'dexie';

/**
 * The device's own database (IndexedDB through Dexie). Everything an auditor records lands
 * here first, so nothing is lost on reload or without signal; the outbox then carries each
 * change to the server. Keys are UUIDs made on the device. Keep every version() block:
 * phones in the field upgrade from whatever version they hold.
 */

export interface DeviceSurvey {
	id: string;
	name: string;
	siteName: string;
	/** Server change cursor this copy was pulled at. */
	cursor: number;
	updatedAt: string;
}

export interface DeviceFinding {
	id: string;
	surveyId: string;
	kind: 'trap' | 'leak' | 'insulation' | 'header';
	/** Shape: $lib/schemas/finding. */
	record: Record<string, unknown>;
	version: number;
	updatedAt: string;
}

export interface DevicePhoto {
	id: string;
	findingId: string;
	blob: Blob;
	contentType: string;
	uploaded: 0 | 1;
	createdAt: string;
}

/** One change waiting for the server. `mutationId` makes a replayed push harmless. */
export interface OutboxEntry {
	seq?: number;
	mutationId: string;
	entity: 'finding' | 'photo';
	entityId: string;
	payload: Record<string, unknown>;
	attempts: number;
	lastError?: string;
	createdAt: string;
}

export class DeviceDatabase extends Dexie {
	surveys!: EntityTable<DeviceSurvey, 'id'>;
	findings!: EntityTable<DeviceFinding, 'id'>;
	photos!: EntityTable<DevicePhoto, 'id'>;
	outbox!: EntityTable<OutboxEntry, 'seq'>;

	constructor(name = 'steamwisp') {
		super(name);
		this.version(1).stores({
			surveys: 'id, updatedAt',
			findings: 'id, surveyId, [surveyId+updatedAt]',
			photos: 'id, findingId, uploaded',
			outbox: '++seq, &mutationId, entityId'
		});
	}
}

let instance: DeviceDatabase | undefined;

/** The device database, opened on first use (browser only). */
export function deviceDb(): DeviceDatabase {
	instance ??= new DeviceDatabase();
	return instance;
}
