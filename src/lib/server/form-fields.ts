/**
 * Form entries to values, without any HTTP: `flatFields` for the plain forms (one string per
 * name), `nestFields` for forms with groups, rows and multi-selects. The naming convention is
 * in DEVELOPERS.md ("Forms"). Everything a real form of ours never sends is refused with a
 * `FormFieldError` whose message is said to the sender with a 400: a repeated name not
 * declared a list (a tampered form), a file where text belongs, a name that would reach an
 * object's prototype, absurd depth or row numbers, rows that skip a number.
 */

/** A value as `nestFields` builds it: text, a list of rows or values, or a group of fields. */
export type FormValue = string | FormValue[] | FormObject;
export interface FormObject {
	[name: string]: FormValue;
}

/** Deepest path a field name may have (`a.b.c` is 3): our deepest form uses 3. */
export const MAX_FIELD_DEPTH = 8;
/** Highest row number (`rows[10000]`): far beyond any form a person fills in. */
export const MAX_FIELD_INDEX = 10_000;

/** Names that would reach or replace an object's prototype when used as keys. */
const FORBIDDEN = new Set(['__proto__', 'constructor', 'prototype']);

/** Something a real form never sends; the message is in plain words for the sender. */
export class FormFieldError extends Error {}

const shown = (name: string) => `"${name.slice(0, 40)}"`;

/** Every field once, as text: the plain forms' reading (dotted names stay as they are). */
export function flatFields(entries: Iterable<[string, FormDataEntryValue]>) {
	const fields: Record<string, string> = {};
	const seen = new Set<string>();
	for (const [name, value] of entries) {
		if (typeof value !== 'string')
			throw new FormFieldError(`The field ${shown(name)} must be text.`);
		if (FORBIDDEN.has(name)) throw forbidden(name);
		// A repeated field is a tampered form: a real one sends each name once.
		if (seen.has(name)) throw new FormFieldError(`The field ${shown(name)} was sent twice.`);
		seen.add(name);
		fields[name] = value;
	}
	return fields;
}

const forbidden = (name: string) =>
	new FormFieldError(`The field ${shown(name)} has a name this form does not accept.`);

type Segment = string | number;

/**
 * The path a field name stands for: `fuel.price` → ['fuel', 'price'];
 * `headers[1].pressure` and `headers.1.pressure` → ['headers', 1, 'pressure']. The first
 * segment is always a name (the form itself is a group), later all-digit segments are rows.
 */
export function fieldPath(name: string): Segment[] {
	const path: Segment[] = [];
	const unreadable = () => new FormFieldError(`The field name ${shown(name)} cannot be read.`);
	for (const part of name.split('.')) {
		const m = /^([^[\]]+)((?:\[[^[\]]*\])*)$/.exec(part);
		if (!m) throw unreadable();
		const [, head, brackets] = m;
		path.push(path.length > 0 && /^\d+$/.test(head) ? row(head, name) : head);
		for (const b of brackets.match(/\[[^\]]*\]/g) ?? []) {
			const digits = b.slice(1, -1);
			if (!/^\d+$/.test(digits)) throw unreadable();
			path.push(row(digits, name));
		}
	}
	if (path.some((s) => typeof s === 'string' && FORBIDDEN.has(s))) throw forbidden(name);
	if (path.length > MAX_FIELD_DEPTH) {
		throw new FormFieldError(`The field ${shown(name)} is nested too deeply.`);
	}
	return path;
}

function row(digits: string, name: string): number {
	// "01" and "1" would be one row under two names; a form of ours writes plain numbers.
	const n = Number(digits);
	if (n > MAX_FIELD_INDEX || (digits.length > 1 && digits.startsWith('0'))) {
		throw new FormFieldError(`The field ${shown(name)} has a row number this form cannot take.`);
	}
	return n;
}

type Node = FormObject | FormValue[];

/** The builder's state: rows set per list, to tell a complete list from one with holes. */
class Tree {
	readonly root: FormObject = {};
	private readonly filled = new WeakMap<FormValue[], number>();

	put(path: Segment[], value: FormValue, name: string, twice: string): void {
		let node: Node = this.root;
		for (let i = 0; i < path.length - 1; i++) {
			const wantRows = typeof path[i + 1] === 'number';
			let child = this.get(node, path[i]);
			if (child === undefined) {
				child = wantRows ? [] : {};
				this.set(node, path[i], child);
			} else if (typeof child === 'string' || Array.isArray(child) !== wantRows) {
				throw clash(name);
			}
			node = child;
		}
		const last = path[path.length - 1];
		const before = this.get(node, last);
		if (before !== undefined)
			throw typeof before === 'string' ? new FormFieldError(twice) : clash(name);
		this.set(node, last, value);
	}

	/** Every list of rows complete (0…n-1, sent in any order); holes are refused. */
	check(node: FormValue = this.root, path = ''): void {
		if (typeof node === 'string') return;
		if (Array.isArray(node)) {
			if ((this.filled.get(node) ?? node.length) !== node.length) {
				throw new FormFieldError(`The rows of ${shown(path)} skip a number.`);
			}
			node.forEach((v, i) => this.check(v, `${path}.${i}`));
			return;
		}
		for (const [k, v] of Object.entries(node)) this.check(v, path ? `${path}.${k}` : k);
	}

	private get(node: Node, key: Segment): FormValue | undefined {
		if (Array.isArray(node)) return node[key as number];
		return Object.hasOwn(node, key) ? node[key] : undefined;
	}

	private set(node: Node, key: Segment, value: FormValue): void {
		if (Array.isArray(node)) {
			// Assigning past the end leaves holes without allocating them; `check` finds them.
			node[key as number] = value;
			this.filled.set(node, (this.filled.get(node) ?? 0) + 1);
		} else {
			node[key] = value;
		}
	}
}

const clash = (name: string) =>
	new FormFieldError(`The field ${shown(name)} is sent both as one value and as a group.`);

export interface NestOptions {
	/**
	 * Fields that are lists (a `<select multiple>`, a group of checkboxes with one name): each
	 * value is collected in the order sent, and a list nobody ticked is an empty list.
	 */
	lists?: readonly string[];
}

/** Form entries as a nested value (DEVELOPERS.md, "Forms"); empty strings stay empty. */
export function nestFields(
	entries: Iterable<[string, FormDataEntryValue]>,
	options: NestOptions = {}
): FormObject {
	const lists = new Map<string, { path: Segment[]; values: string[] }>();
	for (const list of options.lists ?? []) {
		const path = fieldPath(list);
		lists.set(path.join('.'), { path, values: [] });
	}
	const tree = new Tree();
	for (const [name, value] of entries) {
		if (typeof value !== 'string')
			throw new FormFieldError(`The field ${shown(name)} must be text.`);
		const path = fieldPath(name);
		const list = lists.get(path.join('.'));
		if (list) list.values.push(value);
		else tree.put(path, value, name, `The field ${shown(name)} was sent twice.`);
	}
	for (const [key, { path, values }] of lists) {
		tree.put(path, values, key, `The field ${shown(key)} is sent both as a list and alone.`);
	}
	tree.check();
	return tree.root;
}
