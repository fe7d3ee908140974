import { itemActions, loadItem } from '$lib/server/decisions/ladder-route';
import type { Actions, PageServerLoad } from './$types';

/**
 * One published finding for the client (docs/decisions.md): its frozen figures and photos, the
 * client's decision and the comments. The policy decides per finding: a client user of the
 * company whose published survey holds it, in the revision they are shown; else 404.
 */
export const load: PageServerLoad = (event) => loadItem(event, 'finding');

const { decide, comment } = itemActions('finding');
export const actions: Actions = { decide, comment };
