/**
 * IF97 region 1 backward equations T(p, h) and T(p, s) (IAPWS R7-97(2012) eqs. 11 and 13,
 * tables 6 and 8). They agree with the Gibbs equation to within 25 mK; the solvers polish
 * them with Newton steps on the forward equation.
 */
import { powerSeries, seriesValue } from './power-series';

// Table 6, θ = Σ nᵢ π^Iᵢ (η + 1)^Jᵢ.
const tph = powerSeries(
	[0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 1, 1, 1, 2, 2, 3, 3, 4, 5, 6],
	[0, 1, 2, 6, 22, 32, 0, 1, 2, 3, 4, 10, 32, 10, 32, 10, 32, 32, 32, 32],
	[
		-0.23872489924521e3, 0.40421188637945e3, 0.11349746881718e3, -0.58457616048039e1,
		-0.1528548241314e-3, -0.10866707695377e-5, -0.13391744872602e2, 0.43211039183559e2,
		-0.54010067170506e2, 0.30535892203916e2, -0.65964749423638e1, 0.93965400878363e-2,
		0.1157364750534e-6, -0.25858641282073e-4, -0.40644363084799e-8, 0.66456186191635e-7,
		0.80670734103027e-10, -0.93477771213947e-12, 0.58265442020601e-14, -0.15020185953503e-16
	]
);

// Table 8, θ = Σ nᵢ π^Iᵢ (σ + 2)^Jᵢ.
const tps = powerSeries(
	[0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 1, 1, 2, 2, 2, 2, 2, 3, 3, 4],
	[0, 1, 2, 3, 11, 31, 0, 1, 2, 3, 12, 31, 0, 1, 2, 9, 31, 10, 32, 32],
	[
		0.17478268058307e3, 0.34806930892873e2, 0.65292584978455e1, 0.33039981775489,
		-0.19281382923196e-6, -0.24909197244573e-22, -0.26107636489332, 0.22592965981586,
		-0.64256463395226e-1, 0.78876289270526e-2, 0.35672110607366e-9, 0.17332496994895e-23,
		0.56608900654837e-3, -0.32635483139717e-3, 0.44778286690632e-4, -0.51322156908507e-9,
		-0.42522657042207e-25, 0.26400441360689e-12, 0.78124600459723e-28, -0.30732199903668e-30
	]
);

/** Region 1 temperature [K] from p [MPa] and h [kJ/kg], backward eq. 11 (no range check). */
export function region1TemperaturePH(p: number, h: number): number {
	return seriesValue(tph, p, h / 2500 + 1);
}

/** Region 1 temperature [K] from p [MPa] and s [kJ/(kg K)], backward eq. 13 (no range check). */
export function region1TemperaturePS(p: number, s: number): number {
	return seriesValue(tps, p, s + 2);
}
