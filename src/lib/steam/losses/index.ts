/**
 * Loss and cost models: orifice flow of steam, trap and leak losses, flash steam, header
 * readings, insulation gaps, the energy chain to fuel, cost and CO2, economics, cautions,
 * and the one entry point `evaluateFinding`. Engine base units: p MPa absolute, T K, m, kg/s, W.
 */
export { type Caution, type CautionKey, CAUTION_TEXT, cautionsFor } from './cautions';
export { type NpvInput, type Payback, netPresentValue, simplePayback } from './economics';
export {
	type AnnualBasis,
	type AnnualLoss,
	MAKEUP_WATER_DENSITY,
	annualLoss,
	condensateHeatRate,
	fuelPower,
	requireEfficiency,
	requireHours,
	steamFuelCostPerTonne,
	steamHeatRate
} from './energy-chain';
export { type FindingEvaluation, type SiteInput, evaluateFinding } from './evaluate';
export { type FindingPhysics, type PhysicsSite, findingPhysics } from './physics';
export { type PhysicsFlows, type PricedFlows, priceFinding, priceFlows } from './pricing';
export {
	type InsulatedFlatHeatLoss,
	type InsulatedFlatInput,
	insulatedFlatSurfaceHeatLoss
} from './flat-insulation';
export { type FlashInput, type FlashResult, flashSteamFraction } from './flash';
export {
	COLD_INLET_MARGIN,
	type ReadingNote,
	coldInletNote,
	surfaceStateNote
} from './field-readings';
export {
	ENERGY_UNIT_GJ,
	FUELS,
	MMBTU_GJ,
	defaultEnergyContent,
	emissionFactor,
	energyPerPriceUnit,
	fuelPricePerGJ,
	parseDecimal
} from './fuels';
export {
	type HeaderCondition,
	type HeaderReading,
	SATURATION_TOLERANCE,
	readHeader
} from './header';
export type {
	CostBasis,
	FindingInput,
	Fuel,
	Header,
	HeaderFindingInput,
	HeaderInputs,
	InsulationFindingInput,
	InsulationInputs,
	InsulationLayerInput,
	InsulationMaterialInput,
	LeakFindingInput,
	LeakInputs,
	PhysicsBasis,
	TrapFactors,
	TrapFindingInput,
	TrapInputs
} from './inputs';
export { type InsulationGap, insulationGap } from './insulation';
export {
	LEAK_SIZE_GUIDE,
	type LeakLoss,
	type LeakSizeGuide,
	leakDiameter,
	leakSteamLoss
} from './leaks';
export { type Money, fromMinorUnits, minorUnitDigits, money, toMinorUnits } from './money';
export {
	type OrificeFlow,
	type OrificeInput,
	criticalPressure,
	isentropicMassFlux,
	napierSteamFlow,
	orificeSteamFlow,
	upstreamState
} from './orifice';
export {
	type HeaderSteam,
	type ResolvedBasis,
	findHeader,
	headerSteam,
	resolveBasis,
	siteAtmosphere
} from './site-basis';
export type { Assumption, Sourced } from './sourced';
export {
	DISCHARGE_COEFFICIENT,
	TRAP_FACTORS,
	TRAP_RISK_NOTES,
	TRAP_STATUS_NOTES,
	type TrapLoss,
	type TrapLossInput,
	defaultTrapOrifice,
	trapSteamLoss
} from './traps';
