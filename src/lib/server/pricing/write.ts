/**
 * Writing the figures of many findings at once: the batch goes into a temporary table on the
 * transaction's connection and one UPDATE … JOIN moves it into `findings`, so a site of 100,000
 * findings re-prices in a few dozen statements rather than 100,000. The row's version and
 * change feed position do not move: new figures are no edit to the finding (a device holding
 * it is not put into conflict by a re-price).
 */
import { sql } from 'drizzle-orm';
import { format } from 'mysql2';
import type { Tx } from '../db/types';
import type { FigureColumns, MoneyColumns } from './figures';

export type FigureRow = { id: string } & MoneyColumns & Partial<FigureColumns>;

/** Columns written, in order: [temp-table column, findings column, SQL type]. */
const MONEY: [keyof MoneyColumns, string, string][] = [
	['resultsEngine', 'results_engine', 'varchar(32)'],
	['pricedBasisId', 'priced_basis_id', 'varchar(36)'],
	['pricedAt', 'priced_at', 'datetime(3)'],
	['pricingNote', 'pricing_note', 'varchar(255)'],
	['steamLoss', 'steam_kg_h', 'double'],
	['heatLoss', 'heat_kw', 'double'],
	['fuelEnergy', 'fuel_gj', 'double'],
	['cost', 'cost_minor', 'bigint'],
	['co2', 'co2_kg', 'double'],
	['water', 'water_m3', 'double'],
	['paybackYears', 'payback_years', 'double']
];
const PHYSICS: [keyof FigureColumns, string, string][] = [
	['flows', 'flows', 'longtext'],
	['physics', 'physics', 'longtext'],
	['physicsEngine', 'physics_engine', 'varchar(32)']
];

/** Rows per INSERT: well under MariaDB's 65,535 placeholders at 15 columns. */
export const WRITE_BATCH = 2000;

type Cell = string | number | Date | null;

function value(row: FigureRow, key: keyof FigureColumns): Cell {
	const v = row[key];
	if (v === undefined || v === null) return null;
	if (key === 'flows' || key === 'physics') return JSON.stringify(v);
	return v as Cell;
}

/** Writes figures (and physics too when `withPhysics`) of up to WRITE_BATCH rows. */
export async function writeFigures(tx: Tx, rows: FigureRow[], withPhysics: boolean): Promise<void> {
	if (rows.length === 0) return;
	const columns = withPhysics ? [...MONEY, ...PHYSICS] : MONEY;
	const name = withPhysics ? 'figure_batch_full' : 'figure_batch_money';
	await tx.execute(
		sql.raw(
			`CREATE TEMPORARY TABLE IF NOT EXISTS ${name} (id varchar(36) PRIMARY KEY, ` +
				columns.map(([, col, type]) => `\`${col}\` ${type} NULL`).join(', ') +
				')'
		)
	);
	await tx.execute(sql.raw(`DELETE FROM ${name}`));
	const names = columns.map(([, col]) => `\`${col}\``).join(', ');
	const tuple = `(${['?', ...columns.map(() => '?')].join(', ')})`;
	for (let at = 0; at < rows.length; at += WRITE_BATCH) {
		const part = rows.slice(at, at + WRITE_BATCH);
		// Escaped by mysql2's own formatter: building tens of thousands of bound parameters
		// through Drizzle's sql template costs more than the whole UPDATE.
		const values = part
			// Times in UTC, as the app's pool writes them (MariaDB runs at +00:00).
			.map((row) => format(tuple, [row.id, ...columns.map(([key]) => value(row, key))], false, 'Z'))
			.join(', ');
		await tx.execute(sql.raw(`INSERT INTO ${name} (id, ${names}) VALUES ${values}`));
	}
	await tx.execute(
		sql.raw(
			`UPDATE findings f JOIN ${name} t ON t.id = f.id SET ` +
				columns.map(([, col]) => `f.\`${col}\` = t.\`${col}\``).join(', ')
		)
	);
}
