import {
	changeRoleSchema,
	invitationSchema,
	inviteSchema,
	personSchema
} from '$lib/schemas/people';
import {
	invite,
	inviteLimitMessage,
	openInvitations,
	revokeInvitation
} from '$lib/server/auth/invitations';
import { mailLinkOrigin } from '$lib/server/auth/origin';
import {
	changeRole,
	disablePerson,
	enablePerson,
	firmClients,
	firmPeople
} from '$lib/server/auth/people';
import { formProblem, parseForm } from '$lib/server/forms';
import { invitableRoles, requirePerson, requireRole, roleCan } from '$lib/server/policy';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'people.view');
	const [people, invitations, clients] = await Promise.all([
		firmPeople(user.firmId),
		openInvitations(user.firmId),
		firmClients(user.firmId)
	]);
	return {
		me: user.id,
		people,
		invitations,
		clients,
		invitable: invitableRoles[user.role],
		canManage: roleCan(user.role, 'people.manage')
	};
};

export const actions: Actions = {
	invite: async (event) => {
		const user = requireRole(event, 'people.invite');
		const form = await parseForm(event.request, inviteSchema, ['email', 'role', 'clientCompanyId']);
		if (!form.ok) return form.failure;
		const outcome = await invite(user, form.data, {
			origin: mailLinkOrigin(event.url),
			address: event.getClientAddress()
		});
		const values = form.fields;
		switch (outcome.kind) {
			case 'sent':
				return { invited: form.data.email };
			case 'member':
				return formProblem(409, `${outcome.name} already has an account with this address.`, {
					values,
					errors: { email: 'This address already has an account in your firm.' }
				});
			case 'no-such-client': {
				const error = 'Choose one of your firm’s client companies.';
				return formProblem(400, error, { values, errors: { clientCompanyId: error } });
			}
			case 'limited':
				return formProblem(429, inviteLimitMessage(outcome.limit, outcome.waitMs), { values });
			case 'mail-off':
				return formProblem(
					503,
					'This server sends no e-mail (no mail server is set up), so it cannot send invitations. Ask whoever runs it to set STEAMWISP_SMTP_URL.',
					{ values }
				);
			case 'not-sent':
				return formProblem(
					503,
					'The invitation could not be e-mailed just now, so it was not kept. Try again in a minute.',
					{ values }
				);
		}
	},

	revoke: async (event) => {
		const user = requireRole(event, 'people.invite');
		const form = await parseForm(event.request, invitationSchema);
		if (!form.ok) return form.failure;
		const outcome = await revokeInvitation(user, form.data.invitationId, event.getClientAddress());
		if (outcome.kind === 'already-used') {
			return formProblem(409, 'That invitation was already accepted.');
		}
		return { revoked: true };
	},

	changeRole: async (event) => {
		const user = requireRole(event, 'people.manage');
		const form = await parseForm(event.request, changeRoleSchema);
		if (!form.ok) return form.failure;
		const person = await requirePerson(user, form.data.userId, 'write');
		await changeRole(user, person, form.data, event.getClientAddress());
		return { changed: person.id };
	},

	disable: async (event) => {
		const user = requireRole(event, 'people.manage');
		const form = await parseForm(event.request, personSchema);
		if (!form.ok) return form.failure;
		const person = await requirePerson(user, form.data.userId, 'write');
		await disablePerson(user, person, event.getClientAddress());
		return { disabled: person.id };
	},

	enable: async (event) => {
		const user = requireRole(event, 'people.manage');
		const form = await parseForm(event.request, personSchema);
		if (!form.ok) return form.failure;
		const person = await requirePerson(user, form.data.userId, 'write');
		await enablePerson(user, person, event.getClientAddress());
		return { enabled: person.id };
	}
};
