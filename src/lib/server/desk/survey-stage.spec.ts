import { describe, expect, it } from 'vitest';
import { nextStage, stageMoveProblem } from './survey-stage';

const facts = (
	from: Parameters<typeof stageMoveProblem>[0]['from'],
	findings = 0,
	published = false
) => ({
	from,
	findings,
	published
});

describe('stage moves at the Desk', () => {
	it('lets a survey go out, come in for checking and close', () => {
		expect(stageMoveProblem(facts('planned'), 'in-field')).toBeNull();
		expect(stageMoveProblem(facts('in-field', 4), 'in-review')).toBeNull();
		expect(stageMoveProblem(facts('in-review', 4), 'in-field')).toBeNull();
		expect(stageMoveProblem(facts('in-review', 4), 'closed')).toBeNull();
		expect(stageMoveProblem(facts('published', 4, true), 'closed')).toBeNull();
	});

	it('refuses back to planned once findings exist, and says how many', () => {
		expect(stageMoveProblem(facts('in-field'), 'planned')).toBeNull();
		expect(stageMoveProblem(facts('in-field', 1), 'planned')).toContain('1 finding was');
		expect(stageMoveProblem(facts('in-field', 12), 'planned')).toContain('12 findings were');
	});

	it('never publishes, never repeats the stage, never skips the checking', () => {
		expect(stageMoveProblem(facts('in-review'), 'published')).toContain('publishing step');
		expect(stageMoveProblem(facts('in-field'), 'in-field')).toContain('already');
		expect(stageMoveProblem(facts('in-field', 3), 'closed')).toContain('cannot go from');
		expect(stageMoveProblem(facts('closed', 3, true), 'in-review')).toContain('went to the client');
		expect(stageMoveProblem(facts('closed', 3, false), 'in-review')).toBeNull();
	});

	it('names publishing as the step after review', () => {
		expect(nextStage('in-review')).toBe('published');
		expect(nextStage('closed')).toBeNull();
	});
});
