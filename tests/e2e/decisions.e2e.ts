import { expect, test, type Page } from '@playwright/test';
import { demoPassword, demoUsers } from '../../src/lib/server/seed/demo';
import { maltingsClientUser } from '../../src/lib/server/seed/maltings';
import { brackenford, unpublishBrackenford } from './support/brackenford';
import { openTestDb, rows, type Db } from './support/db';
import { signInHere } from './support/worker';

/**
 * A client's decisions in the browser (docs/decisions.md): the consultant publishes the
 * Brackenford survey; its works engineer, on a phone, opens a finding from the survey's Ladder
 * page, approves it with a comment, is refused a booking for yesterday (nothing written), books
 * another finding for a later day with who does it, and asks a question; the consultant sees
 * both decisions and the question on the Desk's decisions page and answers; the client reads
 * the answer. The page is printable without its forms and carries the caution.
 */
const consultant = demoUsers.find(
	(u) => u.role === 'consultant' && u.email.includes('cinderbrook')
)!;
const shots = '.data/test-results/decisions';
const phone = { width: 390, height: 844 };

let db: Db;
test.beforeAll(() => {
	db = openTestDb();
});
test.afterAll(async () => {
	await unpublishBrackenford(db);
	await db?.end();
});

/** The reader's calendar day `days` from today, as the date field takes it. */
function localDay(days: number): string {
	const d = new Date();
	d.setDate(d.getDate() + days);
	const pad = (n: number) => String(n).padStart(2, '0');
	return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}`;
}

const decisionsOf = async (findingId: string) =>
	Number(
		(
			await rows<{ n: number }>(db, 'SELECT COUNT(*) AS n FROM decisions WHERE finding_id = ?', [
				findingId
			])
		)[0].n
	);

async function openRow(page: Page, n: number): Promise<string> {
	await page.goto(`/ladder/surveys/${brackenford}`);
	const link = page.getByTestId('ladder-list').locator('tbody tr').nth(n).getByRole('link');
	await link.click();
	await expect(page).toHaveURL(/\/ladder\/findings\/[0-9a-f-]{36}$/);
	return new URL(page.url()).pathname.split('/').at(-1)!;
}

test('a client approves and books repairs and asks; the consultant answers on the Desk', async ({
	page,
	browser
}) => {
	// The consultant publishes the checked survey to the maltings.
	await signInHere(page, consultant.email, demoPassword, `/desk/surveys/${brackenford}/publish`);
	await page.getByRole('button', { name: 'Publish to the client' }).click();
	await expect(page.getByText(/Revision 1 is published/)).toBeVisible();

	const clientContext = await browser.newContext({ viewport: phone });
	const client = await clientContext.newPage();
	await signInHere(
		client,
		maltingsClientUser.email,
		demoPassword,
		`/ladder/surveys/${brackenford}`
	);
	await expect(client.getByTestId('ladder-list')).toContainText('No decision yet');

	// The biggest saving first: approve it, with a comment.
	const first = await openRow(client, 0);
	await expect(client.getByRole('heading', { level: 1 })).toBeVisible();
	await expect(client.getByTestId('item-figures')).toContainText('What it costs you each year');
	await expect(client.getByTestId('current-decision')).toContainText('No decision yet');
	await expect(client.getByRole('note', { name: 'Safety caution' })).toBeVisible();
	await expect(client.getByText(/not guarantees of savings/)).toBeVisible();
	// Readable on a phone: nothing runs off the side.
	expect(
		await client.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth)
	).toBe(true);
	await client.getByLabel('Approve the repair').check();
	await client
		.getByLabel('A comment for your consultant (optional)')
		.fill('Go ahead with this one.');
	await client.getByRole('button', { name: 'Save the decision' }).click();
	await expect(client.getByText('Saved: Approved for repair.')).toBeVisible();
	await expect(client.getByTestId('current-decision')).toContainText('Approved for repair');
	await expect(client.getByTestId('comments')).toContainText('Go ahead with this one.');
	await client.screenshot({ path: `${shots}/approved-phone.png`, fullPage: true });
	await client.emulateMedia({ media: 'print' });
	await expect(client.getByTestId('decision-form')).toBeHidden();
	await expect(client.getByTestId('decision-history')).toBeVisible();
	await client.screenshot({ path: `${shots}/approved-print.png`, fullPage: true });
	await client.emulateMedia({ media: 'screen' });

	// Its job (a measure) opens from it, with its findings and its own decision to take.
	const [job] = await rows<{ id: string; name: string }>(
		db,
		`SELECT m.id, m.name FROM findings f JOIN measures m ON m.id = f.measure_id WHERE f.id = ?`,
		[first]
	);
	// The seed puts the biggest saving of the maltings into a job.
	expect(job, 'the first finding is part of a job').toBeDefined();
	await client.getByRole('link', { name: job.name }).click();
	await expect(client).toHaveURL(new RegExp(`/ladder/measures/${job.id}$`));
	await expect(client.getByRole('heading', { level: 1 })).toHaveText(job.name);
	await expect(client.getByTestId('item-figures')).toContainText('What the job costs');
	await expect(
		client.getByTestId('measure-findings').locator(`a[href="/ladder/findings/${first}"]`)
	).toBeVisible();
	await expect(client.getByTestId('current-decision')).toContainText('No decision yet');
	await client.screenshot({ path: `${shots}/measure-phone.png`, fullPage: true });

	// The second: a booking for yesterday is refused beside the date, and nothing is written.
	const second = await openRow(client, 1);
	expect(second).not.toBe(first);
	await client.getByLabel('Book the repair for a day').check();
	await client.getByLabel('Day', { exact: true }).fill(localDay(-1));
	await client.getByLabel('Who will do it (optional, for a booking)').fill('Maltings fitters');
	await client.getByRole('button', { name: 'Save the decision' }).click();
	await expect(
		client.getByText(/cannot be booked for a day that has passed/).first()
	).toBeVisible();
	await expect(client.getByLabel('Day', { exact: true })).toHaveAttribute('aria-invalid', 'true');
	await expect(client.getByLabel('Who will do it (optional, for a booking)')).toHaveValue(
		'Maltings fitters'
	);
	expect(await decisionsOf(second)).toBe(0);
	await client.getByLabel('Day', { exact: true }).fill(localDay(14));
	await client.getByRole('button', { name: 'Save the decision' }).click();
	await expect(client.getByText('Saved: Repair booked.')).toBeVisible();
	await expect(client.getByTestId('current-decision')).toContainText('Repair booked');
	await expect(client.getByTestId('current-decision')).toContainText('by Maltings fitters');
	expect(await decisionsOf(second)).toBe(1);

	// And a question.
	await client
		.getByLabel('Ask or tell your consultant something')
		.fill('Can the fitters do it during the May shutdown?');
	await client.getByRole('button', { name: 'Send the comment' }).click();
	await expect(client.getByText('Your comment is sent to your consultant.')).toBeVisible();
	await expect(client.getByTestId('comments')).toContainText('during the May shutdown?');

	// The survey's list shows both decisions.
	await client.goto(`/ladder/surveys/${brackenford}`);
	const list = client.getByTestId('ladder-list').locator('tbody tr');
	await expect(list.nth(0)).toContainText('Approved for repair');
	await expect(list.nth(1)).toContainText('Repair booked');

	// The consultant sees them on the Desk and answers the question.
	await page.goto(`/desk/surveys/${brackenford}`);
	await page.getByRole('link', { name: "The client's decisions and comments" }).click();
	await expect(page).toHaveURL(new RegExp(`/desk/surveys/${brackenford}/decisions$`));
	await expect(page.getByTestId('decision-counts')).toContainText('1 approved for repair');
	await expect(page.getByTestId('decision-counts')).toContainText('1 repair booked');
	const asked = page.locator(`[data-item="${second}"]`);
	await expect(asked).toContainText('Repair booked');
	await expect(asked).toContainText('Waits for your answer');
	await expect(page.locator(`[data-item="${first}"]`)).toContainText('Go ahead with this one.');
	await asked.getByLabel('Answer').fill('Yes: the May shutdown suits, we will send the job sheet.');
	await asked.getByRole('button', { name: 'Send the answer' }).click();
	await expect(page.getByText('Your answer is on the client’s page.')).toBeVisible();
	await expect(page.locator(`[data-item="${second}"]`)).not.toContainText('Waits for your answer');
	await page.screenshot({ path: `${shots}/desk-decisions.png`, fullPage: true });

	// The client reads the answer.
	await client.goto(`/ladder/findings/${second}`);
	const answer = client.getByTestId('comments').locator('li[data-from="firm"]');
	await expect(answer).toContainText('the May shutdown suits');
	await expect(answer).toContainText('(consultant)');
	await clientContext.close();
});
