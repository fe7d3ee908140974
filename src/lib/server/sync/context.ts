import type { SiteFacts } from './price';

/** What every mutation of one push shares: who sent it, from which device, onto which surveys. */
export interface PushSurvey {
	id: string;
	firmId: string;
	siteId: string;
	/** The survey's stage (surveys.status). */
	stage: string;
}

export interface PushContext {
	user: Pick<SessionUser, 'id' | 'firmId'>;
	deviceId: string;
	/** The request's address, for the audit log. */
	address: string | null;
	/** Every survey the batch names, already authorized for writing. */
	surveys: ReadonlyMap<string, PushSurvey>;
	/** Each site's cost basis, headers and areas, read once per push (price.ts siteFacts). */
	sites: Map<string, Promise<SiteFacts>>;
}

/** Stages in which the Walk may still change a survey's findings. */
export const RECORDING_STAGES: readonly string[] = ['planned', 'in-field', 'in-review'];
