import { error } from '@sveltejs/kit';
import { firmMailbox, mailboxAvailable } from '$lib/server/mail/dev-mailbox';
import { requireRole } from '$lib/server/policy';
import type { PageServerLoad } from './$types';

/** Development only: what the local SMTP fake received for this firm. */
export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'mailbox.read');
	if (!mailboxAvailable()) error(404, 'Not found.');
	event.setHeaders({ 'cache-control': 'no-store' });
	const messages = await firmMailbox(user.firmId);
	return {
		messages: messages.map((m) => ({
			id: m.id,
			receivedAt: m.receivedAt,
			to: m.rcptTo.join(', '),
			subject: m.subject
		}))
	};
};
