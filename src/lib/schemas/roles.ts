import { z } from 'zod';

/** Who a person is in a firm: it decides which surfaces (Walk, Desk, Ladder) they reach. */
export const roles = ['admin', 'consultant', 'auditor', 'client'] as const;
export type Role = (typeof roles)[number];
export const roleSchema = z.enum(roles, {
	error: 'Choose a role: admin, consultant, auditor or client.'
});

export const unitSystems = ['SI', 'US'] as const;
export type UnitSystemId = (typeof unitSystems)[number];
