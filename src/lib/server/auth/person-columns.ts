import { users } from '../db/schema';

/** A person's columns as the app uses them (the session's person, a person looked up). */
export const personColumns = {
	id: users.id,
	firmId: users.firmId,
	email: users.email,
	name: users.name,
	role: users.role,
	clientCompanyId: users.clientCompanyId,
	disabledAt: users.disabledAt
};
