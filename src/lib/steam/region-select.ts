/**
 * Which IF97 region holds a (p, T) state (IAPWS R7-97(2012) fig. 1). On the saturation line
 * itself the liquid (region 1) is chosen.
 */
import { T_13, T_MAX_12 } from './constants';
import { b23Pressure } from './b23';
import { psat } from './region4';

/**
 * Region of pressure p [MPa] and temperature T [K], for inputs already checked to lie in the
 * formulation's range: 1 compressed liquid, 2 vapour, 3 near-critical, 5 above 1073.15 K.
 */
export function regionFromPT(p: number, T: number): 1 | 2 | 3 | 5 {
	if (T > T_MAX_12) return 5;
	if (T <= T_13) return p >= psat(T) ? 1 : 2;
	return p > b23Pressure(T) ? 3 : 2;
}
