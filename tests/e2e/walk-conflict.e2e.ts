import { expect, test, type BrowserContext, type Page } from '@playwright/test';
import { demoPassword, demoSurveys, demoUsers } from '../../src/lib/server/seed/demo';
import { demoFindings } from '../../src/lib/server/seed/findings';
import { openTestDb, rows } from './support/db';
import { signInHere, waitForActiveWorker } from './support/worker';

/**
 * Two people edit the same finding with no signal: the auditor's phone and the consultant's
 * tablet. The first to send wins by version; the other's edit is kept whole as a conflict on the
 * server, and their device says so on the finding and in the round. Both edits stay readable.
 */
const survey = demoSurveys[0];
const round = `/walk/surveys/${survey.id}`;
const finding = demoFindings.find((f) => f.surveyId === survey.id && f.kind === 'leak')!;
const person = (email: string) => demoUsers.find((u) => u.email === email)!;
// Words of this run only, so a rerun on the same database checks its own edits.
const run = Date.now().toString(36);
const auditorNotes = `Plume reaches the walkway: tape off the gallery (${run})`;
const consultantNotes = `Gland packing worn, per the site fitter (${run})`;

test.use({ viewport: { width: 390, height: 844 } });

async function takeOffline(context: BrowserContext, email: string): Promise<Page> {
	const page = await context.newPage();
	await signInHere(page, email, demoPassword);
	await waitForActiveWorker(page);
	const card = page.locator(`[data-survey="${survey.id}"]`);
	await card.getByRole('button', { name: 'Take offline' }).click();
	await expect(card.getByText('On this device since')).toBeVisible();
	return page;
}

async function editNotes(page: Page, context: BrowserContext, notes: string) {
	await context.setOffline(true);
	await page.goto(`${round}/findings/${finding.id}`).catch(() => undefined);
	await page.getByLabel('Notes').fill(notes);
	await page.getByRole('button', { name: 'Save', exact: true }).click();
	await expect(page).toHaveURL(round);
}

async function sendAll(page: Page, context: BrowserContext) {
	await context.setOffline(false);
	await page.goto('/walk');
	await page.getByTestId('sync-status').getByRole('button', { name: 'Send now' }).click();
	await expect(page.getByTestId('sync-status')).not.toHaveAttribute('data-sync-phase', 'sending');
	await expect(page.getByTestId('sync-status').getByText(/waiting to send/)).toHaveCount(0, {
		timeout: 20_000
	});
}

test('two devices edit one finding offline: one wins, the other is kept and told', async ({
	browser
}) => {
	test.setTimeout(120_000);
	const phone = await browser.newContext();
	const tablet = await browser.newContext();
	try {
		const auditorPage = await takeOffline(phone, 'auditor@cinderbrook.example');
		const consultantPage = await takeOffline(tablet, 'consultant@cinderbrook.example');
		await editNotes(auditorPage, phone, auditorNotes);
		await editNotes(consultantPage, tablet, consultantNotes);

		await sendAll(auditorPage, phone);
		await expect(auditorPage.getByTestId('sync-words')).toHaveText('All sent');
		await sendAll(consultantPage, tablet);
		const status = consultantPage.getByTestId('sync-status');
		await expect(status).toContainText('1 edit clashed with a newer change on the server');

		// The losing device shows it on the finding and in the round; its own words are kept.
		await consultantPage.goto(`${round}/findings/${finding.id}`);
		await expect(consultantPage.getByTestId('finding-conflict')).toContainText(
			'the server kept their version'
		);
		await expect(consultantPage.getByLabel('Notes')).toHaveValue(consultantNotes);
		await consultantPage.goto(round);
		await consultantPage.getByRole('button', { name: /^Recorded/ }).click();
		await expect(consultantPage.getByTestId('conflict-mark')).toHaveCount(1);

		// Both edits are readable on the server: the winner in the finding, the other kept whole.
		const db = openTestDb();
		try {
			const [row] = await rows<{ notes: string }>(db, 'SELECT notes FROM findings WHERE id = ?', [
				finding.id
			]);
			expect(row.notes).toBe(auditorNotes);
			const kept = await rows<{ data: string | { notes: string }; user_id: string }>(
				db,
				'SELECT data, user_id FROM finding_conflicts WHERE finding_id = ?',
				[finding.id]
			);
			const ours = kept
				.map((k) => ({ ...k, data: typeof k.data === 'string' ? JSON.parse(k.data) : k.data }))
				.filter((k) => (k.data as { notes: string }).notes === consultantNotes);
			expect(ours).toHaveLength(1);
			expect(ours[0].user_id).toBe(person('consultant@cinderbrook.example').id);
		} finally {
			await db.end();
		}
	} finally {
		await phone.close();
		await tablet.close();
	}
});
