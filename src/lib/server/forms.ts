/**
 * Reading form posts in actions. SvelteKit already answers 415 to a body that is not a form;
 * this answers 413 to one over MAX_FORM_BYTES (the app's BODY_SIZE_LIMIT is larger, for
 * photos), turns a form that cannot be parsed
 * (a broken multipart body, say) into a clear 400 instead of a 500, and collapses it to plain
 * strings so a file smuggled into a text field fails validation rather than reaching a query.
 */
import { error, fail } from '@sveltejs/kit';
import type { z } from 'zod';
import { readLimitedBody } from './body';

/** Bytes a form post may have: every form of the app is a few kB. */
export const MAX_FORM_BYTES = 512 * 1024;

const unreadable = 'That form could not be read. Reload the page and try again.';

export async function readForm(request: Request): Promise<Record<string, string>> {
	const body = await readLimitedBody(request, MAX_FORM_BYTES, {
		tooLarge: 'That form is too large to accept.',
		cut: unreadable,
		drain: true
	});
	let data: FormData;
	try {
		data = await new Request(request.url, {
			method: request.method,
			headers: request.headers,
			body: new Uint8Array(body)
		}).formData();
	} catch (e) {
		// adapter-node stops reading past BODY_SIZE_LIMIT and says so with a 413.
		if ((e as { status?: number }).status === 413) error(413, 'That form is too large to accept.');
		error(400, unreadable);
	}
	const fields: Record<string, string> = {};
	for (const [name, value] of data) {
		if (typeof value !== 'string') error(400, `The field "${name.slice(0, 40)}" must be text.`);
		// A repeated field is a tampered form: a real one sends each name once.
		if (name in fields) error(400, `The field "${name.slice(0, 40)}" was sent twice.`);
		fields[name] = value;
	}
	return fields;
}

/** The first problem with each field, in words, for showing beside the inputs. */
export function fieldErrors(issues: z.core.$ZodIssue[]): Record<string, string> {
	const errors: Record<string, string> = {};
	for (const issue of issues) {
		const key = String(issue.path[0] ?? 'form');
		errors[key] ??= issue.message;
	}
	return errors;
}

/**
 * Parses a form post with a zod schema; on failure returns `fail(400, …)` with the field
 * errors and the submitted values (minus anything secret) for the page to show again.
 */
export async function parseForm<S extends z.ZodType>(
	request: Request,
	schema: S,
	keep: string[] = []
) {
	const fields = await readForm(request);
	const parsed = schema.safeParse(fields);
	if (parsed.success) return { ok: true as const, data: parsed.data as z.output<S>, fields };
	const values = Object.fromEntries(keep.map((k) => [k, fields[k] ?? '']));
	const errors = fieldErrors(parsed.error.issues);
	return {
		ok: false as const,
		failure: formProblem(400, Object.values(errors)[0] ?? 'Check the form.', { values, errors })
	};
}

/** A refusal with one message (and optionally field errors), shaped like parseForm's failures. */
export function formProblem(
	status: number,
	error: string,
	extra: { errors?: Record<string, string>; values?: Record<string, string>; dead?: boolean } = {}
) {
	return fail(status, {
		values: extra.values ?? ({} as Record<string, string>),
		errors: extra.errors ?? ({} as Record<string, string>),
		error,
		dead: extra.dead ?? false
	});
}
