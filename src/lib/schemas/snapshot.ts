/**
 * The snapshot: everything one survey needs offline, downloaded to the device in one go by
 * `GET /api/surveys/[id]/snapshot`, and the survey list of `GET /api/surveys`. Validated by
 * the server before it answers and by the device before it stores anything.
 */
import { z } from 'zod';
import { dnSchema, uuidSchema } from './common';
import { findingCaptureSchema, isoDateTime } from './capture';
import { receivedStatusSchema } from './finding-status';
import { TRAP_CONDITIONS, TRAP_DISCHARGES, TRAP_TYPES } from './finding-vocabulary';
import { unitSystems } from './roles';
import { costBasisSchema, headerSchema } from './site';
import { INPUT_LIMITS, limitedNumber } from './ranges';
import { surveyStageSchema } from './survey';

const dateOnly = z.iso.date({ error: 'Must be a date' }).nullable();

export const surveySummarySchema = z.object({
	id: uuidSchema,
	name: z.string(),
	stage: surveyStageSchema,
	startsOn: dateOnly,
	endsOn: dateOnly,
	siteId: uuidSchema,
	siteName: z.string(),
	clientName: z.string(),
	/** Findings on the server (not deleted). */
	findingCount: z.number().int().nonnegative(),
	updatedAt: isoDateTime('Updated at')
});
export type SurveySummary = z.infer<typeof surveySummarySchema>;

/** `GET /api/surveys`: the surveys this person may record on. */
export const surveyListSchema = z.object({ surveys: z.array(surveySummarySchema) });
export type SurveyList = z.infer<typeof surveyListSchema>;

export const areaSchema = z.object({
	id: uuidSchema,
	siteId: uuidSchema,
	name: z.string().min(1).max(120),
	sortOrder: z.number().int()
});
export type Area = z.infer<typeof areaSchema>;

/** What a trap asset keeps from survey to survey (the last capture's trap details). */
export const trapAssetDetailsSchema = z.object({
	trapType: z.enum(TRAP_TYPES, { error: 'Choose the trap’s type' }),
	dn: dnSchema,
	orificeDiameter: limitedNumber('Orifice diameter', INPUT_LIMITS.trap.orificeDiameter).optional(),
	discharge: z.enum(TRAP_DISCHARGES, { error: 'Choose where the trap discharges' }).optional(),
	backPressure: limitedNumber('Back pressure', INPUT_LIMITS.trap.backPressure).optional()
});
export type TrapAssetDetails = z.infer<typeof trapAssetDetailsSchema>;

/** The most recent test of a tagged trap on any earlier survey of the site. */
export const lastResultSchema = z.object({
	surveyId: uuidSchema,
	surveyName: z.string(),
	findingId: uuidSchema,
	testedAt: isoDateTime('Tested at'),
	condition: z.enum(TRAP_CONDITIONS, { error: 'Choose the trap’s condition' })
});
export type LastResult = z.infer<typeof lastResultSchema>;

export const assetSnapshotSchema = z.object({
	id: uuidSchema,
	siteId: uuidSchema,
	kind: z.literal('trap'),
	tag: z.string().min(1).max(64),
	location: z.string().nullable(),
	areaId: uuidSchema.nullable(),
	headerId: uuidSchema.nullable(),
	details: trapAssetDetailsSchema.nullable(),
	lastResult: lastResultSchema.nullable()
});
export type AssetSnapshot = z.infer<typeof assetSnapshotSchema>;

/** A finding as the server holds it: the capture plus what the device may read but not set. */
export const findingSnapshotSchema = z.object({
	capture: findingCaptureSchema,
	/** Server version: the base version of the device's next edit. */
	version: z.number().int().positive(),
	status: receivedStatusSchema
});
export type FindingSnapshot = z.infer<typeof findingSnapshotSchema>;

export const siteHeaderSchema = headerSchema.extend({ sortOrder: z.number().int() });
export type SiteHeader = z.infer<typeof siteHeaderSchema>;

export const surveySnapshotSchema = z.object({
	/** Server change cursor the snapshot was taken at; sync pulls from here. */
	cursor: z.number().int().nonnegative(),
	takenAt: isoDateTime('Taken at'),
	/** The unit system the person reads (their own choice, else the firm's default). */
	unitSystem: z.enum(unitSystems, { error: 'Choose SI or US units' }),
	survey: surveySummarySchema,
	site: z.object({
		id: uuidSchema,
		name: z.string(),
		address: z.string().nullable(),
		elevation: z.number().nullable(),
		clientName: z.string()
	}),
	/** null until the consultant sets it: the Walk records, but prices nothing. */
	costBasis: costBasisSchema.nullable(),
	headers: z.array(siteHeaderSchema),
	areas: z.array(areaSchema),
	assets: z.array(assetSnapshotSchema),
	findings: z.array(findingSnapshotSchema)
});
export type SurveySnapshot = z.infer<typeof surveySnapshotSchema>;

/** `GET /api/me`: who is signed in, for a shell that has no server-rendered data. */
export const walkPersonSchema = z.object({
	id: uuidSchema,
	name: z.string(),
	email: z.string(),
	role: z.enum(['admin', 'consultant', 'auditor', 'client'], { error: 'Choose a role' }),
	unitSystem: z.enum(unitSystems, { error: 'Choose SI or US units' })
});
export type WalkPerson = z.infer<typeof walkPersonSchema>;
