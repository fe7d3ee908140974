/**
 * The Walk's capture forms as plain data: which fields a kind of finding has, how each is
 * typed and checked, and the context a form converts in. No Svelte here, so it is unit-tested
 * on its own and the components stay thin.
 */
import type { InputLimit } from '$lib/schemas/ranges';
import type { SiteHeader } from '$lib/schemas/snapshot';
import type { UnitSystemId } from '$lib/units';

/** What a form holds: every field as the raw text typed or chosen. */
export type FormValues = Record<string, string>;

/** One plain message per field key ('form' for what belongs to no field). */
export type Problems = Record<string, string>;

export type FieldInput = 'text' | 'textarea' | 'number' | 'select' | 'choice' | 'tag';

/** The src/lib/units quantities a field is typed in. */
export type FieldQuantity =
	'pressure' | 'temperature' | 'shortLength' | 'length' | 'area' | 'speed';

export interface Option {
	value: string;
	label: string;
}

export interface FieldSpec {
	key: string;
	/** Words above the field. */
	label: string;
	input: FieldInput;
	/** Unit conversion for numbers; gauge for pressure. Absent: shown as stored (counts, ε). */
	quantity?: FieldQuantity;
	/** Base-unit limits, from src/lib/schemas/ranges.ts. */
	limit?: InputLimit;
	/** Where the value lands in the capture ('inputs.dn', 'headerId'); absent for form-only fields. */
	path?: string;
	/** A select whose value is stored as a number (nominal size). */
	numeric?: boolean;
	/** Default: not required. */
	required?: (values: FormValues) => boolean;
	/** Default: always shown. */
	shown?: (values: FormValues) => boolean;
	/** With its article, for range messages: "an orifice diameter". */
	noun: string;
	/** When required and empty: "Choose the trap’s condition". */
	missing: string;
	/** Static choices (dynamic ones — headers, areas — come from the site). */
	options?: readonly Option[];
	hint?: string;
}

export interface FormContext {
	system: UnitSystemId;
	/** Site atmospheric pressure, MPa absolute: gauge readings are read against it. */
	atmosphericPressure: number;
	headers: readonly SiteHeader[];
	/** The site's areas (ids are checked against them). */
	areas?: readonly { id: string; name: string }[];
	id: string;
	surveyId: string;
	createdAt: string;
	updatedAt: string;
}

export const always = () => true;
