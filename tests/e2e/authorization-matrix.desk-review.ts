/** Authorization matrix entries for the Desk's the findings review, its API and conflicts (see authorization-matrix.table.ts). */
import type { Case } from './support/matrix-kit';

export const deskReviewMatrix: Record<string, Record<string, Case>> = {};
