/**
 * The cautions a plant opportunity carries (wording in ../losses/cautions.ts, one home for all
 * cautions): pressure equipment defers to its manufacturer, the site's pressure-systems rules
 * and licensed engineers; a wet exhaust and hot discharges are named where they occur.
 */
import { type Caution, type CautionKey, CAUTION_TEXT } from '../losses/cautions';

export interface PlantCautionContext {
	/** A turbine's exhaust ends inside the dome. */
	wetExhaust?: boolean;
	/** Blowdown or hot condensate is released or sent to drain. */
	hotDischarge?: boolean;
}

/** The cautions of a plant opportunity, most urgent first. */
export function plantCautions({ wetExhaust, hotDischarge }: PlantCautionContext = {}): Caution[] {
	const keys: CautionKey[] = ['pressure-systems'];
	if (wetExhaust) keys.push('wet-exhaust');
	if (hotDischarge) keys.push('hot-discharge');
	keys.push('isolation', 'local-codes', 'estimate');
	return keys.map((key) => ({ key, text: CAUTION_TEXT[key] }));
}
