/** Authorization matrix entries for the Desk's clients, sites, cost basis, headers and areas (see authorization-matrix.table.ts). */
import type { Case } from './support/matrix-kit';

export const deskAreaMatrix: Record<string, Record<string, Case>> = {};
