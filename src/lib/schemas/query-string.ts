/**
 * A query string read by a strict zod schema: each parameter once (a parameter given twice is
 * refused with a message), then the schema's first message in words, for the 400 it answers.
 */
import type { z } from 'zod';

export function readQueryString<S extends z.ZodType>(
	params: URLSearchParams,
	schema: S
): { ok: true; query: z.output<S> } | { ok: false; message: string } {
	const raw: Record<string, string> = {};
	for (const name of new Set(params.keys())) {
		const values = params.getAll(name);
		if (values.length > 1) return { ok: false, message: `Give ${name} only once.` };
		raw[name] = values[0];
	}
	const parsed = schema.safeParse(raw);
	if (parsed.success) return { ok: true, query: parsed.data };
	return { ok: false, message: parsed.error.issues[0]?.message ?? 'Check the query.' };
}
