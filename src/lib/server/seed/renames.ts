/**
 * Names the first demo seed used that turned out to be real places, renamed to invented ones.
 * A database seeded before keeps its rows (the seed never overwrites edits), so each rename
 * applies only while the row still holds the old value: once, and never over a person's edit.
 */
import { sql } from 'drizzle-orm';
import type { Db } from '../db/types';
import { demoClients, demoSites, demoSurveys, demoUsers } from './demo';
import { demoPublishedSurvey } from './findings';

type Rename = [table: string, id: string, column: string, from: string, to: string];

const renames: Rename[] = [
	[
		'client_companies',
		demoClients[0].id,
		'name',
		'Millbeck Dairy Co-operative',
		demoClients[0].name
	],
	[
		'client_companies',
		demoClients[0].id,
		'contact_email',
		'engineering@millbeck-dairy.example',
		demoClients[0].contactEmail
	],
	['client_companies', demoClients[1].id, 'name', 'Orrin Valley Paper', demoClients[1].name],
	[
		'client_companies',
		demoClients[1].id,
		'contact_email',
		'plant@orrin-paper.example',
		demoClients[1].contactEmail
	],
	['users', demoUsers[3].id, 'email', 'plant.manager@millbeck-dairy.example', demoUsers[3].email],
	['users', demoUsers[7].id, 'email', 'mill.manager@orrin-paper.example', demoUsers[7].email],
	['sites', demoSites[0].id, 'name', 'Millbeck Creamery', demoSites[0].name],
	[
		'sites',
		demoSites[0].id,
		'address',
		'Creamery Lane 4, Millbeck (invented)',
		demoSites[0].address
	],
	['sites', demoSites[1].id, 'name', 'Orrin Valley No. 2 Mill', demoSites[1].name],
	[
		'sites',
		demoSites[1].id,
		'address',
		'River Road, Orrin Valley (invented)',
		demoSites[1].address
	],
	[
		'surveys',
		demoSurveys[0].id,
		'name',
		'Millbeck Creamery — winter steam survey',
		demoSurveys[0].name
	],
	[
		'surveys',
		demoPublishedSurvey.id,
		'name',
		'Millbeck Creamery — spring steam survey',
		demoPublishedSurvey.name
	]
];

export async function renameOldDemoPlaces(db: Db): Promise<void> {
	for (const [table, id, column, from, to] of renames) {
		await db.execute(
			sql`UPDATE ${sql.identifier(table)} SET ${sql.identifier(column)} = ${to}
			    WHERE id = ${id} AND ${sql.identifier(column)} = ${from}`
		);
	}
}
