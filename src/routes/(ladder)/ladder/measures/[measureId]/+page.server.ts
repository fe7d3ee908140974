import { itemActions, loadItem } from '$lib/server/decisions/ladder-route';
import type { Actions, PageServerLoad } from './$types';

/**
 * One published measure (a job of several findings) for the client (docs/decisions.md): its
 * frozen costs, saving and findings, the client's decision and the comments; else 404.
 */
export const load: PageServerLoad = (event) => loadItem(event, 'measure');

const { decide, comment } = itemActions('measure');
export const actions: Actions = { decide, comment };
