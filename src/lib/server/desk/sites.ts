/**
 * Sites at the Desk: a client's sites, one site's page, adding and editing one. A site's
 * atmosphere (elevation or a measured pressure) moves the physics of every finding on it, so a
 * change of it recomputes the site after the commit; a change of currency while the site has a
 * cost basis is refused (prices would silently change meaning: a new basis in the new currency
 * sets it). Every change bumps the row's version and change_seq (devices learn of it) and writes
 * its audit row in the same transaction.
 */
import { and, asc, desc, eq, sql } from 'drizzle-orm';
import type { SiteForm } from '../../schemas/desk-sites';
import type { CostBasis } from '../../schemas/site';
import type { UnitSystemId } from '../../schemas/roles';
import { siteAtmosphere } from '../../steam/index';
import { recordChange } from '../audit';
import { db } from '../db';
import { clientCompanies, costBases, firms, sites, surveys } from '../db/schema';
import { siteScope, surveyScope } from '../policy';
import { costBasisHistory, saveCostBasis } from '../pricing/cost-basis';
import { recomputeSite } from '../pricing/refresh';
import { nextChangeSeq } from '../sync/counter';
import { unitSystemOf } from '../walk/person';

/** The units this person reads and types in (their own, else their firm's). */
export const personUnits = (user: SessionUser): Promise<UnitSystemId> => unitSystemOf(db, user.id);

/** The firm's default currency, for a new site. */
export async function firmCurrency(user: SessionUser): Promise<string> {
	const [row] = await db
		.select({ currency: firms.defaultCurrency })
		.from(firms)
		.where(eq(firms.id, user.firmId))
		.limit(1);
	return row?.currency ?? 'EUR';
}

/** A client's sites the person may see, by name. */
export function clientSites(user: SessionUser, clientId: string) {
	return db
		.select({
			id: sites.id,
			name: sites.name,
			address: sites.address,
			currency: sites.currency,
			unitSystem: sites.unitSystem
		})
		.from(sites)
		.where(and(siteScope(user), eq(sites.clientCompanyId, clientId)))
		.orderBy(asc(sites.name));
}

/** The site's facts for its page (the caller has passed requireSiteAccess). */
export async function siteDetail(user: SessionUser, siteId: string) {
	const [site] = await db
		.select({
			id: sites.id,
			name: sites.name,
			address: sites.address,
			elevation: sites.elevation,
			atmosphericPressure: sites.atmosphericPressure,
			unitSystem: sites.unitSystem,
			currency: sites.currency,
			costBasisId: sites.costBasisId,
			basisNumber: costBases.number,
			clientId: clientCompanies.id,
			clientName: clientCompanies.name
		})
		.from(sites)
		.innerJoin(clientCompanies, eq(clientCompanies.id, sites.clientCompanyId))
		.leftJoin(costBases, eq(costBases.id, sites.costBasisId))
		.where(and(eq(sites.id, siteId), siteScope(user)))
		.limit(1);
	const siteSurveys = await db
		.select({
			id: surveys.id,
			name: surveys.name,
			status: surveys.status,
			startsOn: surveys.startsOn,
			frozenBasisId: surveys.costBasisId
		})
		.from(surveys)
		.where(and(eq(surveys.siteId, siteId), surveyScope(user)))
		.orderBy(desc(surveys.startsOn), asc(surveys.name));
	return { site, surveys: siteSurveys };
}

/** The site's atmosphere, MPa absolute: measured, else from elevation, else standard. */
export async function siteAtmosphereOf(siteId: string): Promise<number> {
	const [row] = await db
		.select({ elevation: sites.elevation, atmosphericPressure: sites.atmosphericPressure })
		.from(sites)
		.where(eq(sites.id, siteId))
		.limit(1);
	return siteAtmosphere({
		...(row?.elevation == null ? {} : { elevation: row.elevation }),
		...(row?.atmosphericPressure == null ? {} : { atmosphericPressure: row.atmosphericPressure })
	}).value;
}

const columns = (form: SiteForm) => ({
	name: form.name,
	address: form.address,
	elevation: form.elevation ?? null,
	atmosphericPressure: form.atmosphericPressure ?? null,
	unitSystem: form.unitSystem,
	currency: form.currency
});

/** Adds a site to a client of the person's firm (the caller has checked the client). */
export async function addSite(user: SessionUser, clientId: string, form: SiteForm) {
	const id = crypto.randomUUID();
	const values = columns(form);
	await db.transaction(async (tx) => {
		const changeSeq = await nextChangeSeq(tx, user.firmId);
		await tx
			.insert(sites)
			.values({ id, firmId: user.firmId, clientCompanyId: clientId, ...values, changeSeq });
		await recordChange(tx, {
			firmId: user.firmId,
			actorId: user.id,
			entity: 'site',
			entityId: id,
			action: 'create',
			after: { clientCompanyId: clientId, ...values }
		});
	});
	return id;
}

export type SiteSave =
	| { kind: 'saved'; changed: boolean; recomputed: number | null }
	| { kind: 'currency-locked'; currency: string };

/**
 * Saves a site's details. `recomputed` is the number of findings whose figures were worked out
 * again because the atmosphere moved (null when it did not).
 */
export async function saveSite(
	user: SessionUser,
	siteId: string,
	form: SiteForm
): Promise<SiteSave> {
	const values = columns(form);
	const outcome = await db.transaction(async (tx) => {
		const where = and(eq(sites.id, siteId), eq(sites.firmId, user.firmId));
		const [before] = await tx
			.select({
				name: sites.name,
				address: sites.address,
				elevation: sites.elevation,
				atmosphericPressure: sites.atmosphericPressure,
				unitSystem: sites.unitSystem,
				currency: sites.currency,
				costBasisId: sites.costBasisId
			})
			.from(sites)
			.where(where)
			.for('update');
		if (!before) throw new Error('No such site in this firm');
		const { costBasisId, ...old } = before;
		if (costBasisId !== null && old.currency !== values.currency) {
			return { kind: 'currency-locked' as const, currency: old.currency };
		}
		if (JSON.stringify(old) === JSON.stringify(values)) {
			return { kind: 'saved' as const, changed: false, moved: false };
		}
		const changeSeq = await nextChangeSeq(tx, user.firmId);
		await tx
			.update(sites)
			.set({ ...values, version: sql`${sites.version} + 1`, changeSeq })
			.where(where);
		await recordChange(tx, {
			firmId: user.firmId,
			actorId: user.id,
			entity: 'site',
			entityId: siteId,
			action: 'update',
			before: old,
			after: values
		});
		const moved =
			old.elevation !== values.elevation || old.atmosphericPressure !== values.atmosphericPressure;
		return { kind: 'saved' as const, changed: true, moved };
	});
	if (outcome.kind === 'currency-locked') return outcome;
	// After the commit: the recompute reads the new atmosphere in its own batches.
	const recomputed = outcome.moved ? await recomputeSite(db, siteId) : null;
	return { kind: 'saved', changed: outcome.changed, recomputed };
}

/** The site's current basis (money side) and every version, newest first. */
export async function siteBasisPage(siteId: string) {
	const history = await costBasisHistory(db, siteId);
	return { current: history.find((v) => v.current) ?? null, history };
}

/** Saves a new basis version (saveCostBasis versions, audits and re-prices the site's figures). */
export function saveSiteBasis(
	user: SessionUser,
	siteId: string,
	form: { basis: CostBasis; note: string | null }
) {
	return saveCostBasis(db, {
		firmId: user.firmId,
		siteId,
		actorId: user.id,
		basis: form.basis,
		note: form.note
	});
}
