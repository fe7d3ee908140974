import {
	double,
	index,
	int,
	json,
	mysqlTable,
	text,
	uniqueIndex,
	varchar
} from 'drizzle-orm/mysql-core';
import { at, changeSeq, createdAt, id, updatedAt, uuid, version, word } from './columns';
import { clientCompanies, firms } from './tenancy';

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
		elevation: double('elevation_m'),
		/**
		 * The site's cost basis: fuel, price, boiler efficiency, feedwater temperature,
		 * condensate return, water and treatment cost, operating hours, emission factor,
		 * currency, atmospheric pressure. Shape and units: $lib/schemas/site (costBasisSchema);
		 * prices inside are decimal strings, never floats.
		 */
		costBasis: json('cost_basis').$type<Record<string, unknown>>(),
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
