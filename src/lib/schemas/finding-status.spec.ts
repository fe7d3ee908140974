import { describe, expect, it } from 'vitest';
import { receivedStatusSchema } from './finding-status';
import { FINDING_STATUSES, lifecycleStatus } from './finding-vocabulary';

describe('a finding status is its lifecycle only', () => {
	it('has no client decision among its statuses', () => {
		expect([...FINDING_STATUSES]).toEqual(['draft', 'reviewed', 'published']);
	});

	it('reads a former decision word as published, and an unknown word as nothing', () => {
		for (const word of ['approved', 'scheduled', 'repaired', 'declined', 'verified']) {
			expect(lifecycleStatus(word)).toBe('published');
		}
		expect(lifecycleStatus('reviewed')).toBe('reviewed');
		expect(lifecycleStatus('lost')).toBeNull();
	});

	it('takes a reply of before the change, and refuses a word it does not know', () => {
		expect(receivedStatusSchema.parse('approved')).toBe('published');
		expect(receivedStatusSchema.parse('draft')).toBe('draft');
		const bad = receivedStatusSchema.safeParse('lost');
		expect(bad.success).toBe(false);
		expect(bad.error?.issues[0].message).toMatch(/draft, reviewed, published/);
	});
});
