import {
	COST_BASIS_FIELDS,
	costBasisFormSchema,
	costBasisFormValues
} from '$lib/schemas/desk-cost-basis';
import { personUnits, saveSiteBasis, siteBasisPage, siteDetail } from '$lib/server/desk/sites';
import { parseForm } from '$lib/server/forms';
import { requireRole, requireSiteAccess } from '$lib/server/policy';
import { error } from '@sveltejs/kit';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'survey.manage');
	const { id } = await requireSiteAccess(user, event.params.siteId, 'write');
	const units = await personUnits(user);
	const [{ site }, { current, history }] = await Promise.all([
		siteDetail(user, id),
		siteBasisPage(id)
	]);
	if (!site) error(404, 'Not found.');
	const values = current
		? costBasisFormValues(current.basis, units)
		: {
				// A first basis: the fuel most sites burn, in the unit the person's market prices it.
				'fuel.kind': 'natural-gas',
				'fuel.unit': units === 'US' ? 'MMBtu' : 'GJ',
				currency: site.currency
			};
	return {
		site: { id: site.id, name: site.name, currency: site.currency },
		units,
		values,
		history: history.map((v) => ({
			id: v.id,
			number: v.number,
			basis: v.basis,
			note: v.note,
			createdAt: v.createdAt.toISOString(),
			createdBy: v.createdBy,
			current: v.current,
			frozenFor: v.frozenFor
		}))
	};
};

export const actions: Actions = {
	save: async (event) => {
		const user = requireRole(event, 'survey.manage');
		const { id } = await requireSiteAccess(user, event.params.siteId, 'write');
		const schema = costBasisFormSchema(await personUnits(user));
		const form = await parseForm(event.request, schema, [...COST_BASIS_FIELDS], { nested: true });
		if (!form.ok) return form.failure;
		const saved = await saveSiteBasis(user, id, form.data);
		return {
			savedBasis: { number: saved.number, refreshed: saved.refreshed, recomputed: saved.recomputed }
		};
	}
};
