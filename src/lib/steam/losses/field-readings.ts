/**
 * What a finding's field readings add to its result: a trap's temperature test (inlet well
 * below saturation) and an insulation surface found damaged or wet. Each returns a note a
 * person reads and the assumption behind it, or null when there is nothing to say.
 */
import type { InsulationState } from '../vocabulary';
import type { TrapInputs } from './inputs';
import type { Assumption, Sourced } from './sourced';

/**
 * How far below the header's saturation temperature a trap's inlet may read before it is
 * worth a note, K. Contact thermometers and infrared guns read a pipe surface a few kelvin
 * under the steam inside; well beyond that, condensate is standing at the trap.
 */
export const COLD_INLET_MARGIN: Sourced = {
	value: 15,
	unit: 'K',
	source:
		'common practice: an inlet more than about 15 K below saturation points to condensate standing at the trap'
};

export interface ReadingNote {
	note: string;
	assumption: Assumption;
}

/**
 * A note when the trap's inlet reads more than COLD_INLET_MARGIN below the saturation
 * temperature at the header's pressure.
 * @param saturationTemperature at the header's pressure, K
 */
export function coldInletNote(
	inputs: TrapInputs,
	saturationTemperature: number
): ReadingNote | null {
	const inlet = inputs.inletTemperature;
	if (inlet === undefined || inlet >= saturationTemperature - COLD_INLET_MARGIN.value) return null;
	const below = saturationTemperature - inlet;
	return {
		note: `The inlet reads ${below.toFixed(0)} K below the steam's saturation temperature: the trap may be blocked or backing up condensate, or the supply valve closed. Check the strainer, the valves and the trap's size.`,
		assumption: {
			key: 'coldInletMargin',
			label: 'Inlet colder than saturation by more than',
			...COLD_INLET_MARGIN
		}
	};
}

const STATE_NOTES: Record<
	Exclude<InsulationState, 'bare'>,
	{ label: string; note: string; source: string }
> = {
	damaged: {
		label: 'Heat lost today, damaged insulation taken as bare',
		note: 'Damaged insulation is priced as bare over the length entered: enter only the stretch that is missing or crushed, as what remains still insulates.',
		source: 'common practice: damaged insulation priced as bare over the damaged length'
	},
	wet: {
		label: 'Heat lost today, wet insulation taken as bare',
		note: 'Wet insulation is priced as bare pipe. Wet insulation can lose more heat than bare metal, so the real loss (and the saving) may be larger: a conservative simplification. Find and stop the water first.',
		source: 'common practice: wet insulation priced as bare, a conservative simplification'
	}
};

/**
 * A note when the surface is not simply bare: its loss today is priced as bare (W given).
 * @param bareLoss heat lost by the surface taken as bare, W
 */
export function surfaceStateNote(
	state: InsulationState | undefined,
	bareLoss: number
): ReadingNote | null {
	if (state === undefined || state === 'bare') return null;
	const words = STATE_NOTES[state];
	return {
		note: words.note,
		assumption: {
			key: 'surfaceState',
			label: words.label,
			value: bareLoss,
			unit: 'W',
			source: words.source
		}
	};
}
