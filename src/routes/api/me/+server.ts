import { db } from '$lib/server/db';
import { requireUser } from '$lib/server/policy';
import { walkPerson } from '$lib/server/walk/person';
import { privateJson } from '$lib/server/walk/respond';
import type { RequestHandler } from './$types';

/** Who is signed in (walkPersonSchema); 401 when nobody is. */
export const GET: RequestHandler = async (event) =>
	privateJson(await walkPerson(db, requireUser(event)));
