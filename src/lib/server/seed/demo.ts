/**
 * The demo scenario — invented from start to finish: an invented consulting firm, its invented
 * client (a dairy co-operative) and plant, and a second firm so tenancy can be seen and tested.
 * Ids are fixed so seeding twice changes nothing.
 */
import type { Role } from '../../schemas/roles';
import { atmosphericPressureAtElevation, toBase } from '../../units/index';

export const demoPassword = 'steam-demo-2026';

export const demoFirms = [
	{
		id: '5e7a0001-0000-4000-8000-000000000001',
		name: 'Cinderbrook Energy Partners',
		currency: 'EUR',
		units: 'SI'
	},
	{
		id: '5e7a0001-0000-4000-8000-000000000002',
		name: 'Northgale Steam Advisory',
		currency: 'USD',
		units: 'US'
	}
] as const;

export const demoClients = [
	{
		id: '5e7a0002-0000-4000-8000-000000000001',
		firmId: demoFirms[0].id,
		name: 'Larkspindle Dairy Co-operative',
		contactEmail: 'engineering@larkspindle-dairy.example'
	},
	{
		id: '5e7a0002-0000-4000-8000-000000000002',
		firmId: demoFirms[1].id,
		name: 'Tarnwhistle Paper Company',
		contactEmail: 'plant@tarnwhistle-paper.example'
	}
] as const;

export interface DemoUser {
	id: string;
	firmId: string;
	email: string;
	name: string;
	role: Role;
	clientCompanyId?: string;
}

export const demoUsers: DemoUser[] = [
	{
		id: '5e7a0003-0000-4000-8000-000000000001',
		firmId: demoFirms[0].id,
		email: 'admin@cinderbrook.example',
		name: 'Ines Okafor',
		role: 'admin'
	},
	{
		id: '5e7a0003-0000-4000-8000-000000000002',
		firmId: demoFirms[0].id,
		email: 'consultant@cinderbrook.example',
		name: 'Tomasz Lindqvist',
		role: 'consultant'
	},
	{
		id: '5e7a0003-0000-4000-8000-000000000003',
		firmId: demoFirms[0].id,
		email: 'auditor@cinderbrook.example',
		name: 'Priya Raman',
		role: 'auditor'
	},
	{
		id: '5e7a0003-0000-4000-8000-000000000004',
		firmId: demoFirms[0].id,
		email: 'plant.manager@larkspindle-dairy.example',
		name: 'Declan Fairweather',
		role: 'client',
		clientCompanyId: demoClients[0].id
	},
	{
		id: '5e7a0003-0000-4000-8000-000000000005',
		firmId: demoFirms[1].id,
		email: 'admin@northgale.example',
		name: 'Ruth Abernathy',
		role: 'admin'
	},
	{
		id: '5e7a0003-0000-4000-8000-000000000006',
		firmId: demoFirms[1].id,
		email: 'consultant@northgale.example',
		name: 'Kwame Osei',
		role: 'consultant'
	},
	{
		id: '5e7a0003-0000-4000-8000-000000000007',
		firmId: demoFirms[1].id,
		email: 'auditor@northgale.example',
		name: 'Lena Hartmann',
		role: 'auditor'
	},
	{
		id: '5e7a0003-0000-4000-8000-000000000008',
		firmId: demoFirms[1].id,
		email: 'mill.manager@tarnwhistle-paper.example',
		name: 'Sam Whitcombe',
		role: 'client',
		clientCompanyId: demoClients[1].id
	}
];

/** MPa absolute from a gauge reading in bar at a site's elevation. */
const barg = (bar: number, elevation: number) =>
	toBase('pressure', bar, 'bar_g', {
		atmosphericPressure: atmosphericPressureAtElevation(elevation)
	});

const creameryElevation = 85;
const millElevation = 240;

export const demoSites = [
	{
		id: '5e7a0004-0000-4000-8000-000000000001',
		firmId: demoFirms[0].id,
		clientCompanyId: demoClients[0].id,
		name: 'Larkspindle Creamery',
		address: 'Creamery Lane 4, Larkspindle (invented)',
		elevation: creameryElevation,
		headers: [
			{
				id: '5e7a0005-0000-4000-8000-000000000001',
				name: 'HP boiler header',
				pressure: barg(10, creameryElevation),
				sortOrder: 1
			},
			{
				id: '5e7a0005-0000-4000-8000-000000000002',
				name: 'Process (evaporators)',
				pressure: barg(7, creameryElevation),
				sortOrder: 2
			},
			{
				id: '5e7a0005-0000-4000-8000-000000000003',
				name: 'CIP and space heating',
				pressure: barg(3, creameryElevation),
				sortOrder: 3
			},
			{
				id: '5e7a0005-0000-4000-8000-000000000004',
				name: 'Flash steam (low pressure)',
				pressure: barg(0.7, creameryElevation),
				sortOrder: 4
			}
		]
	},
	{
		id: '5e7a0004-0000-4000-8000-000000000002',
		firmId: demoFirms[1].id,
		clientCompanyId: demoClients[1].id,
		name: 'Tarnwhistle No. 2 Mill',
		address: 'River Road, Tarnwhistle (invented)',
		elevation: millElevation,
		headers: [
			{
				id: '5e7a0005-0000-4000-8000-000000000011',
				name: 'Dryer section',
				pressure: barg(11, millElevation),
				sortOrder: 1
			},
			{
				id: '5e7a0005-0000-4000-8000-000000000012',
				name: 'Low-pressure',
				pressure: barg(3.5, millElevation),
				sortOrder: 2
			}
		]
	}
] as const;

export const demoSurveys = [
	{
		id: '5e7a0006-0000-4000-8000-000000000001',
		firmId: demoFirms[0].id,
		siteId: demoSites[0].id,
		name: 'Larkspindle Creamery — winter steam survey',
		startsOn: '2026-11-16',
		endsOn: '2026-11-20',
		status: 'in-field',
		auditorIds: ['5e7a0003-0000-4000-8000-000000000003']
	},
	{
		id: '5e7a0006-0000-4000-8000-000000000002',
		firmId: demoFirms[1].id,
		siteId: demoSites[1].id,
		name: 'No. 2 Mill — trap survey',
		startsOn: '2026-10-05',
		endsOn: '2026-10-07',
		status: 'in-field',
		auditorIds: ['5e7a0003-0000-4000-8000-000000000007']
	}
] as const;
