import {
	char,
	double,
	index,
	int,
	json,
	mysqlTable,
	text,
	uniqueIndex,
	varchar
} from 'drizzle-orm/mysql-core';
import type { CostBasis } from '../../../schemas/site';
import { at, changeSeq, createdAt, id, updatedAt, uuid, version, word } from './columns';
import { clientCompanies, firms, users } from './tenancy';

/** A plant (or one part of it) of a client company. */
export const sites = mysqlTable(
	'sites',
	{
		id: id(),
		firmId: uuid('firm_id')
			.notNull()
			.references(() => firms.id),
		clientCompanyId: uuid('client_company_id')
			.notNull()
			.references(() => clientCompanies.id),
		name: varchar('name', { length: 160 }).notNull(),
		address: text('address'),
		/** m above sea level; gives the atmosphere for gauge readings when none is measured. */
		elevation: double('elevation_m'),
		/** Measured atmospheric pressure, MPa absolute; wins over elevation. */
		atmosphericPressure: double('atmospheric_pressure_mpa'),
		/** SI | US: the units the site's figures are entered and shown in. */
		unitSystem: char('unit_system', { length: 2 }).notNull().default('SI'),
		/** ISO 4217: the currency of the site's current cost basis (and of its figures). */
		currency: char('currency', { length: 3 }).notNull().default('EUR'),
		/** The site's current cost basis (a row of cost_bases); null until one is saved. */
		costBasisId: uuid('cost_basis_id'),
		version: version(),
		changeSeq: changeSeq(),
		createdAt: createdAt(),
		updatedAt: updatedAt()
	},
	(t) => [
		index('sites_firm_idx').on(t.firmId),
		index('sites_client_idx').on(t.clientCompanyId),
		index('sites_change_idx').on(t.firmId, t.changeSeq)
	]
);

/**
 * Every cost basis a site has had, numbered from 1: saving a new one never changes an old one,
 * so a published survey keeps the basis it was priced on and every figure names the basis that
 * priced it. `basis` is costBasisSchema's shape ($lib/schemas/site; prices as decimal strings)
 * without the site's own atmosphere, which lives on the site.
 */
export const costBases = mysqlTable(
	'cost_bases',
	{
		id: id(),
		siteId: uuid('site_id')
			.notNull()
			.references(() => sites.id),
		number: int('number').notNull(),
		basis: json('basis').$type<CostBasis>().notNull(),
		/** Why it changed, in the consultant's words. */
		note: varchar('note', { length: 255 }),
		createdBy: uuid('created_by').references(() => users.id),
		createdAt: createdAt()
	},
	(t) => [uniqueIndex('cost_bases_site_number_uq').on(t.siteId, t.number)]
);

/** The site's steam pressure levels; findings pick one instead of typing a pressure. */
export const headers = mysqlTable(
	'headers',
	{
		id: id(),
		siteId: uuid('site_id')
			.notNull()
			.references(() => sites.id),
		name: varchar('name', { length: 80 }).notNull(),
		/** Engine base units: MPa absolute. */
		pressure: double('pressure_mpa').notNull(),
		/** Engine base units: K; set for superheated headers. */
		designTemperature: double('design_temperature_k'),
		/** Hours per year the header is live where it differs from the site's; null: the site's. */
		operatingHours: double('operating_hours'),
		sortOrder: int('sort_order').notNull().default(0),
		retiredAt: at('retired_at'),
		version: version(),
		changeSeq: changeSeq(),
		createdAt: createdAt(),
		updatedAt: updatedAt()
	},
	(t) => [index('headers_site_idx').on(t.siteId)]
);

/**
 * The plant's own names for where things are (boiler house, evaporator hall…): findings and
 * assets point at one, so the Walk can go area by area and the Desk can group by them.
 */
export const areas = mysqlTable(
	'areas',
	{
		id: id(),
		siteId: uuid('site_id')
			.notNull()
			.references(() => sites.id),
		name: varchar('name', { length: 120 }).notNull(),
		sortOrder: int('sort_order').notNull().default(0),
		retiredAt: at('retired_at'),
		version: version(),
		changeSeq: changeSeq(),
		createdAt: createdAt(),
		updatedAt: updatedAt()
	},
	(t) => [uniqueIndex('areas_site_name_uq').on(t.siteId, t.name)]
);

/**
 * Equipment that outlives one survey: a steam trap keeps its tag from survey to survey, so
 * a later survey can confirm a repair (the "verified" step of a finding's lifecycle).
 */
export const assets = mysqlTable(
	'assets',
	{
		id: id(),
		siteId: uuid('site_id')
			.notNull()
			.references(() => sites.id),
		/** trap (other kinds may follow). */
		kind: word('kind').notNull().default('trap'),
		tag: varchar('tag', { length: 64 }).notNull(),
		location: varchar('location', { length: 255 }),
		headerId: uuid('header_id').references(() => headers.id),
		areaId: uuid('area_id').references(() => areas.id),
		/** Kind-specific description (trap type, size, connection) per $lib/schemas. */
		details: json('details').$type<Record<string, unknown>>(),
		retiredAt: at('retired_at'),
		version: version(),
		changeSeq: changeSeq(),
		createdAt: createdAt(),
		updatedAt: updatedAt()
	},
	(t) => [uniqueIndex('assets_site_tag_uq').on(t.siteId, t.tag)]
);

export type AssetRow = typeof assets.$inferSelect;
export type CostBasisRow = typeof costBases.$inferSelect;
