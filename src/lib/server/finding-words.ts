/** Words for a finding's stored ids (kind, condition, status): raw ids never reach a screen. */
import {
	FINDING_KIND_LABELS,
	FINDING_STATUS_LABELS,
	LEAK_SIZE_CLASS_LABELS,
	TRAP_CONDITION_LABELS,
	type FindingKind,
	type FindingStatus
} from '../schemas/finding-vocabulary';

export const kindWords = (kind: string): string => FINDING_KIND_LABELS[kind as FindingKind] ?? kind;

export const statusWords = (status: string): string =>
	FINDING_STATUS_LABELS[status as FindingStatus] ?? status;

export const conditionWords = (condition: string | null): string | null =>
	condition === null
		? null
		: ((TRAP_CONDITION_LABELS as Record<string, string>)[condition] ??
			(LEAK_SIZE_CLASS_LABELS as Record<string, string>)[condition] ??
			condition);
