/**
 * Which figures a survey's report shows (docs/reports.md, "Who gets which figures"): the one
 * decision the PDF, the XLSX and the CSV share. Pure, so every case is a unit spec.
 *
 * - A client user gets the survey's last published revision: its frozen figures, never the
 *   live findings, even while the consultant has a correction open. A survey published before
 *   revisions were kept has none; while it stays published its findings are locked, so the live
 *   ones are what was published. With a correction open on such a survey there is nothing the
 *   client may be shown: no report.
 * - Staff of the firm get the published revision while the survey is published (or closed after
 *   publication); otherwise the live figures, marked on the cover as a draft or as a correction
 *   in progress.
 * - `?revision=N` asks for an earlier published revision, for anyone who may read the survey.
 */

export type Reader = 'client' | 'staff';

export type FigureChoice =
	/** A published revision's frozen snapshot. */
	| { kind: 'revision'; number: number; latest: boolean }
	/** The live findings; `marker` says on the cover why they are not (or are) the published ones. */
	| { kind: 'live'; marker: LiveMarker };

export type LiveMarker =
	/** Published before revisions were kept, and locked since: the live figures are the published ones. */
	| { state: 'published' }
	/** Never published. */
	| { state: 'draft' }
	/** A correction of a published revision is open: it will be published as `revision`. */
	| { state: 'correction'; revision: number };

export type Choice = { ok: true; choice: FigureChoice } | { ok: false; message: string };

export interface ChoiceFacts {
	reader: Reader;
	/** The survey's stage (planned, in-field, in-review, published, closed). */
	stage: string;
	/** When it was first published, or null. */
	publishedAt: Date | null;
	/** Numbers of its published revisions, any order. */
	revisions: readonly number[];
	/** The revision asked for with ?revision=N. */
	asked?: number;
}

export function chooseFigures(f: ChoiceFacts): Choice {
	const latest = f.revisions.length === 0 ? null : Math.max(...f.revisions);
	if (f.asked !== undefined) {
		if (!f.revisions.includes(f.asked)) {
			return {
				ok: false,
				message:
					latest === null
						? 'This survey has no published revision yet.'
						: `This survey has no published revision ${f.asked}: its revisions are 1 to ${latest}.`
			};
		}
		return { ok: true, choice: { kind: 'revision', number: f.asked, latest: f.asked === latest } };
	}
	const locked = f.stage === 'published' || (f.stage === 'closed' && f.publishedAt !== null);
	if (latest !== null && (locked || f.reader === 'client')) {
		return { ok: true, choice: { kind: 'revision', number: latest, latest: true } };
	}
	if (latest === null && locked)
		return { ok: true, choice: { kind: 'live', marker: { state: 'published' } } };
	if (f.reader === 'client') {
		return {
			ok: false,
			message: 'This survey is being corrected and has no published revision to report on yet.'
		};
	}
	if (latest !== null) {
		return {
			ok: true,
			choice: { kind: 'live', marker: { state: 'correction', revision: latest + 1 } }
		};
	}
	return { ok: true, choice: { kind: 'live', marker: { state: 'draft' } } };
}

/** What the cover says about the figures, in words. */
export function choiceWords(c: FigureChoice): string {
	if (c.kind === 'revision') {
		return c.latest
			? `Revision ${c.number}, as published to the client.`
			: `Revision ${c.number}, as published to the client; a later revision has been published since.`;
	}
	switch (c.marker.state) {
		case 'published':
			return 'As published to the client.';
		case 'draft':
			return 'DRAFT — not yet published to the client. Figures may still change.';
		case 'correction':
			return `DRAFT — correction in progress, revision ${c.marker.revision}, not yet published. The client still sees revision ${c.marker.revision - 1}.`;
	}
}
