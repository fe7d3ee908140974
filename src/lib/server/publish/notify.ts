/**
 * "A report is ready": the e-mail to every active user of the survey's client company after a
 * publication, with an absolute link to the Ladder's page of the survey (the configured public
 * URL, never a caller's Host header: mail/config.ts linkOrigin). Sent after the publication
 * committed; each message on its own, so one address that fails does not stop the others, and
 * a failure is counted on the revision (mail_sent, mail_failed) — never undoing anything.
 */
import { and, asc, eq, isNull } from 'drizzle-orm';
import { clientCompanies, firms, sites, surveyRevisions, surveys, users } from '../db/schema';
import type { Db, Executor } from '../db/types';
import { mailOn, sendMail } from '../mail/send';
import { render, type RenderedMessage } from '../mail/templates/render';

export interface Recipient {
	id: string;
	email: string;
	name: string;
}

/** What became of the e-mail: how many were told, how many failed, or that mail is off. */
export interface Notified {
	recipients: number;
	sent: number;
	failed: number;
	/** This server sends no mail at all (no SMTP configured, no development mailbox). */
	off: boolean;
}

/** Active client users of the client company that owns the survey's site, of the same firm. */
export async function clientRecipients(
	db: Executor,
	firmId: string,
	surveyId: string
): Promise<Recipient[]> {
	return db
		.select({ id: users.id, email: users.email, name: users.name })
		.from(surveys)
		.innerJoin(sites, eq(sites.id, surveys.siteId))
		.innerJoin(
			users,
			and(
				eq(users.clientCompanyId, sites.clientCompanyId),
				eq(users.firmId, surveys.firmId),
				eq(users.role, 'client'),
				isNull(users.disabledAt)
			)
		)
		.where(and(eq(surveys.id, surveyId), eq(surveys.firmId, firmId)))
		.orderBy(asc(users.email));
}

export function reportReadyMessage(m: {
	name: string;
	firmName: string;
	clientName: string;
	surveyName: string;
	revision: number;
	note: string | null;
	url: string;
}): RenderedMessage {
	const correction = m.revision > 1;
	return render({
		subject: correction
			? `Revision ${m.revision} of your steam survey report is ready: ${m.surveyName}`
			: `Your steam survey report is ready: ${m.surveyName}`,
		greeting: `Hello ${m.name},`,
		paragraphs: [
			correction
				? `${m.firmName} has published revision ${m.revision} of the report on “${m.surveyName}” for ${m.clientName}.`
				: `${m.firmName} has published the report on “${m.surveyName}” for ${m.clientName}: the findings ranked by what repairing them saves each year, with their repair costs.`,
			...(correction && m.note ? [`What changed: ${m.note}`] : []),
			'Open it in Ladder with the link below (sign in first if you are asked to).'
		],
		action: { label: 'Open the report', url: m.url },
		after: [
			'The figures stay as published; if your consultant corrects anything, you will get a new revision and a message like this one.'
		]
	});
}

/** Tells the client's users about a revision; records the counts on it. */
export async function notifyClient(
	db: Db,
	p: {
		firmId: string;
		surveyId: string;
		revisionId: string;
		revision: number;
		/** Where links point; null: this server has no public URL configured (nothing is sent). */
		origin: string | null;
	}
): Promise<Notified> {
	const people = await clientRecipients(db, p.firmId, p.surveyId);
	if (!mailOn()) return { recipients: people.length, sent: 0, failed: 0, off: true };
	const [facts] = await db
		.select({
			surveyName: surveys.name,
			clientName: clientCompanies.name,
			firmName: firms.name,
			note: surveyRevisions.note
		})
		.from(surveys)
		.innerJoin(sites, eq(sites.id, surveys.siteId))
		.innerJoin(clientCompanies, eq(clientCompanies.id, sites.clientCompanyId))
		.innerJoin(firms, eq(firms.id, surveys.firmId))
		.innerJoin(surveyRevisions, eq(surveyRevisions.id, p.revisionId))
		.where(eq(surveys.id, p.surveyId));
	let sent = 0;
	let failed = 0;
	if (p.origin === null) {
		failed = people.length;
		console.error('steamwisp: no report-ready e-mail sent: set STEAMWISP_PUBLIC_URL (or ORIGIN)');
	}
	const url = `${p.origin}/ladder/surveys/${p.surveyId}`;
	for (const person of p.origin === null ? [] : people) {
		try {
			await sendMail({
				to: person.email,
				firmId: p.firmId,
				message: reportReadyMessage({ ...facts, name: person.name, revision: p.revision, url })
			});
			sent++;
		} catch (e) {
			failed++;
			console.error(
				`steamwisp: could not tell ${person.email} about revision ${p.revision} of survey ${p.surveyId}: ${(e as Error).message}`
			);
		}
	}
	await db
		.update(surveyRevisions)
		.set({ mailSent: sent, mailFailed: failed })
		.where(eq(surveyRevisions.id, p.revisionId));
	return { recipients: people.length, sent, failed, off: false };
}
