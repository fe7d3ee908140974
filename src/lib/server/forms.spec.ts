import { isHttpError } from '@sveltejs/kit';
import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { uuidSchema } from '$lib/schemas/common';
import { fieldErrors, parseForm, readForm, readNestedForm } from './forms';

/** A form post as a browser sends it (urlencoded, so repeated names keep their order). */
const post = (pairs: [string, string][]) =>
	new Request('http://127.0.0.1/desk', {
		method: 'POST',
		headers: { 'content-type': 'application/x-www-form-urlencoded' },
		body: new URLSearchParams(pairs).toString()
	});

/** The status and message a read refuses with. */
async function refusal(read: Promise<unknown>) {
	try {
		await read;
	} catch (e) {
		if (isHttpError(e)) return { status: e.status, message: e.body.message };
		throw e;
	}
	throw new Error('expected a refusal');
}

const ids = ['0b8f2f53-4c6e-4d2b-9a51-7d6f0c1e2a3b', '6f1d2c3b-8e7a-4b5c-9d0e-1f2a3b4c5d6e'];

/** A cost-basis-like form with rows and a multi-select, the way the Desk's forms are built. */
const reviewSchema = z.object({
	fuel: z.object({
		kind: z.enum(['natural-gas', 'fuel-oil-2'], { error: 'Choose the fuel' }),
		price: z.string().regex(/^\d+(\.\d+)?$/, { error: 'Enter the price as a number' })
	}),
	headers: z
		.array(z.object({ name: z.string().min(1, 'Name the header'), pressure: z.coerce.number() }))
		.min(1),
	findingIds: z.array(uuidSchema)
});
const nested = { nested: true as const, lists: ['findingIds'] };

describe('readForm (plain forms)', () => {
	it('gives every field once as text, dotted names as they are', async () => {
		expect(
			await readForm(
				post([
					['email', 'a@b.example'],
					['fuel.price', '2']
				])
			)
		).toEqual({
			email: 'a@b.example',
			'fuel.price': '2'
		});
	});

	it('refuses a repeated name with 400, as before', async () => {
		const twice = await refusal(
			readForm(
				post([
					['email', 'a'],
					['email', 'b']
				])
			)
		);
		expect(twice).toEqual({ status: 400, message: 'The field "email" was sent twice.' });
	});

	it('refuses a file in a text field with 400', async () => {
		const body = new FormData();
		body.append('email', new File(['not text'], 'payload.bin'));
		const request = new Request('http://127.0.0.1/desk', { method: 'POST', body });
		expect(await refusal(readForm(request))).toEqual({
			status: 400,
			message: 'The field "email" must be text.'
		});
	});
});

describe('readNestedForm', () => {
	it('nests groups and rows and collects the declared lists', async () => {
		const form = await readNestedForm(
			post([
				['fuel.price', '12.5'],
				['headers[0].name', 'Main'],
				['findingIds', ids[1]],
				['findingIds', ids[0]]
			]),
			{ lists: ['findingIds', 'auditorIds'] }
		);
		expect(form).toEqual({
			fuel: { price: '12.5' },
			headers: [{ name: 'Main' }],
			findingIds: [ids[1], ids[0]],
			auditorIds: []
		});
	});

	it('answers 400 for what a real form never sends', async () => {
		const cases: [string, string][][] = [
			[
				['fuel.price', '1'],
				['fuel.price', '2']
			],
			[['__proto__.isAdmin', 'yes']],
			[['rows[10001]', 'x']],
			[['a.b.c.d.e.f.g.h.i', 'x']],
			[['rows[2]', 'x']]
		];
		for (const pairs of cases) {
			expect((await refusal(readNestedForm(post(pairs)))).status, pairs[0][0]).toBe(400);
		}
		expect(({} as Record<string, unknown>).isAdmin).toBeUndefined();
	});
});

describe('fieldErrors', () => {
	it('keys by the whole path with dots, first message per key, form for the whole', () => {
		const issues = reviewSchema.safeParse({
			fuel: { kind: 'peat', price: 'x' },
			headers: [
				{ name: 'Main', pressure: '1' },
				{ name: '', pressure: '2' }
			],
			findingIds: [ids[0], 'nope']
		}).error!.issues;
		const topLevel = z
			.object({ email: z.string().min(3, 'Too short').min(5, 'Still too short') })
			.refine(() => false, 'The form as a whole is wrong')
			.safeParse({ email: 'ab' }).error!.issues;
		expect(fieldErrors([...issues, ...topLevel])).toEqual({
			'fuel.kind': 'Choose the fuel',
			'fuel.price': 'Enter the price as a number',
			'headers.1.name': 'Name the header',
			'findingIds.1': 'Must be a UUID',
			email: 'Too short',
			form: 'The form as a whole is wrong'
		});
	});
});

describe('parseForm', () => {
	it('parses a nested form with a multi-select straight into the schema', async () => {
		const form = await parseForm(
			post([
				['fuel.kind', 'natural-gas'],
				['fuel.price', '9.75'],
				['headers[0].name', 'Main'],
				['headers[0].pressure', '1.2'],
				['headers[1].name', 'Process'],
				['headers[1].pressure', '0.6'],
				['findingIds', ids[0]],
				['findingIds', ids[1]]
			]),
			reviewSchema,
			[],
			nested
		);
		expect(form.ok && form.data).toEqual({
			fuel: { kind: 'natural-gas', price: '9.75' },
			headers: [
				{ name: 'Main', pressure: 1.2 },
				{ name: 'Process', pressure: 0.6 }
			],
			findingIds: ids
		});
	});

	it('returns the dotted field errors and the kept values, lists as lists', async () => {
		const form = await parseForm(
			post([
				['fuel.kind', 'natural-gas'],
				['fuel.price', 'cheap'],
				['headers[0].name', ''],
				['headers[0].pressure', '1'],
				['findingIds', ids[0]],
				['findingIds', 'not-an-id']
			]),
			reviewSchema,
			['fuel.price', 'headers[0].name', 'findingIds', 'fuel.missing'],
			nested
		);
		expect(form.ok).toBe(false);
		if (form.ok) return;
		expect(form.failure.status).toBe(400);
		expect(form.failure.data).toEqual({
			values: {
				'fuel.price': 'cheap',
				'headers[0].name': '',
				findingIds: [ids[0], 'not-an-id'],
				'fuel.missing': ''
			},
			errors: {
				'fuel.price': 'Enter the price as a number',
				'headers.0.name': 'Name the header',
				'findingIds.1': 'Must be a UUID'
			},
			error: 'Enter the price as a number',
			dead: false
		});
	});

	it('parses a nothing-ticked multi-select as an empty list', async () => {
		const schema = z.object({
			findingIds: z.array(uuidSchema).min(1, 'Tick at least one finding')
		});
		const form = await parseForm(post([]), schema, [], nested);
		expect(!form.ok && form.failure.data.errors).toEqual({
			findingIds: 'Tick at least one finding'
		});
	});

	it('keeps the plain mode as it was: flat fields, top-level keys', async () => {
		const schema = z.object({ email: z.email({ error: 'Enter a valid e-mail address.' }) });
		const form = await parseForm(
			post([
				['email', 'nope'],
				['password', 'secret']
			]),
			schema,
			['email']
		);
		expect(!form.ok && form.failure.data).toEqual({
			values: { email: 'nope' },
			errors: { email: 'Enter a valid e-mail address.' },
			error: 'Enter a valid e-mail address.',
			dead: false
		});
		const good = await parseForm(
			post([
				['email', 'a@b.example'],
				['x.y', '1']
			]),
			schema
		);
		expect(good.ok && good.fields).toEqual({ email: 'a@b.example', 'x.y': '1' });
	});
});
