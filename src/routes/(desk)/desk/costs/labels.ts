/** Words for the cost library's kinds and an entry's identity, as the Desk shows them. */
import type { CostEntryKind } from '$lib/costs/match';
import {
	INSULATION_ITEM_LABELS,
	LEAK_SIZE_CLASS_LABELS,
	TRAP_TYPE_LABELS
} from '$lib/schemas/finding-vocabulary';

export const KIND_LABELS: Record<CostEntryKind, { title: string; unit: string }> = {
	'trap-repair': { title: 'Trap repair', unit: 'per trap' },
	'trap-replacement': { title: 'Trap replacement', unit: 'per trap' },
	insulation: { title: 'Pipe insulation', unit: 'per metre' },
	'fitting-cover': { title: 'Fitting cover', unit: 'per cover' },
	'leak-repair': { title: 'Leak repair', unit: 'per leak' },
	labour: { title: 'Labour rate', unit: 'per hour' }
};

export interface EntryIdentityRow {
	kind: string;
	trapType: string | null;
	dn: number | null;
	thicknessMm: number | null;
	fittingKind: string | null;
	sizeClass: string | null;
}

/** "Thermodynamic (disc), DN 15", "DN 50, 40 mm", "Valve, DN 80", "Medium". */
export function identityText(e: EntryIdentityRow): string {
	switch (e.kind) {
		case 'trap-repair':
		case 'trap-replacement':
			return `${TRAP_TYPE_LABELS[e.trapType as keyof typeof TRAP_TYPE_LABELS] ?? e.trapType}, DN ${e.dn}`;
		case 'insulation':
			return `DN ${e.dn}, ${e.thicknessMm} mm thick`;
		case 'fitting-cover':
			return `${INSULATION_ITEM_LABELS[e.fittingKind as keyof typeof INSULATION_ITEM_LABELS] ?? e.fittingKind}, DN ${e.dn}`;
		case 'leak-repair':
			return LEAK_SIZE_CLASS_LABELS[e.sizeClass as keyof typeof LEAK_SIZE_CLASS_LABELS] ?? '';
		default:
			return 'Per hour';
	}
}
