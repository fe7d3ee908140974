/** `GET /api/surveys`: the surveys this person may record on, by the policy's survey scope. */
import { surveyListSchema, type SurveyList } from '../../schemas/snapshot';
import { surveyScope } from '../policy';
import type { Executor } from '../db/types';
import { surveySummaries } from './summaries';

export async function recordableSurveys(tx: Executor, user: SessionUser): Promise<SurveyList> {
	return surveyListSchema.parse({ surveys: await surveySummaries(tx, surveyScope(user)) });
}
