/**
 * The e-mail digest of new decisions and comments for the survey's consultants
 * (docs/decisions.md, "The digest"). Every decision and comment leaves a row in
 * decision_digest_outbox, in its own transaction; `sendDecisionDigests` — run on a timer by
 * the server process (./digest-timer.ts) and called by the tests — claims the unsent rows,
 * writes each recipient one message listing what happened since the last batch (never their
 * own doings), and marks the rows sent. A batch whose every message failed is released for the
 * next run; with mail off nothing is claimed, so nothing is lost before mail is set up.
 */
import { randomUUID } from 'node:crypto';
import { and, asc, eq, exists, inArray, isNull, lt, or, sql } from 'drizzle-orm';
import { DECISION_LABELS, decisionDetail, type Decision } from '../../schemas/decisions';
import {
	comments,
	decisionDigestOutbox as O,
	decisions,
	surveyAuditors,
	surveyRevisions,
	surveys,
	users
} from '../db/schema';
import type { Db, Executor } from '../db/types';
import { linkOrigin } from '../mail/config';
import { currentMailConfig, sendMail } from '../mail/send';
import { render, type RenderedMessage } from '../mail/templates/render';
import { itemWords } from './desk';

/** A claim older than this is taken to be of a run that died: its rows go out again. */
const STALE_CLAIM_MS = 15 * 60_000;
/** Rows one run takes at most (the rest wait for the next run). */
const BATCH_ROWS = 2000;
/** Items one message lists at most; the rest are counted, with the link to see them. */
const LISTED = 40;
const EXCERPT = 280;

export interface DigestOutcome {
	/** Mail is off on this server: nothing was claimed or sent. */
	off: boolean;
	events: number;
	sent: number;
	failed: number;
}

export interface Recipient {
	id: string;
	email: string;
	name: string;
}

/**
 * Who gets a survey's digest: the firm's active admins and consultants who work on it — made
 * it, published a revision of it, are assigned to it or commented on it; with none of those,
 * the firm's active admins.
 */
export async function digestRecipients(db: Executor, surveyId: string): Promise<Recipient[]> {
	const [survey] = await db
		.select({ firmId: surveys.firmId, createdBy: surveys.createdBy })
		.from(surveys)
		.where(eq(surveys.id, surveyId));
	if (!survey) return [];
	const staff = and(
		eq(users.firmId, survey.firmId),
		inArray(users.role, ['admin', 'consultant']),
		isNull(users.disabledAt)
	);
	const on = (table: typeof surveyRevisions | typeof surveyAuditors | typeof comments) => {
		const person =
			table === surveyRevisions
				? surveyRevisions.publishedBy
				: table === surveyAuditors
					? surveyAuditors.userId
					: comments.authorId;
		return exists(
			db
				.select({ one: sql`1` })
				.from(table)
				.where(and(eq(table.surveyId, surveyId), eq(person, users.id)))
		);
	};
	const columns = { id: users.id, email: users.email, name: users.name };
	const working = await db
		.select(columns)
		.from(users)
		.where(
			and(
				staff,
				or(
					survey.createdBy ? eq(users.id, survey.createdBy) : sql`FALSE`,
					on(surveyRevisions),
					on(surveyAuditors),
					on(comments)
				)
			)
		)
		.orderBy(asc(users.email));
	if (working.length > 0) return working;
	return db
		.select(columns)
		.from(users)
		.where(and(staff, eq(users.role, 'admin')))
		.orderBy(asc(users.email));
}

interface Event {
	surveyId: string;
	actorId: string | null;
	line: string;
}

const excerpt = (s: string) => (s.length > EXCERPT ? `${s.slice(0, EXCERPT - 1)}…` : s);

/** The claimed rows, each as one line of the digest: the item, what happened, who, a link. */
async function claimedEvents(db: Executor, claim: string, origin: string): Promise<Event[]> {
	const rows = await db
		.select({
			surveyId: O.surveyId,
			actorId: O.actorId,
			who: users.name,
			decision: decisions,
			comment: { body: comments.body, findingId: comments.findingId, measureId: comments.measureId }
		})
		.from(O)
		.leftJoin(decisions, eq(decisions.id, O.decisionId))
		.leftJoin(comments, eq(comments.id, O.commentId))
		.leftJoin(users, eq(users.id, O.actorId))
		.where(eq(O.claim, claim))
		.orderBy(asc(O.id));
	const decisionIds = rows.flatMap((r) => (r.decision ? [r.decision.id] : []));
	const notes = new Map(
		decisionIds.length === 0
			? []
			: (
					await db
						.select({ decisionId: comments.decisionId, body: comments.body })
						.from(comments)
						.where(inArray(comments.decisionId, decisionIds))
				).map((c) => [c.decisionId!, c.body])
	);
	const itemOf = (r: (typeof rows)[number]) =>
		r.decision
			? (r.decision.findingId ?? r.decision.measureId)
			: (r.comment?.findingId ?? r.comment?.measureId ?? null);
	const words = new Map<string, Awaited<ReturnType<typeof itemWords>>>();
	for (const surveyId of new Set(rows.map((r) => r.surveyId))) {
		const ids = rows.filter((r) => r.surveyId === surveyId).flatMap((r) => itemOf(r) ?? []);
		words.set(surveyId, await itemWords(db, surveyId, [...new Set(ids)]));
	}
	return rows.flatMap((r) => {
		const itemId = itemOf(r);
		const item = itemId ? words.get(r.surveyId)?.get(itemId) : undefined;
		const where = item ? `${item.title}${item.detail ? ` (${item.detail})` : ''}` : 'the survey';
		const who = r.who ?? 'Someone';
		let what: string;
		if (r.decision) {
			const d = r.decision;
			const words = DECISION_LABELS[d.decision as Decision] ?? d.decision;
			const detail = decisionDetail({ ...d, words, outcomeWords: null });
			const note = notes.get(d.id);
			what = `${who}: ${words}${detail ? ` — ${detail}` : ''}${note ? ` — “${excerpt(note)}”` : ''}`;
		} else if (r.comment) {
			what = `${who} commented: “${excerpt(r.comment.body)}”`;
		} else return [];
		const url = `${origin}/desk/surveys/${r.surveyId}/decisions${itemId ? `#item-${itemId}` : ''}`;
		return [{ surveyId: r.surveyId, actorId: r.actorId, line: `${where}: ${what}\n${url}` }];
	});
}

export function digestMessage(m: {
	name: string;
	surveys: { name: string; lines: string[] }[];
	more: number;
	url: string;
}): RenderedMessage {
	const count = m.surveys.reduce((n, s) => n + s.lines.length, 0) + m.more;
	return render({
		subject:
			m.surveys.length === 1
				? `${count === 1 ? 'A new decision or comment' : `${count} new decisions and comments`}: ${m.surveys[0].name}`
				: `${count} new decisions and comments on ${m.surveys.length} surveys`,
		greeting: `Hello ${m.name},`,
		paragraphs: [
			'Since the last digest, your client’s people decided or commented on these findings and jobs:',
			...m.surveys.flatMap((s) => [`${s.name}:`, ...s.lines.map((l) => `• ${l}`)]),
			...(m.more > 0 ? [`…and ${m.more} more on the Desk.`] : [])
		],
		action: { label: 'Open the decisions', url: m.url },
		after: ['Answer a comment on the Desk: the client reads your answer on the item’s page.']
	});
}

async function release(db: Executor, claim: string) {
	await db.update(O).set({ claim: null, claimedAt: null }).where(eq(O.claim, claim));
}

/** One run: claim the unsent rows, send one message per recipient, mark them sent. */
export async function sendDecisionDigests(
	db: Db,
	now = new Date(),
	options: { origin?: string } = {}
): Promise<DigestOutcome> {
	const config = currentMailConfig();
	const none = { events: 0, sent: 0, failed: 0 };
	if (config.mode === 'off') return { off: true, ...none };
	let origin = options.origin ?? '';
	try {
		origin ||= linkOrigin(config, '');
	} catch {
		// An SMTP server needs the public URL; said below, once there is something to send.
	}
	if (origin === '') {
		const [waiting] = await db.select({ id: O.id }).from(O).where(isNull(O.sentAt)).limit(1);
		if (waiting) {
			console.error('steamwisp: no decision digest sent: set STEAMWISP_PUBLIC_URL (or ORIGIN)');
		}
		return { off: false, ...none };
	}
	const claim = randomUUID();
	const stale = new Date(now.getTime() - STALE_CLAIM_MS);
	await db
		.update(O)
		.set({ claim, claimedAt: now })
		.where(and(isNull(O.sentAt), or(isNull(O.claimedAt), lt(O.claimedAt, stale))))
		.orderBy(asc(O.id))
		.limit(BATCH_ROWS);
	const events = await claimedEvents(db, claim, origin);
	if (events.length === 0) {
		await db.update(O).set({ sentAt: now }).where(eq(O.claim, claim));
		return { off: false, ...none };
	}
	const bySurvey = new Map<string, Event[]>();
	for (const e of events) bySurvey.set(e.surveyId, [...(bySurvey.get(e.surveyId) ?? []), e]);
	const names = new Map(
		(
			await db
				.select({ id: surveys.id, name: surveys.name, firmId: surveys.firmId })
				.from(surveys)
				.where(inArray(surveys.id, [...bySurvey.keys()]))
		).map((s) => [s.id, s])
	);
	const inbox = new Map<
		string,
		{ person: Recipient; firmId: string; bySurvey: Map<string, string[]> }
	>();
	for (const [surveyId, list] of bySurvey) {
		for (const person of await digestRecipients(db, surveyId)) {
			const lines = list.filter((e) => e.actorId !== person.id).map((e) => e.line);
			if (lines.length === 0) continue;
			const box = inbox.get(person.id) ?? {
				person,
				firmId: names.get(surveyId)!.firmId,
				bySurvey: new Map()
			};
			box.bySurvey.set(surveyId, lines);
			inbox.set(person.id, box);
		}
	}
	let sent = 0;
	let failed = 0;
	for (const { person, firmId, bySurvey: theirs } of inbox.values()) {
		let room = LISTED;
		const listed = [...theirs].map(([surveyId, lines]) => {
			const shown = lines.slice(0, Math.max(0, room));
			room -= shown.length;
			return { name: names.get(surveyId)!.name, lines: shown, all: lines.length };
		});
		const more = listed.reduce((n, s) => n + s.all - s.lines.length, 0);
		const first = [...theirs.keys()][0];
		const url = theirs.size === 1 ? `${origin}/desk/surveys/${first}/decisions` : `${origin}/desk`;
		try {
			await sendMail({
				to: person.email,
				firmId,
				message: digestMessage({
					name: person.name,
					surveys: listed.filter((s) => s.lines.length > 0),
					more,
					url
				})
			});
			sent++;
		} catch (e) {
			failed++;
			console.error(
				`steamwisp: could not send the decision digest to ${person.email}: ${(e as Error).message}`
			);
		}
	}
	if (sent === 0 && failed > 0) {
		await release(db, claim);
	} else {
		await db.update(O).set({ sentAt: now }).where(eq(O.claim, claim));
	}
	return { off: false, events: events.length, sent, failed };
}
