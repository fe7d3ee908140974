/**
 * The boundary between regions 2 and 3 (B23), a quadratic in T from 623.15 K, 16.529 MPa to
 * 863.15 K, 100 MPa (IAPWS R7-97(2012) eqs. 5 and 6, table 1).
 */

// Table 1.
const n1 = 0.34805185628969e3;
const n2 = -0.11671859879975e1;
const n3 = 0.10192970039326e-2;
const n4 = 0.57254459862746e3;
const n5 = 0.1391883977887e2;

/** B23 pressure [MPa] at temperature T [K] (eq. 5); meaningful for 623.15 K ≤ T ≤ 863.15 K. */
export function b23Pressure(T: number): number {
	return n1 + n2 * T + n3 * T * T;
}

/** B23 temperature [K] at pressure p [MPa] (eq. 6); meaningful for 16.529 ≤ p ≤ 100 MPa. */
export function b23Temperature(p: number): number {
	return n4 + Math.sqrt((p - n5) / n3);
}
