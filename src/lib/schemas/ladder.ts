/**
 * The Ladder's query string (`/ladder`, docs/ladder.md): the order, the filters by site, area and
 * kind, the page, and — for the firm's own people previewing it — which client company. Empty
 * values mean "not set", as a GET form sends them.
 */
import { z } from 'zod';
import { uuidSchema } from './common';
import { FINDING_KINDS } from './finding-vocabulary';
import { readQueryString } from './query-string';
import { SAVINGS_RANKS } from './savings';

const optionalId = (what: string) =>
	z
		.string()
		.optional()
		.transform((v, ctx) => {
			if (v === undefined || v.trim() === '') return null;
			if (!uuidSchema.safeParse(v.trim()).success) {
				ctx.addIssue({ code: 'custom', message: `${what} must be one of the list's choices` });
				return z.NEVER;
			}
			return v.trim();
		});

export const ladderQuerySchema = z.strictObject(
	{
		rank: z
			.enum(SAVINGS_RANKS, { error: `rank must be one of: ${SAVINGS_RANKS.join(', ')}` })
			.default('savings'),
		site: optionalId('site'),
		area: optionalId('area'),
		kind: z
			.union([z.enum(FINDING_KINDS), z.literal('')], {
				error: `kind must be one of: ${FINDING_KINDS.join(', ')}`
			})
			.optional()
			.transform((v) => (v === undefined || v === '' ? null : v)),
		page: z
			.string()
			.optional()
			.transform((v, ctx) => {
				if (v === undefined || v.trim() === '') return 1;
				if (!/^\d{1,6}$/.test(v.trim()) || Number(v) < 1) {
					ctx.addIssue({ code: 'custom', message: 'page must be a whole number from 1' });
					return z.NEVER;
				}
				return Number(v);
			}),
		company: optionalId('company')
	},
	{
		error: (issue) =>
			issue.code === 'unrecognized_keys'
				? `Unknown parameter ${issue.keys.join(', ')}: the Ladder takes rank, site, area, kind, page and company`
				: undefined
	}
);
export type LadderQuery = z.output<typeof ladderQuerySchema>;

export const readLadderQuery = (params: URLSearchParams) =>
	readQueryString(params, ladderQuerySchema);
