import { describe, expect, it } from 'vitest';
import { parseNumber } from './parse-number';

describe('parseNumber', () => {
	it('reads plain and decimal-comma numbers', () => {
		expect(parseNumber('3.5')).toBe(3.5);
		expect(parseNumber('3,5')).toBe(3.5);
		expect(parseNumber(' 12 ')).toBe(12);
		expect(parseNumber('.5')).toBe(0.5);
		expect(parseNumber('−4')).toBe(-4);
		expect(parseNumber('-0,25')).toBe(-0.25);
	});

	it('reads grouped thousands either way', () => {
		expect(parseNumber('1,234.5')).toBe(1234.5);
		expect(parseNumber('1.234,5')).toBe(1234.5);
		expect(parseNumber('1 234,5')).toBe(1234.5);
		expect(parseNumber('1,000,000')).toBe(1_000_000);
	});

	it('tells an empty field from text that is not a number', () => {
		expect(parseNumber('')).toBeNull();
		expect(parseNumber('   ')).toBeNull();
		expect(parseNumber('abc')).toBeNaN();
		expect(parseNumber('12,5,3')).toBeNaN();
		expect(parseNumber('3..5')).toBeNaN();
		expect(parseNumber('12 bar')).toBeNaN();
	});
});
