/**
 * The Desk's review table: the query string of `GET /api/surveys/[id]/findings` (docs/desk.md,
 * "Review table") and the bulk review form. The page keeps the same query string in its own
 * address, so a view can be shared and a reload restores it.
 */
import { z } from 'zod';
import { uuidSchema } from './common';
import {
	FINDING_KINDS,
	FINDING_STATUSES,
	LEAK_SIZE_CLASSES,
	TRAP_CONDITIONS
} from './finding-vocabulary';

/** Columns the table sorts by (each a typed column, or a join's name). */
export const FINDING_SORT_KEYS = [
	'recorded',
	'kind',
	'area',
	'header',
	'location',
	'tag',
	'condition',
	'steam',
	'heat',
	'energy',
	'cost',
	'co2',
	'water',
	'repair',
	'payback',
	'status'
] as const;
export type FindingSortKey = (typeof FINDING_SORT_KEYS)[number];

/** Keys whose first click sorts biggest first (figures); the others start A to Z / oldest. */
export const FIGURE_SORT_KEYS: readonly FindingSortKey[] = [
	'steam',
	'heat',
	'energy',
	'cost',
	'co2',
	'water',
	'repair',
	'payback'
];
export const defaultDir = (key: FindingSortKey): 'asc' | 'desc' =>
	FIGURE_SORT_KEYS.includes(key) ? 'desc' : 'asc';

/** A trap's condition or a leak's size class (what `findings.condition` holds). */
export const FINDING_CONDITIONS = [...TRAP_CONDITIONS, ...LEAK_SIZE_CLASSES] as const;

/**
 * Stages to filter by: a lifecycle status, or `unreviewed` / `desk-checked` (whether a
 * consultant has marked it checked, `reviewed_at`, whatever its status).
 */
export const FINDING_STAGES = [...FINDING_STATUSES, 'unreviewed', 'desk-checked'] as const;
export type FindingStage = (typeof FINDING_STAGES)[number];

/** `none` in area/header filters: findings without one. */
export const NO_PLACE = 'none';

/** Query parameters that may repeat (multi-select filters); the rest may appear once. */
export const FINDING_LIST_PARAMS = ['kind', 'area', 'header', 'condition', 'stage'] as const;
export const FINDING_SINGLE_PARAMS = ['sort', 'dir', 'q', 'page', 'size'] as const;

export const MAX_PAGE_SIZE = 200;
export const DEFAULT_PAGE_SIZE = 50;
export const MAX_SEARCH = 100;

const words = (list: readonly string[]) => list.join(', ');
const oneOf = <const T extends readonly [string, ...string[]]>(values: T, what: string) =>
	z.enum(values, { error: `${what} must be one of: ${words(values)}` });
const placeId = (what: string) =>
	z.string().refine((v) => v === NO_PLACE || uuidSchema.safeParse(v).success, {
		error: `Each ${what} must be an id from the survey’s ${what}s, or "none"`
	});
const wholeNumber = (what: string, min: number, max: number, fallback: number) =>
	z
		.string()
		.optional()
		.transform((v, ctx) => {
			if (v === undefined || v.trim() === '') return fallback;
			const n = Number(v);
			if (!/^\d+$/.test(v.trim()) || n < min || n > max) {
				ctx.addIssue({
					code: 'custom',
					message: `${what} must be a whole number from ${min} to ${max.toLocaleString('en-GB')}`
				});
				return z.NEVER;
			}
			return n;
		});

export const findingsQuerySchema = z
	.strictObject(
		{
			sort: oneOf(FINDING_SORT_KEYS, 'sort').optional(),
			dir: oneOf(['asc', 'desc'], 'dir').optional(),
			kind: z.array(oneOf(FINDING_KINDS, 'kind')).default([]),
			area: z.array(placeId('area')).default([]),
			header: z.array(placeId('header')).default([]),
			condition: z.array(oneOf(FINDING_CONDITIONS, 'condition')).default([]),
			stage: z.array(oneOf(FINDING_STAGES, 'stage')).default([]),
			q: z
				.string()
				.trim()
				.max(MAX_SEARCH, { error: `Search for at most ${MAX_SEARCH} characters` })
				.default(''),
			page: wholeNumber('page', 1, 1_000_000, 1),
			size: wholeNumber('size', 1, MAX_PAGE_SIZE, DEFAULT_PAGE_SIZE)
		},
		{
			error: (issue) =>
				issue.code === 'unrecognized_keys'
					? `Unknown parameter ${issue.keys.join(', ')}: use ${words([...FINDING_SINGLE_PARAMS, ...FINDING_LIST_PARAMS])}`
					: undefined
		}
	)
	.transform((v) => {
		const sort = v.sort ?? 'recorded';
		return { ...v, sort, dir: v.dir ?? defaultDir(sort) };
	});
export type FindingsQuery = z.output<typeof findingsQuerySchema>;

/**
 * The query string as the schema reads it: list parameters as arrays, single ones as strings;
 * a single parameter given twice is refused (which one was meant?).
 */
export function readFindingsQuery(
	params: URLSearchParams
): { ok: true; query: FindingsQuery } | { ok: false; message: string } {
	const raw: Record<string, string | string[]> = {};
	for (const name of new Set(params.keys())) {
		const values = params.getAll(name);
		if ((FINDING_LIST_PARAMS as readonly string[]).includes(name)) raw[name] = values;
		else if (values.length > 1) return { ok: false, message: `Give ${name} only once.` };
		else raw[name] = values[0];
	}
	const parsed = findingsQuerySchema.safeParse(raw);
	if (parsed.success) return { ok: true, query: parsed.data };
	return { ok: false, message: parsed.error.issues[0]?.message ?? 'Check the query.' };
}

/** The query string of a view, parameters at their defaults left out (short shareable links). */
export function findingsQueryString(q: FindingsQuery): string {
	const p = new URLSearchParams();
	if (q.sort !== 'recorded') p.set('sort', q.sort);
	if (q.dir !== defaultDir(q.sort)) p.set('dir', q.dir);
	for (const name of FINDING_LIST_PARAMS) for (const v of q[name]) p.append(name, v);
	if (q.q) p.set('q', q.q);
	if (q.page !== 1) p.set('page', String(q.page));
	if (q.size !== DEFAULT_PAGE_SIZE) p.set('size', String(q.size));
	return p.toString();
}

/** The bulk review form: ticked findings, and whether they are marked checked or not. */
export const bulkReviewSchema = z.object({
	findingIds: z
		.array(uuidSchema.catch('invalid'), { error: 'Tick the findings to mark' })
		.min(1, { error: 'Tick at least one finding first.' })
		.max(MAX_PAGE_SIZE * 5, { error: 'Mark at most 1,000 findings at once.' })
		.refine((ids) => !ids.includes('invalid'), {
			error: 'One of the ticked findings is not a finding of this survey. Nothing was changed.'
		}),
	reviewed: z.enum(['yes', 'no'], { error: 'Choose to mark them checked or not checked' })
});
export type BulkReview = z.infer<typeof bulkReviewSchema>;
