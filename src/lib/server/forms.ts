/**
 * Reading form posts in actions. SvelteKit already answers 415 to a body that is not a form;
 * this answers 413 to one over MAX_FORM_BYTES (the app's BODY_SIZE_LIMIT is larger, for
 * photos), turns a form that cannot be parsed
 * (a broken multipart body, say) into a clear 400 instead of a 500, and collapses it to plain
 * strings so a file smuggled into a text field fails validation rather than reaching a query.
 * Forms with groups, rows and multi-selects read nested (`readNestedForm`, `parseForm` with
 * `{ nested: true }`); the naming convention is in DEVELOPERS.md ("Forms").
 */
import { error, fail } from '@sveltejs/kit';
import type { z } from 'zod';
import { readLimitedBody } from './body';
import {
	flatFields,
	FormFieldError,
	nestFields,
	type FormObject,
	type FormValue,
	type NestOptions
} from './form-fields';

export type { FormObject, FormValue } from './form-fields';

/** Bytes a form post may have: every form of the app is a few kB. */
export const MAX_FORM_BYTES = 512 * 1024;

const unreadable = 'That form could not be read. Reload the page and try again.';

async function readFormData(request: Request): Promise<FormData> {
	const body = await readLimitedBody(request, MAX_FORM_BYTES, {
		tooLarge: 'That form is too large to accept.',
		cut: unreadable,
		drain: true
	});
	try {
		return await new Request(request.url, {
			method: request.method,
			headers: request.headers,
			body: new Uint8Array(body)
		}).formData();
	} catch (e) {
		// adapter-node stops reading past BODY_SIZE_LIMIT and says so with a 413.
		if ((e as { status?: number }).status === 413) error(413, 'That form is too large to accept.');
		error(400, unreadable);
	}
}

/** A FormFieldError becomes the sender's 400; anything else is a bug and stays one. */
function refused<T>(read: () => T): T {
	try {
		return read();
	} catch (e) {
		if (e instanceof FormFieldError) error(400, e.message);
		throw e;
	}
}

/** Every field once, as text; a repeated name or a file is refused with 400. */
export async function readForm(request: Request): Promise<Record<string, string>> {
	const data = await readFormData(request);
	return refused(() => flatFields(data));
}

/**
 * The form as a nested value: `fuel.price` in a group, `headers[1].pressure` in rows, the
 * names in `lists` as string arrays (empty when nothing was chosen). Refusals answer 400.
 */
export async function readNestedForm(
	request: Request,
	options: NestOptions = {}
): Promise<FormObject> {
	const data = await readFormData(request);
	return refused(() => nestFields(data, options));
}

/**
 * The first problem with each field, in words, for showing beside the inputs: keyed by the
 * field's path joined with dots (`email`, `fuel.price`, `headers.1.pressure`), `form` for a
 * problem with the form as a whole.
 */
export function fieldErrors(issues: z.core.$ZodIssue[]): Record<string, string> {
	const errors: Record<string, string> = {};
	for (const issue of issues) {
		const key = issue.path.length > 0 ? issue.path.map(String).join('.') : 'form';
		errors[key] ??= issue.message;
	}
	return errors;
}

/** parseForm's nested mode: groups, rows and the named lists (see readNestedForm). */
export interface NestedFormOptions extends NestOptions {
	nested: true;
}

/** What a kept field shows again: text, or the chosen values of a list. */
export type KeptValue = string | string[];

/** The value at a dotted path of a nested form, as the page can show it again. */
function keptValue(fields: FormObject, name: string): KeptValue {
	let node: FormValue | undefined = fields;
	for (const key of name.replace(/\[(\d+)\]/g, '.$1').split('.')) {
		if (node === undefined || typeof node === 'string') return '';
		node = Array.isArray(node)
			? node[Number(key)]
			: Object.hasOwn(node, key)
				? node[key]
				: undefined;
	}
	if (typeof node === 'string') return node;
	if (Array.isArray(node) && node.every((v) => typeof v === 'string')) return node as string[];
	return '';
}

/**
 * Parses a form post with a zod schema; on failure returns `fail(400, …)` with the field
 * errors and the submitted values (minus anything secret) for the page to show again.
 * With `{ nested: true, lists }` the schema gets the nested form (readNestedForm) and `keep`
 * names fields by their dotted names (`fuel.price`, `findingIds`).
 */
export async function parseForm<S extends z.ZodType>(
	request: Request,
	schema: S,
	keep?: string[]
): Promise<
	| { ok: true; data: z.output<S>; fields: Record<string, string> }
	| { ok: false; failure: ReturnType<typeof formProblem<Record<string, string>>> }
>;
export async function parseForm<S extends z.ZodType>(
	request: Request,
	schema: S,
	keep: string[],
	options: NestedFormOptions
): Promise<
	| { ok: true; data: z.output<S>; fields: FormObject }
	| { ok: false; failure: ReturnType<typeof formProblem<Record<string, KeptValue>>> }
>;
export async function parseForm<S extends z.ZodType>(
	request: Request,
	schema: S,
	keep: string[] = [],
	options?: NestedFormOptions
) {
	const fields = options?.nested ? await readNestedForm(request, options) : await readForm(request);
	const parsed = schema.safeParse(fields);
	if (parsed.success) return { ok: true as const, data: parsed.data as z.output<S>, fields };
	const values = Object.fromEntries(
		keep.map((k) => [
			k,
			options?.nested ? keptValue(fields, k) : ((fields as Record<string, string>)[k] ?? '')
		])
	);
	const errors = fieldErrors(parsed.error.issues);
	return {
		ok: false as const,
		failure: formProblem(400, Object.values(errors)[0] ?? 'Check the form.', { values, errors })
	};
}

/** A refusal with one message (and optionally field errors), shaped like parseForm's failures. */
export function formProblem<V extends Record<string, KeptValue> = Record<string, string>>(
	status: number,
	error: string,
	extra: { errors?: Record<string, string>; values?: V; dead?: boolean } = {}
) {
	return fail(status, {
		values: extra.values ?? ({} as V),
		errors: extra.errors ?? ({} as Record<string, string>),
		error,
		dead: extra.dead ?? false
	});
}
