/**
 * The Ladder's data. Every list goes through the policy module's scopes, so a client sees only
 * their own company's published surveys and the firm's people their firm's.
 */
import { and, desc, eq, isNotNull } from 'drizzle-orm';
import { db } from './db';
import { sites, surveys } from './db/schema';
import { surveyScope } from './policy';
import { ladderSurvey } from './publish/revisions';
import type { LadderQuery } from '../schemas/ladder';
import { clientCompanies } from './db/schema';
import { companiesWithPublications, companySavings, type CompanySavings } from './savings/company';
import { cellText, paybackWords } from '../figures';
import type { UnitSystemId } from '../units';
import { unitSystemOf } from './walk/person';

/** Published surveys this person may see, newest publication first. */
export function publishedSurveys(user: SessionUser) {
	return db
		.select({
			id: surveys.id,
			name: surveys.name,
			site: sites.name,
			publishedAt: surveys.publishedAt
		})
		.from(surveys)
		.innerJoin(sites, eq(sites.id, surveys.siteId))
		.where(and(surveyScope(user), isNotNull(surveys.publishedAt)))
		.orderBy(desc(surveys.publishedAt));
}

/**
 * One survey as the Ladder shows it (the caller has checked read access): its last published
 * revision's frozen figures, biggest saving first, in the reader's unit system.
 */
export async function ladderSurveyPage(user: SessionUser, surveyId: string, limit = 100) {
	const [survey, unitSystem] = await Promise.all([
		ladderSurvey(surveyId, limit),
		unitSystemOf(db, user.id)
	]);
	return survey && { ...survey, unitSystem, limit };
}

/**
 * The Ladder's ranked list (docs/ladder.md): a client user's own company; the firm's admins and
 * consultants pick one of their client companies with a publication (`company`, the first by
 * name unless asked). Null for a client user without a company.
 */
export async function ladderPage(user: SessionUser, q: LadderQuery) {
	const [unitSystem, companies] = await Promise.all([
		unitSystemOf(db, user.id),
		user.role === 'client' ? Promise.resolve([]) : companiesWithPublications(db, user.firmId)
	]);
	let company: { id: string; name: string } | undefined;
	if (user.role === 'client') {
		if (!user.clientCompanyId) return null;
		[company] = await db
			.select({ id: clientCompanies.id, name: clientCompanies.name })
			.from(clientCompanies)
			.where(
				and(eq(clientCompanies.id, user.clientCompanyId), eq(clientCompanies.firmId, user.firmId))
			);
	} else {
		company = companies.find((c) => c.id === q.company) ?? companies[0];
	}
	const list = company
		? await companySavings(db, user.firmId, company, {
				rank: q.rank,
				site: q.site,
				area: q.area,
				kind: q.kind,
				page: q.page
			})
		: null;
	return { unitSystem, companies, list: list && slimList(list, unitSystem) };
}

/**
 * The list as the page draws it: each item's words and its money already in text (what the
 * page shows, no more — a page of fifty rows is sent to a phone with its data).
 */
function slimList(list: CompanySavings, system: UnitSystemId) {
	const { items, surveys: _all, ...rest } = list;
	return {
		...rest,
		items: items.map((i) => ({
			id: i.id,
			rank: i.rank,
			kindWords: i.kindWords,
			tag: i.tag,
			conditionWords: i.conditionWords,
			location: i.location,
			area: i.area,
			site: i.site,
			surveyId: i.surveyId,
			measureId: i.measureId,
			saving: cellText(i, 'cost', system),
			repair: i.repairCostMinor === null ? null : cellText(i, 'repair', system),
			payback: i.paybackYears === null ? null : paybackWords(i.paybackYears)
		})),
		surveyCount: _all.length
	};
}
