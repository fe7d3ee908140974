/** An invented site for the form specs: two headers, one area, at about 540 m elevation. */
import type { FormContext } from './types';

export const HEADER_ID = '0b7c6f1e-6a43-4c36-9a35-5b0c3a1f0a01';
export const LOW_HEADER_ID = '0b7c6f1e-6a43-4c36-9a35-5b0c3a1f0a02';
export const AREA_ID = '5d2f1a7e-0c1b-4e7a-8f00-2a6b7c8d9e01';

/** Invented atmosphere, MPa absolute (a site a few hundred metres up). */
export const ATMOSPHERE = 0.095;

export function formContext(system: 'SI' | 'US' = 'SI'): FormContext {
	return {
		system,
		atmosphericPressure: ATMOSPHERE,
		headers: [
			// 10 bar g and 2 bar g at this site's atmosphere.
			{ id: HEADER_ID, name: 'Process steam', pressure: 1.095, sortOrder: 1 },
			{ id: LOW_HEADER_ID, name: 'Heating', pressure: 0.295, sortOrder: 2 }
		],
		areas: [{ id: AREA_ID, name: 'Boiler house' }],
		id: '7e0f3c52-1d9a-4b0e-9c61-3f5a2b7c8d01',
		surveyId: '9a1b2c3d-4e5f-4a6b-8c7d-0e1f2a3b4c5d',
		createdAt: '2026-04-14T08:00:00.000Z',
		updatedAt: '2026-04-14T08:05:00.000Z'
	};
}
