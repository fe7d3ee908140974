/** The account messages Steamwisp sends, in its own words. */
import type { Role } from '../../../schemas/roles';
import { render, type RenderedMessage } from './render';

const roleWords: Record<Role, string> = {
	admin: 'a firm admin (people, roles and firm settings, as well as all survey work)',
	consultant: 'a consultant (sites, surveys, review and publishing in Desk)',
	auditor: 'a field auditor (recording traps, leaks, insulation and headers on the Walk)',
	client: 'a client user (the savings list your consultant publishes, in Ladder)'
};

export function invitationMessage(m: {
	firmName: string;
	inviterName: string;
	role: Role;
	clientName: string | null;
	url: string;
	days: number;
}): RenderedMessage {
	const forClient = m.clientName ? ` for ${m.clientName}` : '';
	return render({
		subject: `${m.inviterName} invited you to Steamwisp (${m.firmName})`,
		greeting: 'Hello,',
		paragraphs: [
			`${m.inviterName} of ${m.firmName} has invited you to work with them in Steamwisp as ${roleWords[m.role]}${forClient}.`,
			'Open the link below to choose your password and finish setting up your account.'
		],
		action: { label: 'Set up my account', url: m.url },
		after: [
			`The link works once and for ${m.days} days. If you were not expecting this, ignore this message: nothing happens until the link is used.`
		]
	});
}

export function alreadyRegisteredMessage(m: {
	firmName: string;
	inviterName: string;
}): RenderedMessage {
	return render({
		subject: `About your invitation from ${m.firmName}`,
		greeting: 'Hello,',
		paragraphs: [
			`${m.inviterName} of ${m.firmName} tried to invite this e-mail address to Steamwisp, but it already belongs to a Steamwisp account.`,
			'One address can hold one account. If you want to work with them as well, ask them to invite another address of yours.'
		],
		after: [
			'If you were not expecting this, you can ignore this message; your account is unchanged.'
		]
	});
}

export function passwordResetMessage(m: {
	name: string;
	url: string;
	minutes: number;
}): RenderedMessage {
	return render({
		subject: 'Choose a new Steamwisp password',
		greeting: `Hello ${m.name},`,
		paragraphs: [
			'Someone (we hope you) asked to choose a new password for your Steamwisp account.',
			'Open the link below to choose one. Your current password keeps working until you do.'
		],
		action: { label: 'Choose a new password', url: m.url },
		after: [
			`The link works once and for ${m.minutes} minutes. If you did not ask for it, ignore this message.`
		]
	});
}

export function passwordChangedMessage(m: { name: string; url: string }): RenderedMessage {
	return render({
		subject: 'Your Steamwisp password was changed',
		greeting: `Hello ${m.name},`,
		paragraphs: [
			'The password of your Steamwisp account was just changed, and every device that was signed in has been signed out.',
			'If that was you, there is nothing more to do.'
		],
		action: { label: 'Not you? Choose a new password now', url: m.url },
		after: ['If you did not change it, choose a new password at once and tell your firm admin.']
	});
}

export function signInAttackMessage(m: {
	name: string;
	failures: number;
	url: string;
}): RenderedMessage {
	return render({
		subject: 'Someone is trying to sign in to your Steamwisp account',
		greeting: `Hello ${m.name},`,
		paragraphs: [
			`Someone has just typed a wrong password for your Steamwisp account ${m.failures} times in a row, from a browser you have not signed in with before. If that was you, there is nothing to do.`,
			'If it was not you, your account is still safe: browsers you have signed in with before keep working as usual, while new ones now have to wait longer and longer between tries.',
			'A long password nobody can guess is what keeps it that way. If yours is short, or used elsewhere too, choose a new one.'
		],
		action: { label: 'Choose a new password', url: m.url },
		after: [
			'We tell you once each time this starts, not for every try. If it goes on, tell your firm admin.'
		]
	});
}
