/**
 * 3,000 invented findings for the Walk benchmark's filter measure, in the device database's
 * row shape (src/lib/offline/db.ts DeviceFinding), spread over the demo site's areas.
 */
import type { DeviceFinding } from '../src/lib/offline/db';
import { demoSites } from '../src/lib/server/seed/demo';

const words = ['steam hall', 'dryer bay', 'valve gallery', 'boiler house', 'pump room', 'roof run'];
const conditions = ['working', 'leaking', 'failed-open', 'failed-closed'] as const;

export function benchFindings(surveyId: string, count: number): DeviceFinding[] {
	const headerId = demoSites[0].headers[0].id;
	const at = '2026-11-17T09:00:00.000Z';
	return Array.from({ length: count }, (_, i): DeviceFinding => {
		const id = `00000000-0000-4000-8000-${String(i).padStart(12, '0')}`;
		const base = {
			id,
			surveyId,
			headerId,
			location: `${words[i % words.length]} line ${i}`,
			notes: i % 7 === 0 ? 'steam hiss near the valve' : '',
			photoIds: [],
			createdAt: at,
			updatedAt: at
		};
		const capture =
			i % 3 === 0
				? { ...base, kind: 'leak' as const, inputs: { sizeClass: 'small' as const } }
				: {
						...base,
						kind: 'trap' as const,
						assetTag: `BT-${String(i).padStart(4, '0')}`,
						inputs: {
							trapType: 'thermodynamic' as const,
							dn: 15 as const,
							condition: conditions[i % conditions.length],
							discharge: 'atmosphere' as const
						}
					};
		return {
			id,
			surveyId,
			kind: capture.kind,
			capture,
			version: 0,
			status: 'draft',
			pending: 1,
			deleted: 0,
			updatedAt: at
		};
	});
}
