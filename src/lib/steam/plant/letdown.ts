/**
 * A back-pressure turbine in place of a letdown (pressure-reducing) valve. The valve throttles
 * at constant enthalpy (steady-flow energy equation with no work or heat), so its outlet
 * carries h1; the turbine's exhaust carries h2 = h1 − w, the work having left as shaft power.
 * The process downstream still needs its heat, so the boiler makes up the difference:
 * extra boiler heat = ṁ (h1 − h2) = shaft power, at the boiler's efficiency (US DOE Steam Tip
 * Sheet #20, "Replace Pressure-Reducing Valves with Backpressure Turbogenerators": the
 * turbine consumes no steam, but the plant raises more steam to make up the heat converted).
 *   electrical power P_e = ṁ w η_g; extra fuel = ṁ w / η_b;
 *   net saving per year = P_e × hours × electricity price − extra fuel cost;
 *   breakeven: electricity price per kWh ÷ fuel price per kWh of fuel = 1 / (η_b η_g),
 * which does not depend on the turbine's isentropic efficiency.
 * Units: ṁ kg/s, p MPa absolute, T K, h and w kJ/kg, powers kW, energy kWh, money major units.
 */
import { ENERGY_UNIT_GJ } from '../losses/fuels';
import { requireEfficiency } from '../losses/energy-chain';
import type { Caution } from '../losses/cautions';
import type { CostBasis } from '../losses/inputs';
import { money, type Money } from '../losses/money';
import type { Assumption } from '../losses/sourced';
import { requireNonNegative, requirePositive } from '../losses/sourced';
import { stateFromPH } from '../inverse';
import type { SteamState } from '../types';
import { basisAssumptions, plantBasis, plantYear, type PlantYear } from './annual';
import { plantCautions } from './cautions';
import { expandSteam, type ExpansionResult } from './expansion';

export interface LetdownInput {
	/** Steam through the station, kg/s. */
	steamFlow: number;
	/** Upstream header pressure, MPa absolute. */
	p1: number;
	/** Upstream steam temperature, K, when superheated. */
	T1?: number;
	/** Upstream dryness fraction; dry saturated steam (1) when neither T1 nor x1 is given. */
	x1?: number;
	/** Downstream header pressure, MPa absolute. */
	p2: number;
	/** Turbine isentropic efficiency, (0, 1]. */
	isentropicEfficiency: number;
	/** Generator (and gearbox) efficiency, shaft to electrical, (0, 1]. */
	generatorEfficiency: number;
	/** The site's cost basis (fuel price, boiler efficiency, hours). */
	basis: CostBasis;
	/**
	 * Price of the electricity the turbine displaces, major units of the basis currency per kWh.
	 * The cost basis has none, so it is entered with the opportunity.
	 */
	electricityPrice: number;
	/** Hours per year the station passes this flow, when they differ from the site's. */
	operatingHours?: number;
}

export interface LetdownResult {
	expansion: ExpansionResult;
	/** The state a valve would deliver: p2 at h1. */
	valveOutlet: SteamState;
	/** The turbine's exhaust: p2 at h2. */
	exhaust: SteamState;
	/** kW */
	shaftPower: number;
	electricalPower: number;
	generatorLoss: number;
	/** h1 − h2: enthalpy the exhaust lacks against the valve's outlet, kJ/kg. */
	enthalpyDeficit: number;
	/** Heat the boiler must add to deliver the valve's heat downstream, kW (= shaft power). */
	extraBoilerHeat: number;
	/** The year of the extra boiler fuel: its energy, cost and CO2. */
	extraFuel: PlantYear;
	/** kWh per year generated. */
	electricityPerYear: number;
	electricityValue: Money;
	/** Electricity value − extra fuel cost, per year (negative when the turbine loses money). */
	netSaving: Money;
	/** Fuel price per kWh of fuel energy (HHV), major units. */
	fuelPricePerKWh: number;
	/** Electricity price ÷ fuel price per kWh; null when fuel is free. */
	priceRatio: number | null;
	/** The ratio above which the turbine saves money: 1 / (η_boiler η_generator). */
	breakevenPriceRatio: number;
	/** The electricity price per kWh at which the saving is zero, major units. */
	breakevenElectricityPrice: number;
	wetExhaust: boolean;
	/** Exhaust dryness fraction; null when superheated. */
	exhaustDryness: number | null;
	assumptions: Assumption[];
	cautions: Caution[];
}

/**
 * A back-pressure turbine-generator in place of a letdown valve, on the site's cost basis.
 * @throws SteamRangeError for states outside IAPWS-IF97; Error for bad inputs or cost basis
 */
export function letdownTurbine(input: LetdownInput): LetdownResult {
	const steamFlow = requirePositive('Steam flow', input.steamFlow, 'kg/s');
	requireEfficiency(input.isentropicEfficiency, 'Turbine isentropic efficiency');
	const etaG = requireEfficiency(input.generatorEfficiency, 'Generator efficiency');
	const price = requireNonNegative('Electricity price', input.electricityPrice, 'per kWh');
	const dry = input.T1 === undefined && input.x1 === undefined;
	const expansion = expandSteam({
		p1: input.p1,
		T1: input.T1,
		x1: dry ? 1 : input.x1,
		p2: input.p2,
		isentropicEfficiency: input.isentropicEfficiency
	});
	const site = plantBasis(input.basis, input.operatingHours);
	const { basis } = site;
	const shaftPower = steamFlow * expansion.work;
	const electricalPower = shaftPower * etaG;
	const extraFuel = plantYear(shaftPower, 0, site);
	const electricityPerYear = electricalPower * site.hours;
	const value = electricityPerYear * price;
	const fuelPricePerKWh = basis.fuelPricePerGJ.value * ENERGY_UNIT_GJ.kWh;
	const breakevenPriceRatio = 1 / (basis.boilerEfficiency * etaG);
	return {
		expansion,
		valveOutlet: stateFromPH(input.p2, expansion.h1),
		exhaust: expansion.outlet,
		shaftPower,
		electricalPower,
		generatorLoss: shaftPower - electricalPower,
		enthalpyDeficit: expansion.work,
		extraBoilerHeat: shaftPower,
		extraFuel,
		electricityPerYear,
		electricityValue: money(value, basis.currency),
		netSaving: money(value - extraFuel.year.fuelCost, basis.currency),
		fuelPricePerKWh,
		priceRatio: fuelPricePerKWh > 0 ? price / fuelPricePerKWh : null,
		breakevenPriceRatio,
		breakevenElectricityPrice: fuelPricePerKWh * breakevenPriceRatio,
		wetExhaust: expansion.wetExhaust,
		exhaustDryness: expansion.x2,
		assumptions: [
			...letdownAssumptions(input, dry, etaG, price, basis.currency),
			...basisAssumptions(site)
		],
		cautions: plantCautions({ wetExhaust: expansion.wetExhaust })
	};
}

function letdownAssumptions(
	input: LetdownInput,
	dry: boolean,
	etaG: number,
	price: number,
	currency: string
): Assumption[] {
	const entered = 'entered for this opportunity';
	const out: Assumption[] = [];
	if (dry) {
		out.push({
			key: 'inletDryness',
			label: 'Upstream steam taken as dry saturated',
			value: 1,
			unit: '',
			source: 'common practice (a header without a design temperature carries dry saturated steam)'
		});
	}
	out.push(
		{
			key: 'isentropicEfficiency',
			label: 'Turbine isentropic efficiency',
			value: input.isentropicEfficiency,
			unit: '',
			source: entered
		},
		{
			key: 'generatorEfficiency',
			label: 'Generator efficiency',
			value: etaG,
			unit: '',
			source: entered
		},
		{
			key: 'electricityPrice',
			label: 'Electricity price',
			value: price,
			unit: `${currency}/kWh`,
			source: entered
		},
		{
			key: 'valveIsenthalpic',
			label: 'A letdown valve delivers the upstream enthalpy (throttling)',
			value: 0,
			unit: 'kJ/kg change',
			source: 'steady-flow energy equation: no work, no heat'
		},
		{
			key: 'heatMadeUp',
			label: 'Heat turned into power is made up by the boiler',
			value: 1,
			unit: '',
			source:
				'US DOE Steam Tip Sheet #20, "Replace Pressure-Reducing Valves with Backpressure Turbogenerators"'
		}
	);
	return out;
}
