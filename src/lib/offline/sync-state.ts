/**
 * What the sync status shows, and its words (`describeSync`): what is waiting, what went,
 * when the last whole exchange was, and what needs the person's attention.
 */
export type SyncPhase = 'idle' | 'sending' | 'waiting-to-retry' | 'offline' | 'needs-attention';

export interface SyncState {
	phase: SyncPhase;
	/** Findings with changes not yet accepted by the server. */
	findingsWaiting: number;
	/** Photos not yet stored on the server (refused ones not counted: see refused). */
	photosWaiting: number;
	/** Changes or photos the server refused, each with its reason on the device. */
	refused: number;
	/** Edits the server kept as conflicts, waiting for the desk. */
	conflicts: number;
	/** ISO time of the last exchange that ended without trouble, or null. */
	lastExchangeAt: string | null;
	/** Plain words of what stopped the last exchange, or null. */
	problem: string | null;
	/** ISO time of the next automatic try, or null. */
	nextTryAt: string | null;
}

export const initialSyncState = (): SyncState => ({
	phase: 'idle',
	findingsWaiting: 0,
	photosWaiting: 0,
	refused: 0,
	conflicts: 0,
	lastExchangeAt: null,
	problem: null,
	nextTryAt: null
});

const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

/** "10:42", or "3 Dec, 10:42" when not today, in the device's time zone. */
export function clockTime(iso: string, now: Date): string {
	const at = new Date(iso);
	const time = at.toLocaleTimeString('en-GB', { hour: '2-digit', minute: '2-digit' });
	if (at.toDateString() === now.toDateString()) return time;
	return `${at.toLocaleDateString('en-GB', { day: 'numeric', month: 'short' })}, ${time}`;
}

export interface SyncWords {
	/** One short line: the state at a glance. */
	headline: string;
	/** Further lines, in order of what matters. */
	details: string[];
}

export function describeSync(s: SyncState, now = new Date()): SyncWords {
	const waiting: string[] = [];
	if (s.findingsWaiting > 0) waiting.push(plural(s.findingsWaiting, 'finding'));
	if (s.photosWaiting > 0) waiting.push(plural(s.photosWaiting, 'photo'));
	const what = waiting.join(' and ');
	const details: string[] = [];
	const attention = s.refused + s.conflicts;
	let headline: string;
	if (s.phase === 'sending') headline = what ? `Sending ${what}…` : 'Checking with the server…';
	else if (what) headline = `${what} waiting to send`;
	else if (attention > 0) headline = 'Sent, but something needs your attention';
	// "All sent" only once the server has said so; before that there is merely nothing queued.
	else if (s.lastExchangeAt && s.phase === 'idle') headline = 'All sent';
	else headline = 'Nothing waiting to send';

	if (s.conflicts > 0) {
		details.push(
			`${plural(s.conflicts, 'edit')} clashed with a newer change on the server: yours ` +
				`${s.conflicts === 1 ? 'is' : 'are'} kept, and the consultant will settle ` +
				`${s.conflicts === 1 ? 'it' : 'them'} at the desk. Nothing more to do here.`
		);
	}
	if (s.refused > 0) {
		details.push(
			`${plural(s.refused, 'change')} refused by the server — open the finding to see why; ` +
				'it stays on this device.'
		);
	}
	if (s.problem && s.phase !== 'sending') details.push(s.problem);
	if (s.phase === 'waiting-to-retry' && s.nextTryAt) {
		details.push(`Trying again at ${clockTime(s.nextTryAt, now)}.`);
	}
	details.push(
		s.lastExchangeAt
			? `Last exchange with the server: ${clockTime(s.lastExchangeAt, now)}.`
			: 'Nothing exchanged with the server from this device yet.'
	);
	return { headline, details };
}
