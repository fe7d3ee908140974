/**
 * Steam leaks: the loss through the leak's equivalent hole (the round, sharp-edged hole that
 * would pass the same steam) at the header's pressure, by the same orifice model as traps.
 * When the hole cannot be seen, the auditor picks a size class from what the plume looks like.
 */
import type { LeakSizeClass } from '../vocabulary';
import type { LeakInputs } from './inputs';
import type { Assumption, Sourced } from './sourced';
import { orificeSteamFlow, type OrificeFlow } from './orifice';
import { DISCHARGE_COEFFICIENT } from './traps';

export interface LeakSizeGuide {
	/** Equivalent hole diameter, m. */
	diameter: number;
	/** What the auditor sees, for the size picker. */
	guidance: string;
}

/**
 * Size classes, with the hole diameters of the US DOE trap-orifice table (1/32 to 1/2 in) and
 * plume descriptions. Plume length depends strongly on pressure, air temperature and humidity;
 * these are common practice descriptions, not a published correlation: measure or estimate the
 * hole directly where it can be seen safely.
 */
export const LEAK_SIZE_GUIDE: Record<LeakSizeClass, LeakSizeGuide> = {
	pinhole: {
		diameter: 0.0254 / 32,
		guidance: 'Wisp visible only close up, plume under about 0.3 m, barely audible'
	},
	small: {
		diameter: 0.0254 / 16,
		guidance: 'Steady plume up to about 1 m, a hiss audible nearby'
	},
	medium: {
		diameter: 0.0254 / 8,
		guidance: 'Plume about 1–2 m, clearly audible across the room'
	},
	large: {
		diameter: 0.0254 / 4,
		guidance: 'Plume about 2–4 m, loud; hearing protection near it'
	},
	'very-large': {
		diameter: 0.0254 / 2,
		guidance: 'Plume beyond 4 m, roaring; keep well clear'
	}
};

const GUIDE_SOURCE =
	'common practice size class by plume (no published correlation); diameters from the US DOE trap-orifice table';

export interface LeakLoss {
	/** Steam lost, kg/s. */
	steamFlow: number;
	orifice: OrificeFlow;
	assumptions: Assumption[];
	note: string;
}

/**
 * Steam lost through a leak.
 * @param inletPressure header pressure, MPa absolute
 * @param atmosphere site atmospheric pressure, MPa absolute (leaks vent to air)
 * @param inletTemperature header temperature when superheated, K
 */
export function leakSteamLoss(
	inputs: LeakInputs,
	inletPressure: number,
	atmosphere: number,
	inletTemperature?: number
): LeakLoss {
	const diameter = leakDiameter(inputs);
	if (inletPressure <= atmosphere) {
		throw new Error(
			`The header pressure (${inletPressure} MPa abs) must be above atmospheric (${atmosphere} MPa abs) for steam to leak out`
		);
	}
	const orifice = orificeSteamFlow({
		p1: inletPressure,
		p2: atmosphere,
		diameter: diameter.value,
		cd: DISCHARGE_COEFFICIENT.value,
		T1: inletTemperature
	});
	return {
		steamFlow: orifice.massFlow,
		orifice,
		note: `Leak through an equivalent ${(diameter.value * 1000).toFixed(1)} mm hole${orifice.choked ? ' (choked flow)' : ''}`,
		assumptions: [
			{ key: 'holeDiameter', label: 'Equivalent hole diameter', ...diameter },
			{ key: 'dischargeCoefficient', label: 'Discharge coefficient', ...DISCHARGE_COEFFICIENT }
		]
	};
}

/** The hole diameter given, or the size class's. */
export function leakDiameter(inputs: LeakInputs): Sourced {
	if (inputs.holeDiameter !== undefined) {
		return { value: inputs.holeDiameter, unit: 'm', source: 'estimated by the auditor (finding)' };
	}
	if (inputs.sizeClass !== undefined) {
		const guide = LEAK_SIZE_GUIDE[inputs.sizeClass];
		return { value: guide.diameter, unit: 'm', source: `${GUIDE_SOURCE}: ${inputs.sizeClass}` };
	}
	throw new Error('Give the leak’s equivalent hole diameter or choose a size class');
}
