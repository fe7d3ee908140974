/**
 * Invitation and password reset end to end in Chromium: an admin invites a consultant; the
 * message arrives in the local SMTP fake (and in Desk's mailbox page); the link sets a
 * password; the consultant signs in; a password reset works and signs out other devices; used
 * links are refused afterwards.
 */
import { expect, test, type Page } from '@playwright/test';
import { demoFirms, demoPassword } from '../../src/lib/server/seed/demo';
import { openTestDb, rows } from './support/db';
import { linkIn, mailTo, waitForMail } from './support/mailbox';
import { insertUser } from './support/tokens';

// Reset requests from this machine's address count against a daily budget; runs of this file
// by hand on the same database would use it up. Start each run with the loopback's budget whole.
test.beforeAll(async () => {
	const db = openTestDb();
	await db.query(
		`DELETE FROM attempt_counters WHERE scope = 'reset:address'
		 AND subject_hash IN (SHA2('127.0.0.1', 256), SHA2('::ffff:127.0.0.1', 256), SHA2('::1', 256))`
	);
	await db.end();
});

const stamp = Date.now();
const invitee = `new.consultant.${stamp}@example.test`;
const firstPassword = 'condensate return line seven';
const secondPassword = 'flash vessel at four bar g';

/** Opens a page and waits until it is hydrated, so typing is not undone by hydration. */
async function open(page: Page, url: string) {
	const res = await page.goto(url);
	await page.waitForLoadState('networkidle');
	return res;
}

async function signIn(page: Page, email: string, password: string) {
	await open(page, '/signin');
	await page.getByLabel('E-mail address').fill(email);
	await page.getByLabel('Password').fill(password);
	await page.getByRole('button', { name: 'Sign in' }).click();
}

test('an invited consultant sets a password, signs in, resets it; used links are refused', async ({
	browser
}) => {
	test.setTimeout(60_000);
	const since = new Date();

	// The admin invites a consultant from Desk → People.
	const adminContext = await browser.newContext();
	const admin = await adminContext.newPage();
	await signIn(admin, 'admin@cinderbrook.example', demoPassword);
	await expect(admin).toHaveURL((u) => u.pathname === '/desk');
	await admin.getByRole('link', { name: 'People' }).click();
	const inviteForm = admin.getByRole('region', { name: 'Invite a person' });
	await inviteForm.getByLabel('E-mail address').fill(invitee);
	await inviteForm.getByLabel('Role', { exact: true }).selectOption('consultant');
	await inviteForm.getByRole('button', { name: 'Send invitation' }).click();
	await expect(admin.getByRole('status').filter({ hasText: 'Invitation sent' })).toContainText(
		invitee
	);
	await expect(admin.locator(`[data-invitation="${invitee}"]`)).toBeVisible();

	// The message reached the SMTP fake, with both bodies, and shows in the mailbox page.
	const mail = await waitForMail(invitee, /invited you to Steamwisp/, since);
	expect(mail.message.subject).toBe(
		'Ines Okafor invited you to Steamwisp (Cinderbrook Energy Partners)'
	);
	expect(mail.message.html).toContain('Set up my account');
	const inviteLink = linkIn(mail.message.text, '/invitation/');
	await admin.getByRole('link', { name: 'Mailbox (development)' }).click();
	await admin.getByRole('link', { name: mail.message.subject }).first().click();
	await expect(admin.getByTestId('mail-link')).toHaveText(inviteLink);

	// The invitee follows the link and chooses a name and password.
	const inviteeContext = await browser.newContext();
	const person = await inviteeContext.newPage();
	await open(person, inviteLink);
	await expect(person.getByRole('heading', { name: 'Set up your account' })).toBeVisible();
	await expect(person.getByText(invitee)).toBeVisible();
	await person.getByLabel('Your name').fill('Noor Castellanos');
	await person.getByLabel('Password', { exact: true }).fill(firstPassword);
	await person.getByLabel('The same password again').fill(firstPassword);
	await person.getByRole('button', { name: 'Create my account' }).click();
	await expect(person).toHaveURL(/\/signin\?done=welcome/);
	await expect(person.getByRole('status')).toContainText('Your account is ready');

	// …and signs in as a consultant.
	await signIn(person, invitee, firstPassword);
	await expect(person).toHaveURL((u) => u.pathname === '/desk');
	await expect(person.getByText('Noor Castellanos, consultant')).toBeVisible();

	// The invitation link is spent.
	const again = await open(person, inviteLink);
	expect(again?.status()).toBe(410);
	await expect(person.getByText('This link has already been used.')).toBeVisible();

	// Password reset, from another browser (the consultant stays signed in in the first).
	const resetContext = await browser.newContext();
	const forgot = await resetContext.newPage();
	await open(forgot, '/signin');
	await forgot.getByRole('link', { name: 'Forgot your password?' }).click();
	await expect(forgot.getByRole('heading', { name: 'Choose a new password' })).toBeVisible();
	await forgot.getByLabel('E-mail address').fill(invitee);
	await forgot.getByRole('button', { name: 'Send me a link' }).click();
	await expect(forgot.getByRole('status')).toContainText(
		`If ${invitee} belongs to an active Steamwisp account`
	);
	const resetMail = await waitForMail(invitee, /^Choose a new Steamwisp password$/, since);
	const resetLink = linkIn(resetMail.message.text, '/password/reset/');
	await open(forgot, resetLink);
	await forgot.getByLabel('New password').fill(secondPassword);
	await forgot.getByLabel('The same password again').fill(secondPassword);
	await forgot.getByRole('button', { name: 'Save the new password' }).click();
	await expect(forgot).toHaveURL(/\/signin\?done=reset/);

	// Every session of the account ended: the first browser is signed out.
	await person.goto('/desk');
	await expect(person).toHaveURL(/\/signin\?next=%2Fdesk/);
	await waitForMail(invitee, /password was changed/, since);

	// The old password no longer works; the new one does.
	await signIn(forgot, invitee, firstPassword);
	await expect(forgot.getByRole('alert')).toContainText('do not match');
	await signIn(forgot, invitee, secondPassword);
	await expect(forgot).toHaveURL((u) => u.pathname === '/desk');

	// The reset link is spent too, and says so.
	const reused = await open(forgot, resetLink);
	expect(reused?.status()).toBe(410);
	await expect(forgot.getByText('This link has already been used.')).toBeVisible();

	for (const c of [adminContext, inviteeContext, resetContext]) await c.close();

	// Each step left its row in the audit log, and no row holds a token.
	const db = openTestDb();
	const log = await rows<{ action: string; text: string }>(
		db,
		`SELECT a.action, CONCAT_WS(' ', a.before, a.after) AS text FROM audit_log a
		 JOIN users u ON u.email = ?
		 LEFT JOIN tokens t ON t.id = a.entity_id AND t.email = u.email
		 WHERE a.entity_id = u.id OR t.id IS NOT NULL
		 ORDER BY a.id`,
		[invitee]
	);
	await db.end();
	expect(log.map((r) => r.action)).toEqual([
		'invite',
		'invite-accept',
		'sign-in',
		'reset-request',
		'password-reset',
		'sign-in-failed',
		'sign-in'
	]);
	for (const link of [inviteLink, resetLink]) {
		const token = link.split('/').pop()!;
		expect(log.some((r) => (r.text ?? '').includes(token))).toBe(false);
	}
});

test('asking to reset an unknown address looks the same and sends nothing', async ({ page }) => {
	const known = `known.${stamp}@example.test`;
	const db = openTestDb();
	await insertUser(db, {
		firmId: demoFirms[1].id,
		email: known,
		password: 'a long known password'
	});
	await db.end();
	const unknown = `nobody.${stamp}@example.test`;
	const answers: string[] = [];
	for (const email of [known, unknown]) {
		await open(page, '/password/forgot');
		await page.getByLabel('E-mail address').fill(email);
		await page.getByRole('button', { name: 'Send me a link' }).click();
		const status = page.getByRole('status');
		await expect(status).toContainText('If');
		answers.push((await status.innerText()).replace(email, 'ADDRESS'));
	}
	expect(answers[1]).toBe(answers[0]);
	await waitForMail(known, /^Choose a new Steamwisp password$/);
	expect(await mailTo(unknown)).toEqual([]);
});
