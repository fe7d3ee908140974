/**
 * One survey's records, read from the device database for a page of the Walk, with the
 * plain-words reason when they cannot be shown (not on this device, storage refused).
 */
import { surveyBundle, type SurveyBundle } from '$lib/offline/snapshot';
import type { DeviceDatabase } from '$lib/offline/db';

export class BundleLoader {
	bundle = $state<SurveyBundle | null>(null);
	problem = $state('');
	loading = $state(true);

	async load(db: DeviceDatabase, surveyId: string): Promise<void> {
		this.loading = true;
		try {
			this.bundle = await surveyBundle(db, surveyId);
			this.problem = this.bundle
				? ''
				: 'This survey is not on this device. Go back to your surveys and take it offline first.';
		} catch (e) {
			this.problem = `This device could not read the survey (${(e as Error).message}).`;
		} finally {
			this.loading = false;
		}
	}
}
