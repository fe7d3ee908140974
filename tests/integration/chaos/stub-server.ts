/**
 * A STAND-IN server for the chaos harness while the real push and photo routes are not in the
 * tree: idempotent by mutation id, photos stored only when whole and matching their SHA-256.
 * It proves the faulty fetch and the retry loop, not the real routes; replace its use with an
 * in-process fetch to src/routes/api/sync/** and src/routes/api/photos/** when they land.
 */
import { createHash } from 'node:crypto';

export function stubServer() {
	const mutations = new Map<string, number>();
	const photos = new Map<string, Uint8Array>();
	let applyCount = 0;
	const fetch = async (input: string | URL | Request, init?: RequestInit): Promise<Response> => {
		const req = new Request(input, init);
		const url = new URL(req.url);
		const body = new Uint8Array(await req.arrayBuffer());
		if (url.pathname === '/api/sync/push') {
			const { mutations: list } = JSON.parse(new TextDecoder().decode(body)) as {
				mutations: { mutationId: string }[];
			};
			const results = list.map((m) => {
				if (mutations.has(m.mutationId)) return { mutationId: m.mutationId, status: 'duplicate' };
				mutations.set(m.mutationId, ++applyCount);
				return { mutationId: m.mutationId, status: 'applied', version: 1 };
			});
			return Response.json({ results });
		}
		const photo = url.pathname.match(/^\/api\/photos\/(.+)$/);
		if (photo && req.method === 'PUT') {
			const sha = createHash('sha256').update(body).digest('hex');
			if (sha !== req.headers.get('x-steamwisp-sha256')) return new Response(null, { status: 422 });
			const had = photos.get(photo[1]);
			if (had && Buffer.compare(Buffer.from(had), Buffer.from(body)) !== 0)
				return new Response(null, { status: 409 });
			photos.set(photo[1], body);
			return new Response(null, { status: 200 });
		}
		return new Response(null, { status: 404 });
	};
	return { fetch, mutations, photos };
}
