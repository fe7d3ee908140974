/** Forms of Desk's people pages: invitations, role changes, disabling. */
import { z } from 'zod';
import { emailSchema } from './account';
import { roleSchema } from './roles';

const optionalCompany = z
	.string()
	.trim()
	.max(36)
	.optional()
	.transform((v) => (v ? v : null))
	.pipe(z.uuid({ error: 'Choose a client company from the list.' }).nullable());

/** A client user belongs to one client company; nobody else belongs to one. */
const companyMatchesRole = <T extends { role: string; clientCompanyId: string | null }>(v: T) =>
	v.role !== 'client' || v.clientCompanyId !== null;
const companyError = {
	error: 'A client user belongs to one client company: choose it.',
	path: ['clientCompanyId']
};
const dropCompanyUnlessClient = <T extends { role: string; clientCompanyId: string | null }>(
	v: T
): T => ({ ...v, clientCompanyId: v.role === 'client' ? v.clientCompanyId : null });

export const inviteSchema = z
	.object({ email: emailSchema, role: roleSchema, clientCompanyId: optionalCompany })
	.refine(companyMatchesRole, companyError)
	.transform(dropCompanyUnlessClient);
export type Invite = z.infer<typeof inviteSchema>;

const personId = z.uuid({ error: 'That person is not in the list.' });

export const changeRoleSchema = z
	.object({ userId: personId, role: roleSchema, clientCompanyId: optionalCompany })
	.refine(companyMatchesRole, companyError)
	.transform(dropCompanyUnlessClient);

export const personSchema = z.object({ userId: personId });

export const invitationSchema = z.object({
	invitationId: z.uuid({ error: 'That invitation is not in the list.' })
});
