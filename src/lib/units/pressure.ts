import { PSI_PA, STANDARD_ATMOSPHERE_MPA } from './constants';
import { UnitError, describeValue } from './errors';
import type { UnitTable } from './unit-def';

const PA = 1e-6; // MPa per Pa

/**
 * Pressure units; base MPa absolute, the engine's unit. Gauge units are read against the
 * site's atmospheric pressure (see ConversionContext). Factors: bar = 1e5 Pa and
 * psi = lbf/in² (NIST SP 811 B.8).
 */
export const pressureUnits = {
	MPa: { label: 'MPa a', name: 'megapascal (absolute)', factor: 1 },
	kPa_a: { label: 'kPa a', name: 'kilopascal (absolute)', factor: 1e3 * PA },
	kPa_g: { label: 'kPa g', name: 'kilopascal (gauge)', factor: 1e3 * PA, gauge: true },
	bar_a: { label: 'bar a', name: 'bar (absolute)', factor: 1e5 * PA },
	bar_g: { label: 'bar g', name: 'bar (gauge)', factor: 1e5 * PA, gauge: true },
	psia: { label: 'psia', name: 'pounds per square inch (absolute)', factor: PSI_PA * PA },
	psig: {
		label: 'psig',
		name: 'pounds per square inch (gauge)',
		factor: PSI_PA * PA,
		gauge: true
	}
} as const satisfies UnitTable;

/**
 * Atmospheric pressures accepted for gauge conversions, MPa. Wide enough for any plant site
 * (about 0.034 MPa on the highest mountains, 0.107 MPa at the Dead Sea shore) yet narrow
 * enough to catch a value given in kPa, bar or Pa by mistake.
 */
export const ATMOSPHERE_RANGE_MPA = { min: 0.02, max: 0.15 } as const;

/** Site conditions needed by some conversions. */
export interface ConversionContext {
	/**
	 * The site's atmospheric pressure, MPa absolute, for gauge units (bar g, kPa g, psig).
	 * Defaults to the standard atmosphere, 0.101325 MPa; sites well above sea level should
	 * pass atmosphericPressureAtElevation(elevation) or a measured value.
	 */
	atmosphericPressure?: number;
}

/** The atmospheric pressure to use, MPa, checked to be plausible. */
export function atmosphereOf(ctx: ConversionContext | undefined): number {
	const p = ctx?.atmosphericPressure ?? STANDARD_ATMOSPHERE_MPA;
	const { min, max } = ATMOSPHERE_RANGE_MPA;
	if (typeof p !== 'number' || !Number.isFinite(p) || p < min || p > max) {
		throw new UnitError(
			`Atmospheric pressure ${describeValue(p)} MPa is outside ${min} to ${max} MPa ` +
				'(give it in MPa absolute, e.g. 0.101325)',
			'MPa',
			p
		);
	}
	return p;
}
