/**
 * Two tenants to test authorization against: the two demo firms, each with extra fixtures the
 * matrix needs (a second client company with a published survey, a published survey for the
 * demo client, a person to change, an open invitation, a message in the mailbox). Ids are
 * fixed so a rerun resets the same rows; names are invented test data.
 */
import { randomBytes } from 'node:crypto';
import MailComposer from 'nodemailer/lib/mail-composer';
import { FIRM_HEADER, saveMessage } from '../../../src/lib/server/mail/mailbox';
import {
	demoClients,
	demoFirms,
	demoSites,
	demoSurveys,
	demoUsers,
	type DemoUser
} from '../../../src/lib/server/seed/demo';
import { demoPublishedSurvey } from '../../../src/lib/server/seed/findings';
import type { Db } from './db';
import { e2eMail } from './servers';

export interface Tenant {
	index: 0 | 1;
	firmId: string;
	firmName: string;
	users: DemoUser[];
	clientId: string;
	otherClientId: string;
	/** The demo site of the demo client (the field survey's site). */
	siteId: string;
	/** The demo survey in the field (the tenant's auditor is assigned to it). */
	surveyId: string;
	/** A published survey of the demo site, so the demo client's users may see it. */
	clientSurveyId: string;
	targetUserId: string;
	/** A finding on the brewhouse survey, and a device's deletion of it kept as a conflict. */
	findingId: string;
	conflictId: string;
	/** The survey they are on. */
	findingSurveyId: string;
	/** A measure grouping that finding (the brewhouse survey is published: it is frozen). */
	measureId: string;
	/**
	 * A published survey of the demo client's site with revision 1 frozen: a finding and a
	 * measure the demo client's users may open and decide on (docs/decisions.md).
	 */
	decisionSurveyId: string;
	decisionFindingId: string;
	decisionMeasureId: string;
	invitationId: string;
	messageId: string;
	/** Text that may appear only in answers to this firm's people. */
	markers: string[];
	/** Text of this firm a client user of the demo client must not see either. */
	hiddenFromClient: string[];
	/** Text of this firm its auditor (assigned to the demo survey only) must not see. */
	hiddenFromAuditor: string[];
}

const hex = (firm: number, kind: number) =>
	`a7a7${String(kind).padStart(4, '0')}-0000-4000-8000-${String(firm + 1).padStart(12, '0')}`;

export async function prepareTenants(db: Db): Promise<[Tenant, Tenant]> {
	const out: Tenant[] = [];
	for (const index of [0, 1] as const) out.push(await prepare(db, index));
	return out as [Tenant, Tenant];
}

async function prepare(db: Db, index: 0 | 1): Promise<Tenant> {
	const firm = demoFirms[index];
	const client = demoClients[index];
	const site = demoSites[index];
	const survey = demoSurveys[index];
	const published = [demoPublishedSurvey].filter((p) => p.firmId === firm.id);
	const tag = index === 0 ? 'Alphatest' : 'Betatest';
	const ids = {
		otherClient: hex(index, 1),
		otherSite: hex(index, 2),
		otherSurvey: hex(index, 3),
		clientSurvey: hex(index, 4),
		target: hex(index, 5),
		invitation: hex(index, 6),
		finding: hex(index, 7),
		conflict: hex(index, 8),
		conflictMutation: hex(index, 9),
		measure: hex(index, 10),
		decisionSurvey: hex(index, 11),
		decisionFinding: hex(index, 12),
		decisionMeasure: hex(index, 13),
		decisionRevision: hex(index, 14)
	};
	const names = {
		otherClient: `${tag} Matrix Brewery`,
		otherSite: `${tag} Matrix Brewhouse`,
		otherSurvey: `${tag} brewhouse survey (published)`,
		clientSurvey: `${tag} creamery follow-up (published)`,
		decisionSurvey: `${tag} creamery decisions (published)`,
		decisionFinding: `${tag} matrix ladder valve`,
		decisionMeasure: `${tag} matrix ladder job`,
		target: `${tag} Matrix Target`,
		targetEmail: `matrix.target@${tag.toLowerCase()}.example`,
		invitationEmail: `matrix.invitee@${tag.toLowerCase()}.example`
	};

	await db.query(
		`INSERT INTO client_companies (id, firm_id, name) VALUES (?, ?, ?)
		 ON DUPLICATE KEY UPDATE name = VALUES(name)`,
		[ids.otherClient, firm.id, names.otherClient]
	);
	await db.query(
		`INSERT INTO sites (id, firm_id, client_company_id, name) VALUES (?, ?, ?, ?)
		 ON DUPLICATE KEY UPDATE name = VALUES(name)`,
		[ids.otherSite, firm.id, ids.otherClient, names.otherSite]
	);
	for (const [id, siteId, name] of [
		[ids.otherSurvey, ids.otherSite, names.otherSurvey],
		[ids.clientSurvey, site.id, names.clientSurvey]
	]) {
		await db.query(
			`INSERT INTO surveys (id, firm_id, site_id, name, status, published_at)
			 VALUES (?, ?, ?, ?, 'published', NOW(3))
			 ON DUPLICATE KEY UPDATE name = VALUES(name), published_at = NOW(3)`,
			[id, firm.id, siteId, name]
		);
	}
	await db.query(
		`INSERT INTO users (id, firm_id, email, name, role) VALUES (?, ?, ?, ?, 'auditor')
		 ON DUPLICATE KEY UPDATE role = 'auditor', client_company_id = NULL, disabled_at = NULL`,
		[ids.target, firm.id, names.targetEmail, names.target]
	);
	await db.query(
		`INSERT INTO tokens (id, firm_id, purpose, token_hash, email, role, expires_at)
		 VALUES (?, ?, 'invite', ?, ?, 'auditor', NOW(3) + INTERVAL 1 DAY)
		 ON DUPLICATE KEY UPDATE revoked = 0, used_at = NULL, expires_at = NOW(3) + INTERVAL 1 DAY`,
		[ids.invitation, firm.id, randomBytes(32).toString('hex'), names.invitationEmail]
	);
	// On the brewhouse survey (published, of the other client), so no page or count of the
	// demo survey or the demo client changes: a bare tank wall with its own temperature.
	await db.query(
		`INSERT INTO findings (id, survey_id, kind, location, notes, inputs, photo_ids)
		 VALUES (?, ?, 'insulation', ?, '', ?, '[]')
		 ON DUPLICATE KEY UPDATE deleted_at = NULL`,
		[
			ids.finding,
			ids.otherSurvey,
			`${tag} matrix tank wall`,
			JSON.stringify({
				item: 'surface',
				area: 2,
				height: 1.5,
				processTemperature: 400,
				ambientTemperature: 293.15,
				windSpeed: 0,
				layers: [{ thickness: 0.05, material: 'mineral-wool' }],
				jacketEmissivity: 0.1,
				bareEmissivity: 0.9
			})
		]
	);
	await db.query(
		`INSERT INTO measures (id, survey_id, name) VALUES (?, ?, ?)
		 ON DUPLICATE KEY UPDATE deleted_at = NULL`,
		[ids.measure, ids.otherSurvey, `${tag} matrix measure`]
	);
	await db.query('UPDATE findings SET measure_id = ? WHERE id = ?', [ids.measure, ids.finding]);
	await publishedForDecisions(db, firm.id, site.id, ids, names);
	const auditor = demoUsers.find((u) => u.firmId === firm.id && u.role === 'auditor')!;
	await db.query(
		`INSERT INTO finding_conflicts (id, firm_id, survey_id, finding_id, user_id, device_id,
		   mutation_id, base_version, server_version, data)
		 VALUES (?, ?, ?, ?, ?, ?, ?, 0, 1, NULL)
		 ON DUPLICATE KEY UPDATE survey_id = VALUES(survey_id), resolved_at = NULL, resolved_by = NULL,
		   resolution_kind = NULL`,
		[
			ids.conflict,
			firm.id,
			ids.otherSurvey,
			ids.finding,
			auditor.id,
			ids.conflictMutation,
			ids.conflictMutation
		]
	);
	const raw: Buffer = await new MailComposer({
		from: 'Steamwisp <no-reply@steamwisp.invalid>',
		to: names.invitationEmail,
		subject: `${tag} matrix message`,
		text: `A message for ${firm.name} only.`,
		headers: { [FIRM_HEADER]: firm.id }
	})
		.compile()
		.build();
	const message = await saveMessage(e2eMail.STEAMWISP_MAILBOX_DIR, raw, {
		mailFrom: 'no-reply@steamwisp.invalid',
		rcptTo: [names.invitationEmail]
	});

	const users = demoUsers.filter((u) => u.firmId === firm.id);
	const hiddenFromAuditor = [
		names.decisionSurvey,
		names.otherClient,
		names.otherSite,
		names.otherSurvey,
		ids.otherSurvey
	];
	return {
		index,
		firmId: firm.id,
		firmName: firm.name,
		users,
		clientId: client.id,
		otherClientId: ids.otherClient,
		siteId: site.id,
		surveyId: survey.id,
		clientSurveyId: ids.clientSurvey,
		targetUserId: ids.target,
		findingId: ids.finding,
		conflictId: ids.conflict,
		findingSurveyId: ids.otherSurvey,
		measureId: ids.measure,
		decisionSurveyId: ids.decisionSurvey,
		decisionFindingId: ids.decisionFinding,
		decisionMeasureId: ids.decisionMeasure,
		invitationId: ids.invitation,
		messageId: message.id,
		markers: [
			firm.id,
			firm.name,
			client.name,
			client.id,
			site.name,
			site.id,
			survey.name,
			survey.id,
			...published.flatMap((p) => [p.name, p.id]),
			...users.flatMap((u) => [u.email, u.name, u.id]),
			...Object.values(ids),
			...Object.values(names),
			`${tag} matrix message`,
			message.id
		],
		hiddenFromClient: [
			names.otherClient,
			names.otherSite,
			names.otherSurvey,
			ids.otherSurvey,
			ids.otherClient,
			// The demo survey is still in the field: not published, so not the client's to see.
			survey.name,
			survey.id
		],
		hiddenFromAuditor
	};
}

/** When the decisions' survey was published (before the demo's spring survey, 4 May 2026). */
const DECISION_SURVEY_PUBLISHED = '2026-01-15 09:00:00.000';

/**
 * A survey of the demo site published as revision 1 (the survey row, one leak in one measure,
 * their frozen snapshot; figures invented test data) whose live finding and measure were
 * deleted since: the client still sees them in revision 1, and no live count of the demo site
 * (nor of its surveys' findings) includes them.
 */
async function publishedForDecisions(
	db: Db,
	firmId: string,
	siteId: string,
	ids: Record<
		'decisionSurvey' | 'decisionFinding' | 'decisionMeasure' | 'decisionRevision',
		string
	>,
	names: Record<'decisionSurvey' | 'decisionFinding' | 'decisionMeasure', string>
) {
	// Published before the seeded spring survey, so that survey stays the demo site's most
	// recent publication: the one the Ladder's list shows (docs/ladder.md).
	await db.query(
		`INSERT INTO surveys (id, firm_id, site_id, name, status, published_at)
		 VALUES (?, ?, ?, ?, 'published', '${DECISION_SURVEY_PUBLISHED}')
		 ON DUPLICATE KEY UPDATE name = VALUES(name), status = 'published',
		   published_at = '${DECISION_SURVEY_PUBLISHED}'`,
		[ids.decisionSurvey, firmId, siteId, names.decisionSurvey]
	);
	await db.query(
		`INSERT INTO measures (id, survey_id, name, deleted_at) VALUES (?, ?, ?, NOW(3))
		 ON DUPLICATE KEY UPDATE deleted_at = NOW(3)`,
		[ids.decisionMeasure, ids.decisionSurvey, names.decisionMeasure]
	);
	await db.query(
		`INSERT INTO findings (id, survey_id, kind, location, notes, inputs, photo_ids, status,
		   measure_id, cost_minor, repair_cost_minor, payback_years, deleted_at)
		 VALUES (?, ?, 'leak', ?, '', '{}', '[]', 'reviewed', ?, 120000, 30000, 0.25, NOW(3))
		 ON DUPLICATE KEY UPDATE deleted_at = NOW(3)`,
		[ids.decisionFinding, ids.decisionSurvey, names.decisionFinding, ids.decisionMeasure]
	);
	const totals = {
		count: 1,
		steamKgH: 2,
		heatKw: 1.4,
		fuelGjYear: 40,
		costMinor: 120000,
		co2KgYear: 2200,
		waterM3Year: 14,
		repairCostMinor: 30000,
		withoutRepairCost: 0,
		extraCostMinor: 0,
		investmentMinor: 30000,
		paybackYears: 0.25,
		currency: 'EUR',
		outOfDate: 0,
		withoutFigures: 0
	};
	await db.query(
		`INSERT INTO survey_revisions (id, survey_id, number, published_at, totals, finding_count)
		 VALUES (?, ?, 1, '${DECISION_SURVEY_PUBLISHED}', ?, 1)
		 ON DUPLICATE KEY UPDATE totals = VALUES(totals)`,
		[ids.decisionRevision, ids.decisionSurvey, JSON.stringify(totals)]
	);
	await db.query(
		`INSERT IGNORE INTO survey_revision_findings (revision_id, finding_id, kind, status, location,
		   measure_id, figures_current, steam_kg_h, heat_kw, fuel_gj, cost_minor, co2_kg, water_m3,
		   repair_cost_minor, payback_years, finding_version)
		 VALUES (?, ?, 'leak', 'reviewed', ?, ?, 1, 2, 1.4, 40, 120000, 2200, 14, 30000, 0.25, 1)`,
		[ids.decisionRevision, ids.decisionFinding, names.decisionFinding, ids.decisionMeasure]
	);
	await db.query(
		`INSERT IGNORE INTO survey_revision_measures (revision_id, measure_id, name, access_cost_minor,
		   scaffold_cost_minor, shutdown_cost_minor, other_cost_minor, sort_order, created_at)
		 VALUES (?, ?, ?, 0, 0, 0, 0, 0, NOW(3))`,
		[ids.decisionRevision, ids.decisionMeasure, names.decisionMeasure]
	);
}
