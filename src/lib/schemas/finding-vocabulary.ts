/**
 * The words a finding is recorded in: kinds, lifecycle statuses, trap types and conditions,
 * leak size classes and insulation items. Shared by the schemas, the forms and the engine.
 */

export const FINDING_KINDS = ['trap', 'leak', 'insulation', 'header'] as const;
export type FindingKind = (typeof FINDING_KINDS)[number];

/** Lifecycle: draft (field) → reviewed (desk) → published → approved/scheduled/repaired/declined → verified. */
export const FINDING_STATUSES = [
	'draft',
	'reviewed',
	'published',
	'approved',
	'scheduled',
	'repaired',
	'declined',
	'verified'
] as const;
export type FindingStatus = (typeof FINDING_STATUSES)[number];

export const TRAP_TYPES = [
	'thermodynamic',
	'float-thermostatic',
	'inverted-bucket',
	'thermostatic',
	'bimetallic',
	'fixed-orifice',
	'other'
] as const;
export type TrapType = (typeof TRAP_TYPES)[number];

export const TRAP_CONDITIONS = [
	'working',
	'leaking',
	'failed-open',
	'failed-closed',
	'flooded',
	'out-of-service',
	'not-accessible'
] as const;
export type TrapCondition = (typeof TRAP_CONDITIONS)[number];

export const TRAP_DISCHARGES = ['atmosphere', 'condensate-return'] as const;
export type TrapDischarge = (typeof TRAP_DISCHARGES)[number];

export const TRAP_TEST_METHODS = ['ultrasound', 'temperature', 'visual', 'combined'] as const;
export type TrapTestMethod = (typeof TRAP_TEST_METHODS)[number];

/** Leak size classes by what the auditor sees; the engine maps each to a hole diameter. */
export const LEAK_SIZE_CLASSES = ['pinhole', 'small', 'medium', 'large', 'very-large'] as const;
export type LeakSizeClass = (typeof LEAK_SIZE_CLASSES)[number];

export const INSULATION_ITEMS = ['pipe', 'valve', 'flange-pair', 'surface'] as const;
export type InsulationItem = (typeof INSULATION_ITEMS)[number];

export const INSULATION_MATERIALS = ['mineral-wool', 'calcium-silicate', 'cellular-glass'] as const;
export type InsulationMaterialName = (typeof INSULATION_MATERIALS)[number];

/** Where on the line a leak is. */
export const LEAK_COMPONENTS = ['valve-stem', 'flange', 'fitting', 'pipe', 'other'] as const;
export type LeakComponent = (typeof LEAK_COMPONENTS)[number];

/** What the auditor found on the surface today. */
export const INSULATION_STATES = ['bare', 'damaged', 'wet'] as const;
export type InsulationState = (typeof INSULATION_STATES)[number];

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
	published: 'Sent to the client',
	approved: 'Approved for repair',
	scheduled: 'Repair booked',
	repaired: 'Repaired',
	declined: 'Not going ahead',
	verified: 'Confirmed by a later survey'
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
