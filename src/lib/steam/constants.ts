/**
 * Constants of IAPWS R7-97(2012) and the limits of the formulation, in IF97 base units
 * (p MPa, T K, h kJ/kg, s kJ/(kg K)).
 */

/** Specific gas constant of water [kJ/(kg K)] (release eq. 1). */
export const R = 0.461526;

/** Critical temperature [K], pressure [MPa] and density [kg/m³] (release eqs. 2–4). */
export const T_CRIT = 647.096;
export const P_CRIT = 22.064;
export const RHO_CRIT = 322;

/** Lowest temperature of the formulation [K]. */
export const T_MIN = 273.15;
/** Upper temperature of regions 1–3 [K]; region 5 lies above it. */
export const T_MAX_12 = 1073.15;
/** Highest temperature of the formulation (region 5) [K]. */
export const T_MAX = 2273.15;
/** Temperature of the region 1/3 boundary and the start of the B23 line [K]. */
export const T_13 = 623.15;

/** Highest pressure of regions 1–3 [MPa]. */
export const P_MAX = 100;
/** Highest pressure of region 5 [MPa]. */
export const P_MAX_5 = 50;
/**
 * Lowest pressure the engine accepts [MPa] (1 Pa). IF97 region 2 holds down to p → 0; 1 Pa is
 * far below any plant vacuum and keeps the specific volume a finite, meaningful number.
 */
export const P_MIN = 1e-6;
