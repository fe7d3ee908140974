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
