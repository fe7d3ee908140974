/**
 * Exact definitional constants behind every conversion factor. Each is exact by definition
 * (no rounding), so derived factors carry only floating-point error, never table rounding.
 * Sources: NIST SP 811 (2008), Guide for the Use of the International System of Units,
 * Appendix B.8 and its footnotes; the SI Brochure for the SI prefixes and the litre.
 */

/** International avoirdupois pound, kg (exact; NIST SP 811 B.8, footnote 22). */
export const LB_KG = 0.45359237;

/** International inch, m (exact; NIST SP 811 B.8). */
export const IN_M = 0.0254;

/** International foot = 12 in, m (exact; NIST SP 811 B.8). */
export const FT_M = 12 * IN_M;

/** International mile = 5280 ft, m (exact; NIST SP 811 B.8 lists 1.609 344 E+03 m). */
export const MILE_M = 5280 * FT_M;

/** Standard acceleration of free fall g_n, m/s² (exact; NIST SP 811 B.8). */
export const G_N = 9.80665;

/** Pound-force = 1 lb × g_n, N (exact by definition; NIST SP 811 B.8 lists 4.448 222 N). */
export const LBF_N = LB_KG * G_N;

/** Pound-force per square inch, Pa (exact by definition; NIST SP 811 B.8 lists 6.894 757 E+03). */
export const PSI_PA = LBF_N / (IN_M * IN_M);

/** Standard atmosphere, Pa (exact; NIST SP 811 B.8: 1.013 25 E+05 Pa). */
export const STANDARD_ATMOSPHERE_PA = 101_325;

/** Standard atmosphere in the engine's pressure unit, MPa absolute. */
export const STANDARD_ATMOSPHERE_MPA = STANDARD_ATMOSPHERE_PA / 1e6;

/**
 * International Table calorie, J (exact; NIST SP 811 B.8). The International Table Btu is
 * defined from it: 1 Btu_IT/lb = 1 cal_IT/g × 1.8, hence 1 Btu_IT/lb = 2.326 kJ/kg exactly.
 */
export const CAL_IT_J = 4.1868;

/**
 * International Table British thermal unit, J: cal_IT × (lb in g) / 1.8 = 1055.055 852 62 J
 * exactly (NIST SP 811 B.8 lists 1.055 056 E+03 J, rounded).
 */
export const BTU_IT_J = (CAL_IT_J * LB_KG * 1000) / 1.8;

/**
 * Therm (EC) = 100 000 Btu_IT, J (NIST SP 811 B.8 footnote 24 lists 1.055 06 E+08 J).
 * The US therm (1.054 804 E+08 J) is based on the 59 °F Btu; the two differ by 0.024 %.
 */
export const THERM_J = 1e5 * BTU_IT_J;

/** US liquid gallon = 231 in³, m³ (exact; NIST SP 811 B.8 lists 3.785 412 E-03). */
export const GAL_US_M3 = 231 * IN_M ** 3;

/** Seconds in an hour (exact). */
export const HOUR_S = 3600;
