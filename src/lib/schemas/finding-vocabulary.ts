/**
 * The words a finding is recorded in: kinds, lifecycle statuses, trap types and conditions,
 * leak size classes and components, insulation items, materials and states. The ids the engine
 * prices by are the engine's own (src/lib/steam/vocabulary.ts), re-exported here; lifecycle
 * statuses and the words people read for every id (`*_LABELS`) live here.
 */
import type {
	FindingKind,
	InsulationItem,
	InsulationMaterialName,
	InsulationState,
	LeakComponent,
	LeakSizeClass,
	TrapCondition,
	TrapDischarge,
	TrapTestMethod,
	TrapType
} from '../steam/vocabulary';

export {
	FINDING_KINDS,
	INSULATION_ITEMS,
	INSULATION_MATERIALS,
	INSULATION_STATES,
	LEAK_COMPONENTS,
	LEAK_SIZE_CLASSES,
	TRAP_CONDITIONS,
	TRAP_DISCHARGES,
	TRAP_TEST_METHODS,
	TRAP_TYPES
} from '../steam/vocabulary';
export type {
	FindingKind,
	InsulationItem,
	InsulationMaterialName,
	InsulationState,
	LeakComponent,
	LeakSizeClass,
	TrapCondition,
	TrapDischarge,
	TrapTestMethod,
	TrapType
};

/**
 * Lifecycle: draft (field) → reviewed (desk) → published (sent to the client). A client's
 * decision on a published finding (approved, scheduled, repaired, declined) and what a later
 * survey confirmed are not statuses: they live in the decisions table (docs/decisions.md).
 */
export const FINDING_STATUSES = ['draft', 'reviewed', 'published'] as const;
export type FindingStatus = (typeof FINDING_STATUSES)[number];

/**
 * Words a finding's status held before decisions had their own table (migration 0012 moved
 * them there). A device or a reply of that time may still carry one: it reads as published.
 */
export const FORMER_DECISION_STATUSES = [
	'approved',
	'scheduled',
	'repaired',
	'declined',
	'verified'
] as const;

/** A stored or received status as a lifecycle status: a former decision word is published. */
export function lifecycleStatus(status: string): FindingStatus | null {
	if ((FINDING_STATUSES as readonly string[]).includes(status)) return status as FindingStatus;
	return (FORMER_DECISION_STATUSES as readonly string[]).includes(status) ? 'published' : null;
}

// Words people read for each stored id: raw ids never reach a screen.

export const FINDING_KIND_LABELS: Record<FindingKind, string> = {
	trap: 'Trap test',
	leak: 'Leak',
	insulation: 'Insulation gap',
	header: 'Header reading'
};

export const FINDING_STATUS_LABELS: Record<FindingStatus, string> = {
	draft: 'Recorded in the field',
	reviewed: 'Checked at the desk',
	published: 'Sent to the client'
};

export const TRAP_TYPE_LABELS: Record<TrapType, string> = {
	thermodynamic: 'Thermodynamic (disc)',
	'float-thermostatic': 'Float and thermostatic',
	'inverted-bucket': 'Inverted bucket',
	thermostatic: 'Thermostatic (balanced pressure)',
	bimetallic: 'Bimetallic',
	'fixed-orifice': 'Fixed orifice (venturi)',
	other: 'Other or unknown'
};

export const TRAP_CONDITION_LABELS: Record<TrapCondition, string> = {
	working: 'Working',
	leaking: 'Leaking',
	'failed-open': 'Failed open',
	'failed-closed': 'Failed closed',
	flooded: 'Flooded',
	'out-of-service': 'Out of service',
	'not-accessible': 'Not accessible'
};

export const TRAP_DISCHARGE_LABELS: Record<TrapDischarge, string> = {
	atmosphere: 'To atmosphere (drain)',
	'condensate-return': 'To a condensate return'
};

export const TRAP_TEST_METHOD_LABELS: Record<TrapTestMethod, string> = {
	ultrasound: 'Ultrasound',
	temperature: 'Temperature',
	visual: 'Visual',
	combined: 'Ultrasound and temperature'
};

export const LEAK_SIZE_CLASS_LABELS: Record<LeakSizeClass, string> = {
	pinhole: 'Pinhole',
	small: 'Small',
	medium: 'Medium',
	large: 'Large',
	'very-large': 'Very large'
};

export const LEAK_COMPONENT_LABELS: Record<LeakComponent, string> = {
	'valve-stem': 'Valve stem or gland',
	flange: 'Flange joint',
	fitting: 'Fitting or union',
	pipe: 'Pipe wall or weld',
	other: 'Something else'
};

export const INSULATION_ITEM_LABELS: Record<InsulationItem, string> = {
	pipe: 'Pipe run',
	valve: 'Valve',
	'flange-pair': 'Flange pair',
	surface: 'Flat surface (tank, vessel)'
};

export const INSULATION_MATERIAL_LABELS: Record<InsulationMaterialName, string> = {
	'mineral-wool': 'Mineral wool',
	'calcium-silicate': 'Calcium silicate',
	'cellular-glass': 'Cellular glass'
};

export const INSULATION_STATE_LABELS: Record<InsulationState, string> = {
	bare: 'Bare, never insulated',
	damaged: 'Damaged or missing in places',
	wet: 'Wet insulation'
};
