import { describe, expect, it } from 'vitest';
import { acceptInvitationSchema } from './account';
import { clientFormSchema } from './desk-sites';
import { nameSchema, unsafeNameCharacter } from './names';

const person = (name: string) =>
	acceptInvitationSchema.safeParse({
		name,
		password: 'a long password',
		confirm: 'a long password'
	});

describe('names of people and companies', () => {
	it.each([
		['\u202E', 'right-to-left override'],
		['\u202A', 'left-to-right embedding'],
		['\u202B', 'right-to-left embedding'],
		['\u202C', 'pop directional formatting'],
		['\u202D', 'left-to-right override'],
		['\u2066', 'left-to-right isolate'],
		['\u2067', 'right-to-left isolate'],
		['\u2068', 'first strong isolate'],
		['\u2069', 'pop directional isolate'],
		['\u200F', 'right-to-left mark'],
		['\u061C', 'Arabic letter mark'],
		['\u2028', 'line separator'],
		['\u2029', 'paragraph separator'],
		['\u0085', 'next line (C1)'],
		['\u0000', 'NUL'],
		['\t', 'tab'],
		['\u007F', 'DEL']
	])('refuse %j (%s) with a message naming it', (char) => {
		const code = `U+${char.codePointAt(0)!.toString(16).toUpperCase().padStart(4, '0')}`;
		const r = person(`Ines ${char}rofakO`);
		expect(r.success).toBe(false);
		expect(r.error!.issues[0].path).toEqual(['name']);
		expect(r.error!.issues[0].message).toContain(`(${code})`);
		expect(unsafeNameCharacter(`x${char}`)).toBe(code);
	});

	it('take names in any script, with accents, apostrophes and hyphens', () => {
		for (const name of [
			'Noor Castellanos',
			'Siân O’Neill-Bærum',
			'محمد الأحمد',
			'דנה לוי',
			'Đặng Thị Ngọc',
			'王小明',
			'Larkspindle Dairy Co-operative (Süd)'
		]) {
			expect(person(name).success, name).toBe(true);
			expect(clientFormSchema.safeParse({ name }).success, name).toBe(true);
			expect(unsafeNameCharacter(name)).toBeNull();
		}
	});

	it('hold for client company names too', () => {
		const r = clientFormSchema.safeParse({ name: 'Tarnwhistle \u202Erepap' });
		expect(r.success).toBe(false);
		expect(r.error!.issues[0].message).toBe(
			'The name holds a hidden character (U+202E) that breaks the line or turns the text around; type it on one line, as it reads'
		);
	});

	it('still say when a name is missing or too long', () => {
		const schema = nameSchema(10, 'Enter a name.', 'The name');
		expect(schema.safeParse('  ').error!.issues[0].message).toBe('Enter a name.');
		expect(schema.safeParse('x'.repeat(11)).error!.issues[0].message).toBe(
			'The name must be at most 10 characters'
		);
		expect(schema.parse('  Ines  ')).toBe('Ines');
	});
});
