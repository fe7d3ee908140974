/**
 * An in-memory server speaking the sync contract of docs/sync.md, for the device's unit specs:
 * `POST /api/sync/push` (applied / duplicate / conflict / rejected by version, replays answered
 * with the first answer, rejected mutations not recorded), `GET /api/sync/pull` (change-counter
 * order, cursor pages, finding and survey tombstones) and `PUT`/`GET /api/photos/[id]` (type
 * read from the bytes, SHA-256 checked, 201 / 200 / 409). One signed-in person, one firm.
 * Built to the contract, not to the client: the same client runs against the real routes in
 * tests/integration. `fetch` is what the client is given; the rest is for the spec to arrange
 * the server's side and to look inside.
 */
import type { FindingCapture } from '../../src/lib/schemas/capture';
import type { SurveySummary } from '../../src/lib/schemas/snapshot';
import {
	DEFAULT_PULL_LIMIT,
	MAX_PHOTO_BYTES,
	MAX_PULL_LIMIT,
	PHOTO_HEADERS,
	pushRequestSchema,
	type Change,
	type Mutation,
	type MutationResult
} from '../../src/lib/schemas/sync';

export interface ServerFinding {
	capture: FindingCapture;
	version: number;
	deleted: boolean;
	seq: number;
}

export interface ServerConflict {
	mutationId: string;
	findingId: string;
	op: Mutation['op'];
	baseVersion: number;
	serverVersion: number;
}

/** What goes wrong with the next request(s) to a path, as a network would. */
export type Fault =
	| { kind: 'drop-request' }
	| { kind: 'drop-answer' }
	| { kind: 'status'; status: number; message?: string };

type Feed = { seq: number; change: () => Change };

const json = (body: unknown, status = 200) => Response.json(body, { status });

/** The image type from the first bytes, as the server reads it (never from a header). */
function sniff(b: Uint8Array): string | null {
	if (b[0] === 0xff && b[1] === 0xd8 && b[2] === 0xff) return 'image/jpeg';
	if (b[0] === 0x89 && b[1] === 0x50 && b[2] === 0x4e && b[3] === 0x47) return 'image/png';
	const ascii = (from: number, to: number) => String.fromCharCode(...b.subarray(from, to));
	if (ascii(0, 4) === 'RIFF' && ascii(8, 12) === 'WEBP') return 'image/webp';
	return null;
}

async function sha256Hex(bytes: Uint8Array<ArrayBuffer>): Promise<string> {
	const digest = await crypto.subtle.digest('SHA-256', bytes);
	return [...new Uint8Array(digest)].map((x) => x.toString(16).padStart(2, '0')).join('');
}

const sameCapture = (a: FindingCapture, b: FindingCapture) =>
	JSON.stringify(a) === JSON.stringify(b);

export class FakeSyncServer {
	counter = 0;
	readonly surveys = new Map<string, { summary: SurveySummary; seq: number; recording: boolean }>();
	readonly findings = new Map<string, ServerFinding>();
	readonly conflicts: ServerConflict[] = [];
	readonly photos = new Map<string, { bytes: Uint8Array; type: string; findingId: string }>();
	/** Mutation id → the first answer (applied and conflicting ones; rejected are not kept). */
	readonly answered = new Map<string, MutationResult>();
	/** Every mutation id that changed something, in order: each should appear once. */
	readonly appliedLog: string[] = [];
	readonly tombstones: { seq: number; entity: 'finding' | 'survey'; id: string }[] = [];
	/** Every request seen, as "METHOD /path?query". */
	readonly requests: string[] = [];
	private readonly faults: { path: string; fault: Fault; skip: number }[] = [];
	private readonly holds: { path: string; release: Promise<void>; reached: () => void }[] = [];

	/** Adds a survey this person records on (as a snapshot would have brought it). */
	addSurvey(summary: SurveySummary): void {
		this.surveys.set(summary.id, { summary, seq: ++this.counter, recording: true });
	}

	/** The survey leaves recording (with the client, closed): pushes to it are rejected. */
	stopRecording(surveyId: string): void {
		this.surveys.get(surveyId)!.recording = false;
	}

	/** Unassigns the survey from this person: pulled as a survey tombstone. */
	withdraw(surveyId: string): void {
		this.surveys.delete(surveyId);
		this.tombstones.push({ seq: ++this.counter, entity: 'survey', id: surveyId });
	}

	/** An edit made on the server (the desk, another device): a new version and counter. */
	edit(capture: FindingCapture): ServerFinding {
		const known = this.findings.get(capture.id);
		const row = {
			capture,
			version: (known?.version ?? 0) + 1,
			deleted: false,
			seq: ++this.counter
		};
		this.findings.set(capture.id, row);
		return row;
	}

	/** A deletion made on the server: pulled as the finding's tombstone. */
	remove(findingId: string): void {
		const row = this.findings.get(findingId)!;
		Object.assign(row, { deleted: true, version: row.version + 1, seq: ++this.counter });
	}

	/** The network is sound again: every fault still queued is dropped. */
	heal(): void {
		this.faults.splice(0);
	}

	/** A request to `path` meets `fault`: the next one, or the one after `skip` more. */
	fail(path: string, fault: Fault, skip = 0): void {
		this.faults.push({ path, fault, skip });
	}

	/**
	 * The next request to `path` waits until `release` is called; `reached` settles when it
	 * arrives, so a spec can act while the request is in flight.
	 */
	hold(path: string): { reached: Promise<void>; release: () => void } {
		let release!: () => void;
		let reached!: () => void;
		const released = new Promise<void>((r) => (release = r));
		const arrived = new Promise<void>((r) => (reached = r));
		this.holds.push({ path, release: released, reached });
		return { reached: arrived, release };
	}

	/** The `fetch` the device is given. */
	readonly fetch = async (input: RequestInfo | URL, init?: RequestInit): Promise<Response> => {
		const request = new Request(new URL(String(input), 'http://127.0.0.1'), init);
		const url = new URL(request.url);
		this.requests.push(`${request.method} ${url.pathname}${url.search}`);
		const held = this.take(this.holds, url.pathname);
		if (held) {
			held.reached();
			await held.release;
		}
		const fault = this.nextFault(url.pathname);
		if (fault?.kind === 'drop-request') throw new TypeError('Failed to fetch');
		if (fault?.kind === 'status') {
			return json({ message: fault.message ?? 'Service unavailable' }, fault.status);
		}
		const answer = await this.route(request, url);
		if (fault?.kind === 'drop-answer') throw new TypeError('Failed to fetch');
		return answer;
	};

	private take<T extends { path: string }>(list: T[], path: string): T | undefined {
		const i = list.findIndex((x) => x.path === path);
		return i < 0 ? undefined : list.splice(i, 1)[0];
	}

	/** The first fault queued for `path`, once its `skip` requests have gone by. */
	private nextFault(path: string): Fault | undefined {
		const queued = this.faults.find((f) => f.path === path);
		if (!queued) return undefined;
		if (queued.skip-- > 0) return undefined;
		return this.take(this.faults, path)?.fault;
	}

	private async route(request: Request, url: URL): Promise<Response> {
		if (request.method === 'POST' && url.pathname === '/api/sync/push') return this.push(request);
		if (request.method === 'GET' && url.pathname === '/api/sync/pull') return this.pull(url);
		const photo = url.pathname.match(/^\/api\/photos\/([^/]+)$/);
		if (photo && request.method === 'PUT') return this.putPhoto(photo[1], request);
		if (photo && request.method === 'GET') {
			const p = this.photos.get(photo[1]);
			if (!p) return json({ message: 'Not found' }, 404);
			return new Response(p.bytes as BodyInit, { headers: { 'content-type': p.type } });
		}
		return json({ message: 'Not found' }, 404);
	}

	private async push(request: Request): Promise<Response> {
		const parsed = pushRequestSchema.safeParse(await request.json().catch(() => null));
		if (!parsed.success) {
			return json({ message: 'These changes could not be read', issues: parsed.error.issues }, 400);
		}
		const { mutations } = parsed.data;
		// Authorization first, for the whole batch.
		if (mutations.some((m) => !this.surveys.has(m.data.surveyId))) {
			return json({ message: 'Not found' }, 404);
		}
		return json({ results: mutations.map((m) => this.apply(m)) });
	}

	private apply(m: Mutation): MutationResult {
		const seen = this.answered.get(m.mutationId);
		if (seen) return seen.status === 'conflict' ? seen : { ...seen, status: 'duplicate' };
		const result = this.decide(m);
		if (result.status !== 'rejected') {
			this.answered.set(m.mutationId, result);
			if (result.status === 'applied') this.appliedLog.push(m.mutationId);
		}
		return result;
	}

	private decide(m: Mutation): MutationResult {
		const id = m.mutationId;
		const survey = this.surveys.get(m.data.surveyId)!;
		if (!survey.recording) {
			return { mutationId: id, status: 'rejected', reason: 'This survey is no longer open' };
		}
		const row = this.findings.get(m.id);
		if (row && row.capture.surveyId !== m.data.surveyId) {
			return { mutationId: id, status: 'rejected', reason: 'This finding is on another survey' };
		}
		const conflict = (): MutationResult => {
			this.conflicts.push({
				mutationId: id,
				findingId: m.id,
				op: m.op,
				baseVersion: m.baseVersion,
				serverVersion: row!.version
			});
			return {
				mutationId: id,
				status: 'conflict',
				version: row!.version,
				reason: 'Edited elsewhere'
			};
		};
		if (m.op === 'delete') {
			if (!row) return { mutationId: id, status: 'applied', version: 0 };
			if (row.deleted) return { mutationId: id, status: 'applied', version: row.version };
			if (m.baseVersion !== row.version) return conflict();
			Object.assign(row, { deleted: true, version: row.version + 1, seq: ++this.counter });
			return { mutationId: id, status: 'applied', version: row.version };
		}
		if (row?.deleted) return conflict();
		if (row && m.baseVersion !== row.version) {
			if (m.baseVersion === 0 && sameCapture(row.capture, m.data)) {
				return { mutationId: id, status: 'applied', version: row.version };
			}
			return conflict();
		}
		return { mutationId: id, status: 'applied', version: this.edit(m.data).version };
	}

	private pull(url: URL): Response {
		const since = Number(url.searchParams.get('since') ?? '0');
		const limit = Number(url.searchParams.get('limit') ?? DEFAULT_PULL_LIMIT);
		if (!Number.isInteger(since) || since < 0) return json({ message: 'Bad cursor' }, 400);
		if (!Number.isInteger(limit) || limit < 1 || limit > MAX_PULL_LIMIT) {
			return json({ message: 'Bad limit' }, 400);
		}
		const feed: Feed[] = [];
		for (const [id, f] of this.findings) {
			if (!this.surveys.has(f.capture.surveyId)) continue;
			feed.push({
				seq: f.seq,
				change: () => ({
					entity: 'finding',
					id,
					version: f.version,
					deleted: f.deleted,
					data: f.deleted ? null : { capture: f.capture, status: 'draft', results: null }
				})
			});
		}
		for (const [id, s] of this.surveys) {
			feed.push({
				seq: s.seq,
				change: () => ({ entity: 'survey', id, version: 1, deleted: false, data: s.summary })
			});
		}
		for (const t of this.tombstones) {
			feed.push({
				seq: t.seq,
				change: () =>
					t.entity === 'survey'
						? { entity: 'survey', id: t.id, version: 0, deleted: true, data: null }
						: { entity: 'finding', id: t.id, version: 0, deleted: true, data: null }
			});
		}
		const after = feed.filter((x) => x.seq > since).sort((a, b) => a.seq - b.seq);
		const page = after.slice(0, limit);
		return json({
			changes: page.map((x) => x.change()),
			cursor: page.length > 0 ? page[page.length - 1].seq : since,
			more: after.length > limit
		});
	}

	private async putPhoto(id: string, request: Request): Promise<Response> {
		const findingId = request.headers.get(PHOTO_HEADERS.finding);
		const surveyId = request.headers.get(PHOTO_HEADERS.survey);
		const declared = request.headers.get(PHOTO_HEADERS.sha256);
		if (!findingId || !surveyId || !declared) {
			return json({ message: 'A photo names its finding, survey and SHA-256' }, 400);
		}
		if (!this.surveys.has(surveyId)) return json({ message: 'Not found' }, 404);
		const bytes = new Uint8Array(await request.arrayBuffer());
		if (bytes.length > MAX_PHOTO_BYTES) return json({ message: 'This photo is too large' }, 413);
		const type = sniff(bytes);
		if (!type) return json({ message: 'Only JPEG, PNG or WebP photos are taken' }, 415);
		if ((await sha256Hex(bytes)) !== declared.toLowerCase()) {
			return json({ message: 'The photo arrived damaged (its SHA-256 differs)' }, 422);
		}
		const known = this.photos.get(id);
		if (known) {
			const same =
				known.bytes.length === bytes.length && known.bytes.every((x, i) => x === bytes[i]);
			return same
				? json({ id }, 200)
				: json({ message: 'Another photo is stored under this id' }, 409);
		}
		this.photos.set(id, { bytes, type, findingId });
		return json({ id }, 201);
	}
}
