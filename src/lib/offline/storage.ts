/**
 * Keeping the device's records safe from the browser's own clean-up. A browser may clear a
 * site's storage when the device runs low on space unless the site was granted persistent
 * storage; the Walk asks for it and tells the auditor plainly where they stand.
 */

export interface StorageReport {
	/** Bytes this app uses and may use on this device (the browser's estimates). */
	usage: number;
	quota: number;
	/** true: the browser keeps the data when space runs low. */
	persisted: boolean;
}

function storageManager(): StorageManager | null {
	return typeof navigator !== 'undefined' && navigator.storage ? navigator.storage : null;
}

/** Asks the browser to keep this app's data when space runs low; false when it will not (or cannot). */
export async function requestPersistence(): Promise<boolean> {
	const storage = storageManager();
	if (!storage?.persist) return false;
	try {
		return await storage.persist();
	} catch {
		return false;
	}
}

/** How much is used and whether it is kept; null where the browser does not say. */
export async function storageReport(): Promise<StorageReport | null> {
	const storage = storageManager();
	if (!storage?.estimate) return null;
	try {
		const estimate = await storage.estimate();
		const persisted = storage.persisted ? await storage.persisted() : false;
		return { usage: estimate.usage ?? 0, quota: estimate.quota ?? 0, persisted };
	} catch {
		return null;
	}
}

/** Bytes in words: "4.2 MB", "1.8 GB", "850 kB" (decimal units, as storage is sold). */
export function describeBytes(bytes: number): string {
	const units = ['bytes', 'kB', 'MB', 'GB', 'TB'];
	let value = Math.max(0, bytes);
	let unit = 0;
	while (value >= 1000 && unit < units.length - 1) {
		value /= 1000;
		unit++;
	}
	if (unit === 0) return `${Math.round(value)} ${value === 1 ? 'byte' : 'bytes'}`;
	return `${value < 10 ? value.toFixed(1) : Math.round(value)} ${units[unit]}`;
}

/** One line for the auditor, e.g. "4.2 MB used · about 1.8 GB free on this device · kept when space runs low". */
export function describeStorage(report: StorageReport | null): string {
	if (report === null) return 'This browser does not say how much space is left';
	const free = Math.max(0, report.quota - report.usage);
	return [
		`${describeBytes(report.usage)} used`,
		`about ${describeBytes(free)} free on this device`,
		report.persisted ? 'kept when space runs low' : 'may be cleared if the device runs low on space'
	].join(' · ');
}
