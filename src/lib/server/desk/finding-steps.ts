/**
 * A finding's calculation as ordered steps a consultant can check by hand: the steam at the
 * header (IAPWS-IF97), the orifice or heat-loss model and its result, the heat the boiler
 * replaces above feedwater, fuel at the boiler's efficiency, cost, CO2, water, hours, payback
 * and NPV — each value in the person's units and the site's currency. Built from the engine's
 * own results (findingPhysics, priceFlows), never re-derived here.
 */
import type { FindingCapture } from '../../schemas/capture';
import type { CostBasis } from '../../schemas/site';
import {
	type Assumption,
	type FindingEvaluation,
	type FindingPhysics,
	type Header,
	condensateHeatRate,
	findHeader,
	fuelPower,
	headerSteam,
	priceFlows,
	resolveBasis,
	steamHeatRate
} from '../../steam/index';
import { formatQuantity, formatSignificant, type UnitSystemId } from '../../units/index';
import { formatMoney, showAssumption } from '../../components/walk/form/display';

export interface StepLine {
	label: string;
	value: string;
}

export interface CalculationStep {
	title: string;
	/** How the step's result follows from its lines, in words. */
	explain: string;
	lines: StepLine[];
}

export interface ShownAssumption {
	label: string;
	value: string;
	source: string;
}

interface Units {
	system: UnitSystemId;
	/** MPa absolute. */
	atmosphere: number;
	currency: string;
}

function say(u: Units) {
	const opts = { atmosphericPressure: u.atmosphere };
	return {
		p: (v: number) =>
			`${formatQuantity(v, 'pressure', u.system, opts)} (${formatQuantity(v, 'pressure', u.system === 'US' ? 'psia' : 'bar_a', opts)})`,
		t: (v: number) => formatQuantity(v, 'temperature', u.system),
		dt: (v: number) => formatQuantity(v, 'temperatureDifference', u.system),
		h: (v: number) => formatQuantity(v, 'specificEnthalpy', u.system),
		flow: (kgPerS: number) => formatQuantity(kgPerS, 'massFlow', u.system),
		power: (w: number) => formatQuantity(w, 'power', u.system),
		energy: (gj: number) => `${formatQuantity(gj * 1e9, 'energy', u.system)} per year`,
		water: (m3: number) => `${formatQuantity(m3, 'volume', u.system)} per year`,
		money: (amount: number) => formatMoney(amount, u.currency),
		n: (v: number) => formatSignificant(v)
	};
}

function headerStep(capture: FindingCapture, headers: readonly Header[], u: Units) {
	const s = say(u);
	if (capture.headerId === undefined) {
		return {
			title: 'Temperature of the surface',
			explain:
				'No header: the surface temperature measured on the item is used instead of steam at a header.',
			lines: []
		};
	}
	const header = findHeader(headers, capture.headerId);
	const steam = headerSteam(header);
	return {
		title: `Steam at the header (${header.name})`,
		explain:
			steam.temperature === undefined
				? 'Dry saturated steam at the header pressure; properties from IAPWS-IF97.'
				: 'Superheated steam at the header’s design temperature; properties from IAPWS-IF97.',
		lines: [
			{ label: 'Pressure', value: s.p(steam.pressure) },
			{ label: 'Saturation temperature', value: s.t(steam.saturationTemperature) },
			...(steam.temperature === undefined
				? []
				: [{ label: 'Design temperature', value: s.t(steam.temperature) }]),
			{ label: 'Enthalpy of the steam', value: s.h(steam.enthalpy) }
		]
	};
}

function modelStep(physics: FindingPhysics, u: Units): CalculationStep | null {
	const s = say(u);
	if (physics.orifice) {
		const o = physics.orifice;
		return {
			title:
				physics.kind === 'trap' ? 'Steam through the trap’s orifice' : 'Steam through the leak',
			explain:
				'Isentropic flow of real steam through a round orifice (peak mass flux searched on IAPWS-IF97), times the discharge coefficient; the trap’s condition sets the share of it that is lost.',
			lines: [
				{ label: 'Flow is', value: o.choked ? 'choked (critical)' : 'not choked (subcritical)' },
				{ label: 'Critical pressure', value: s.p(o.criticalPressure) },
				{ label: 'Pressure at the throat', value: s.p(o.throatPressure) },
				{ label: 'Mass flux at the throat', value: `${s.n(o.massFlux)} kg/(m² s)` },
				{ label: 'Full-bore orifice flow', value: s.flow(o.massFlow) },
				{ label: 'Steam lost', value: s.flow(physics.steamFlow ?? 0) }
			]
		};
	}
	if (physics.insulation) {
		const g = physics.insulation;
		return {
			title: 'Heat lost at the surface',
			explain:
				'Convection and radiation from the bare surface, against the same surface with the proposed insulation; the difference is the saving.',
			lines: [
				{ label: 'Bare surface temperature', value: s.t(g.bareSurfaceTemperature) },
				{ label: 'Heat lost bare', value: s.power(g.bare) },
				{ label: 'Insulated surface temperature', value: s.t(g.insulatedSurfaceTemperature) },
				{ label: 'Heat lost insulated', value: s.power(g.insulated) },
				{ label: 'Heat saved by insulating', value: s.power(physics.surfaceHeat) }
			]
		};
	}
	if (physics.reading) {
		const r = physics.reading;
		return {
			title: 'The header reading',
			explain: r.note,
			lines: [
				{ label: 'Measured pressure', value: s.p(r.pressure) },
				{ label: 'Saturation temperature', value: s.t(r.saturationTemperature) },
				...(r.temperature === null
					? []
					: [
							{ label: 'Measured temperature', value: s.t(r.temperature) },
							{ label: 'Above saturation by', value: s.dt(r.superheat ?? 0) }
						]),
				{ label: 'Enthalpy of the steam', value: s.h(r.enthalpy) }
			]
		};
	}
	return null;
}

/** The money steps on a basis; null when the site has no (valid) basis. */
function moneySteps(
	physics: FindingPhysics,
	evaluation: FindingEvaluation,
	costBasis: CostBasis,
	repairCost: number | null,
	u: Units
): CalculationStep[] {
	const s = say(u);
	const basis = resolveBasis(costBasis);
	const priced = priceFlows(physics, basis, costBasis, repairCost ?? undefined);
	const hfw = basis.feedwaterEnthalpy;
	const steamHeat =
		physics.steamFlow === null || physics.steamEnthalpy === null
			? 0
			: steamHeatRate(physics.steamFlow, physics.steamEnthalpy, hfw);
	const condensateHeat =
		physics.condensateEnthalpy === null
			? 0
			: condensateHeatRate(physics.condensateFlow, physics.condensateEnthalpy, hfw);
	const fuel = fuelPower(priced.heatRate, basis.boilerEfficiency);
	const heatLines: StepLine[] = [{ label: 'Feedwater enthalpy', value: s.h(hfw) }];
	if (steamHeat > 0)
		heatLines.push({ label: 'Steam: flow × (h − h feedwater)', value: s.power(steamHeat) });
	if (priced.returned > 0) {
		heatLines.push({
			label: 'Share returned as condensate',
			value: `${s.n(priced.returned * 100)} %`
		});
	}
	if (condensateHeat > 0)
		heatLines.push({ label: 'Condensate to drain', value: s.power(condensateHeat) });
	if (physics.surfaceHeat > 0)
		heatLines.push({ label: 'Surface heat', value: s.power(physics.surfaceHeat) });
	if (priced.makeup)
		heatLines.push({ label: 'Heating makeup water', value: s.power(priced.makeup.heatRate) });
	heatLines.push({ label: 'Heat the boiler replaces', value: s.power(priced.heatRate) });
	const y = evaluation;
	return [
		{
			title: 'Heat the boiler replaces',
			explain:
				'Counted above the feedwater the boiler is fed with (it would be heated from there anyway).',
			lines: heatLines
		},
		{
			title: 'Fuel',
			explain: 'Heat divided by the boiler’s efficiency, over the hours the loss runs.',
			lines: [
				{ label: 'Boiler efficiency', value: `${s.n(basis.boilerEfficiency * 100)} %` },
				{ label: 'Fuel power', value: s.power(fuel) },
				{ label: 'Hours per year', value: `${s.n(priced.hours)} h` },
				{ label: 'Fuel energy', value: s.energy(y.fuelEnergy) }
			]
		},
		{
			title: 'Cost, CO2 and water per year',
			explain:
				'Fuel at the site’s price per GJ; makeup water and treatment at the site’s water price.',
			lines: [
				{ label: 'Fuel price', value: `${s.money(basis.fuelPricePerGJ.value)} per GJ` },
				{ label: 'Fuel cost', value: s.money(y.fuelCost.amount) },
				{ label: 'Makeup water', value: s.water(y.water) },
				{ label: 'Water cost', value: s.money(y.waterCost.amount) },
				{ label: 'Total cost', value: `${s.money(y.cost.amount)} per year` },
				{ label: 'CO2', value: `${s.n(y.co2 / 1000)} t per year` }
			]
		},
		{
			title: 'Payback',
			explain:
				'Repair cost divided by the yearly cost; net present value over the repair’s life where the site gives a discount rate and life.',
			lines: [
				{
					label: 'Repair cost',
					value: y.repairCost ? s.money(y.repairCost.amount) : 'not given yet'
				},
				{
					label: 'Simple payback',
					value:
						y.payback.years === null ? (y.payback.note ?? '—') : `${s.n(y.payback.years)} years`
				},
				{
					label: 'Net present value',
					value: y.npv ? s.money(y.npv.amount) : 'needs a repair cost, discount rate and life'
				}
			]
		}
	];
}

export interface Calculation {
	steps: CalculationStep[];
	assumptions: ShownAssumption[];
	/** Why there are no money steps (no basis, a refused input). */
	problem: string | null;
}

export function calculation(
	capture: FindingCapture,
	physics: FindingPhysics,
	evaluation: FindingEvaluation | null,
	costBasis: CostBasis | null,
	headers: readonly Header[],
	repairCost: number | null,
	u: Units
): Calculation {
	const steps: CalculationStep[] = [];
	if (capture.kind !== 'header') steps.push(headerStep(capture, headers, u));
	const model = modelStep(physics, u);
	if (model) steps.push(model);
	let problem: string | null = null;
	if (evaluation && costBasis)
		steps.push(...moneySteps(physics, evaluation, costBasis, repairCost, u));
	else problem = 'No cost basis on the site yet: the money steps follow once one is set.';
	const list: Assumption[] = evaluation?.assumptions ?? physics.assumptions;
	const assumptions = list.map((a) => ({
		label: a.label,
		value: showAssumption(a, u.system, u.atmosphere),
		source: a.source
	}));
	return { steps, assumptions, problem };
}
