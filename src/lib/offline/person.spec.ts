import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { WalkPerson } from '$lib/schemas/snapshot';
import { forgetPerson, rememberedPerson, rememberPerson } from './person';

/** localStorage as the browser has it, over a Map. */
function fakeStorage(): Storage {
	const items = new Map<string, string>();
	return {
		get length() {
			return items.size;
		},
		clear: () => items.clear(),
		getItem: (k) => items.get(k) ?? null,
		key: (i) => [...items.keys()][i] ?? null,
		removeItem: (k) => void items.delete(k),
		setItem: (k, v) => void items.set(k, String(v))
	};
}

const person: WalkPerson = {
	id: '5e1f0000-0000-4000-8000-0000000000b1',
	name: 'Ada Field',
	email: 'ada@example.test',
	role: 'auditor',
	unitSystem: 'SI'
};

let storage: Storage;
beforeEach(() => {
	storage = fakeStorage();
	vi.stubGlobal('localStorage', storage);
});
afterEach(() => vi.unstubAllGlobals());

describe('remembered person', () => {
	it('is null until someone is remembered, then that person, then null after forgetting', () => {
		expect(rememberedPerson()).toBeNull();
		rememberPerson(person);
		expect(rememberedPerson()).toEqual(person);
		forgetPerson();
		expect(rememberedPerson()).toBeNull();
	});

	it('keeps one person under one key: the last remembered', () => {
		rememberPerson(person);
		rememberPerson({ ...person, id: '5e1f0000-0000-4000-8000-0000000000b2', name: 'Bo' });
		expect(storage.length).toBe(1);
		expect(rememberedPerson()?.name).toBe('Bo');
	});

	it('reads a corrupt or foreign value as nobody', () => {
		rememberPerson(person);
		const key = storage.key(0)!;
		storage.setItem(key, '{not json');
		expect(rememberedPerson()).toBeNull();
		storage.setItem(key, JSON.stringify({ ...person, role: 'owner' }));
		expect(rememberedPerson()).toBeNull();
	});

	it('does nothing where there is no storage', () => {
		vi.stubGlobal('localStorage', undefined);
		expect(() => rememberPerson(person)).not.toThrow();
		expect(rememberedPerson()).toBeNull();
	});
});
