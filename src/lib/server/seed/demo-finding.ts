/** The shape of a demo finding as the seed writes it: a device's capture plus the Desk's part. */
import type { FindingKind, FindingStatus } from '../../schemas/finding-vocabulary';

export interface DemoFinding {
	id: string;
	surveyId: string;
	kind: FindingKind;
	headerId?: string;
	areaId?: string;
	assetTag?: string;
	location: string;
	notes: string;
	photoIds: string[];
	createdAt: string;
	updatedAt: string;
	inputs: Record<string, unknown>;
	status: FindingStatus;
	repairCost?: number;
	reviewed: boolean;
	version: number;
	deleted: boolean;
}

export const findingId = (n: number) => `5e7a0007-0000-4000-8000-${String(n).padStart(12, '0')}`;

/** The capture's fields of a demo finding, for findingCaptureSchema (strict). */
export function captureOf(f: DemoFinding) {
	const { status, repairCost, reviewed, version, deleted, ...capture } = f;
	void [status, repairCost, reviewed, version, deleted];
	return capture;
}
