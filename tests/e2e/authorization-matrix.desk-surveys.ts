/** Authorization matrix entries for the Desk's surveys, auditors and sync state (see authorization-matrix.table.ts). */
import type { Case } from './support/matrix-kit';

export const deskSurveysMatrix: Record<string, Record<string, Case>> = {};
