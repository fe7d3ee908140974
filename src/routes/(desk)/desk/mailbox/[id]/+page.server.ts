import { error } from '@sveltejs/kit';
import { firmMessage, mailboxAvailable } from '$lib/server/mail/dev-mailbox';
import { requireRole } from '$lib/server/policy';
import type { PageServerLoad } from './$types';

/** One message the local fake kept for this firm; any other id is simply not found. */
export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'mailbox.read');
	if (!mailboxAvailable()) error(404, 'Not found.');
	const found = await firmMessage(user.firmId, event.params.id);
	if (!found) error(404, 'Not found.');
	event.setHeaders({ 'cache-control': 'no-store', 'referrer-policy': 'no-referrer' });
	const { meta, message } = found;
	return {
		message: {
			receivedAt: meta.receivedAt,
			from: message.from,
			to: message.to,
			subject: message.subject,
			text: message.text,
			html: message.html,
			links: [...new Set((message.text ?? '').match(/https?:\/\/[^\s<>"]+/g) ?? [])]
		}
	};
};
