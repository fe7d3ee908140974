/**
 * IF97 region 2 backward equation T(p, h), split into subregions 2a (p ≤ 4 MPa), 2b and 2c
 * by the 2b/2c boundary (IAPWS R7-97(2012) eqs. 20–24, tables 19–23). Within 10 mK of the
 * Gibbs equation in 2a and 2b, 25 mK in 2c; the solvers polish with Newton steps.
 */
import { powerSeries, seriesValue } from './power-series';

// Table 19, the B2bc equation.
const n1 = 0.90584278514723e3;
const n2 = -0.67955786399241;
const n3 = 0.12809002730136e-3;
const n4 = 0.26526571908428e4;
const n5 = 0.45257578905948e1;

/** Pressure [MPa] on the 2b/2c boundary at enthalpy h [kJ/kg] (eq. 20). */
export function b2bcPressure(h: number): number {
	return n1 + n2 * h + n3 * h * h;
}

/**
 * Enthalpy [kJ/kg] on the 2b/2c boundary at pressure p [MPa] (eq. 21); meaningful from
 * 6.5467 MPa (where the boundary meets saturation) to 100 MPa.
 */
export function b2bcEnthalpy(p: number): number {
	return n4 + Math.sqrt((p - n5) / n3);
}

/** Pressure [MPa] below which the 2b/2c boundary lies in region 4, so all of 2 above 4 MPa is 2b. */
const P_2BC_SAT = 6.546699678;

// Table 20, subregion 2a: θ = Σ nᵢ π^Iᵢ (η − 2.1)^Jᵢ.
const t2a = powerSeries(
	[
		0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 1, 1, 1, 1, 1, 2, 2, 2, 2, 2, 2, 2, 2, 3, 3, 4, 4, 4, 5, 5, 5, 6,
		6, 7
	],
	[
		0, 1, 2, 3, 7, 20, 0, 1, 2, 3, 7, 9, 11, 18, 44, 0, 2, 7, 36, 38, 40, 42, 44, 24, 44, 12, 32,
		44, 32, 36, 42, 34, 44, 28
	],
	[
		0.10898952318288e4, 0.84951654495535e3, -0.10781748091826e3, 0.33153654801263e2,
		-0.74232016790248e1, 0.11765048724356e2, 0.1844574935579e1, -0.41792700549624e1,
		0.62478196935812e1, -0.17344563108114e2, -0.20058176862096e3, 0.27196065473796e3,
		-0.45511318285818e3, 0.30919688604755e4, 0.25226640357872e6, -0.61707422868339e-2,
		-0.31078046629583, 0.11670873077107e2, 0.12812798404046e9, -0.98554909623276e9,
		0.28224546973002e10, -0.35948971410703e10, 0.17227349913197e10, -0.13551334240775e5,
		0.1284873466465e8, 0.13865724283226e1, 0.23598832556514e6, -0.13105236545054e8,
		0.73999835474766e4, -0.5519669703006e6, 0.37154085996233e7, 0.1912772923966e5,
		-0.41535164835634e6, -0.62459855192507e2
	]
);

// Table 21, subregion 2b: θ = Σ nᵢ (π − 2)^Iᵢ (η − 2.6)^Jᵢ.
const t2b = powerSeries(
	[
		0, 0, 0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 1, 1, 1, 1, 2, 2, 2, 2, 3, 3, 3, 3, 4, 4, 4, 4, 4, 4, 5, 5,
		5, 6, 7, 7, 9, 9
	],
	[
		0, 1, 2, 12, 18, 24, 28, 40, 0, 2, 6, 12, 18, 24, 28, 40, 2, 8, 18, 40, 1, 2, 12, 24, 2, 12, 18,
		24, 28, 40, 18, 24, 40, 28, 2, 28, 1, 40
	],
	[
		0.14895041079516e4, 0.74307798314034e3, -0.97708318797837e2, 0.24742464705674e1,
		-0.63281320016026, 0.11385952129658e1, -0.47811863648625, 0.85208123431544e-2, 0.93747147377932,
		0.33593118604916e1, 0.33809355601454e1, 0.16844539671904, 0.73875745236695, -0.47128737436186,
		0.15020273139707, -0.2176411421975e-2, -0.21810755324761e-1, -0.10829784403677,
		-0.46333324635812e-1, 0.71280351959551e-4, 0.11032831789999e-3, 0.18955248387902e-3,
		0.30891541160537e-2, 0.13555504554949e-2, 0.28640237477456e-6, -0.10779857357512e-4,
		-0.76462712454814e-4, 0.14052392818316e-4, -0.31083814331434e-4, -0.10302738212103e-5,
		0.2821728163504e-6, 0.12704902271945e-5, 0.73803353468292e-7, -0.11030139238909e-7,
		-0.81456365207833e-13, -0.25180545682962e-10, -0.17565233969407e-17, 0.86934156344163e-14
	]
);

// Table 22, subregion 2c: θ = Σ nᵢ (π + 25)^Iᵢ (η − 1.8)^Jᵢ.
const t2c = powerSeries(
	[-7, -7, -6, -6, -5, -5, -2, -2, -1, -1, 0, 0, 1, 1, 2, 6, 6, 6, 6, 6, 6, 6, 6],
	[0, 4, 0, 2, 0, 2, 0, 1, 0, 2, 0, 1, 4, 8, 4, 0, 1, 4, 10, 12, 16, 20, 22],
	[
		-0.32368398555242e13, 0.73263350902181e13, 0.35825089945447e12, -0.5834013185159e12,
		-0.1078306821747e11, 0.20825544563171e11, 0.61074783564516e6, 0.8597772253558e6,
		-0.2574572360417e5, 0.31081088422714e5, 0.12082315865936e4, 0.48219755109255e3,
		0.37966001272486e1, -0.10842984880077e2, -0.4536417267666e-1, 0.14559115658698e-12,
		0.1126159740723e-11, -0.17804982240686e-10, 0.12324579690832e-6, -0.11606921130984e-5,
		0.27846367088554e-4, -0.59270038474176e-3, 0.12918582991878e-2
	]
);

/** Region 2a temperature [K] from p [MPa], h [kJ/kg] (eq. 22). */
export function region2aTemperaturePH(p: number, h: number): number {
	return seriesValue(t2a, p, h / 2000 - 2.1);
}

/** Region 2b temperature [K] from p [MPa], h [kJ/kg] (eq. 23). */
export function region2bTemperaturePH(p: number, h: number): number {
	return seriesValue(t2b, p - 2, h / 2000 - 2.6);
}

/** Region 2c temperature [K] from p [MPa], h [kJ/kg] (eq. 24). */
export function region2cTemperaturePH(p: number, h: number): number {
	return seriesValue(t2c, p + 25, h / 2000 - 1.8);
}

/**
 * Region 2 temperature [K] from p [MPa] and h [kJ/kg], choosing subregion 2a, 2b or 2c
 * (no range check; callers choose the region).
 */
export function region2TemperaturePH(p: number, h: number): number {
	if (p <= 4) return region2aTemperaturePH(p, h);
	if (p <= P_2BC_SAT || h >= b2bcEnthalpy(p)) return region2bTemperaturePH(p, h);
	return region2cTemperaturePH(p, h);
}
