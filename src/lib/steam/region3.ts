/**
 * IF97 region 3 forward equation: properties from density and temperature
 * (IAPWS R7-97(2012) eq. 28 with the relations of table 31).
 */
import { R, RHO_CRIT, T_CRIT } from './constants';
import { SteamRangeError } from './errors';
import { helmholtz, PHI, PHI_D, PHI_DD, PHI_DT, PHI_T, PHI_TT } from './region3-helmholtz';
import type { Properties } from './types';

const phi = new Float64Array(6);
const STIFFNESS_FLOOR = 1e-12;

/**
 * Properties of water in IF97 region 3 from density ρ [kg/m³] and temperature T [K].
 * Pressure comes from the equation itself (p = ρRT δφ_δ). Accepts any finite positive ρ and T
 * so the solvers can use it at and near the region's edges; the (p, T), (p, h) and (p, s)
 * entry points in region3-solve.ts check the region's limits.
 * @returns p MPa, T K, v m³/kg, h and u kJ/kg, s, cp and cv kJ/(kg K), w m/s
 * @throws SteamRangeError if ρ or T is not a finite positive number
 */
export function region3FromRhoT(rho: number, T: number): Properties {
	if (!(Number.isFinite(rho) && rho > 0)) {
		throw new SteamRangeError('density ρ', rho, 'a finite number above 0 kg/m³');
	}
	if (!(Number.isFinite(T) && T > 0)) {
		throw new SteamRangeError('temperature T', T, 'a finite number above 0 K');
	}
	helmholtz(rho / RHO_CRIT, T_CRIT / T, phi);
	return propertiesFrom(rho, T, phi);
}

/** Table 31 relations, from the reduced derivatives written by helmholtz(). */
export function propertiesFrom(rho: number, T: number, f: Float64Array): Properties {
	const rt = R * T;
	const d1 = f[PHI_D];
	// (∂p/∂ρ)_T in reduced form. It vanishes at the critical point, where rounding can leave it a
	// hair below zero and turn an unbounded cp into a huge negative one; the floor keeps cp
	// huge and positive there. Only the critical point and unstable states inside the
	// spinodal (never returned by the solvers) reach it.
	const stiffness = Math.max(2 * d1 + f[PHI_DD], STIFFNESS_FLOOR);
	const cross = d1 - f[PHI_DT];
	const tt = f[PHI_TT];
	return {
		p: (rho * rt * d1) / 1000,
		T,
		v: 1 / rho,
		h: rt * (f[PHI_T] + d1),
		u: rt * f[PHI_T],
		s: R * (f[PHI_T] - f[PHI]),
		cp: R * (-tt + (cross * cross) / stiffness),
		cv: -R * tt,
		w: Math.sqrt(1000 * rt * (stiffness - (cross * cross) / tt))
	};
}
