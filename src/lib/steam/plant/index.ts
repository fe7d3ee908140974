/**
 * Plant opportunities: expansion through a turbine, pump work, the Rankine cycle, a
 * back-pressure turbine in place of a letdown valve, flash steam, condensate return and
 * blowdown heat recovery, priced on the site's cost basis; and the geometry of their diagrams.
 * Base units: p MPa absolute, T K, h kJ/kg, s kJ/(kg K), flows kg/s, powers kW, work kJ/kg.
 */
export { type PlantBasis, type PlantYear, plantBasis, plantYear } from './annual';
export {
	type BlowdownHeatExchanger,
	type BlowdownInput,
	type BlowdownRate,
	type BlowdownRateInput,
	type BlowdownResult,
	blowdownRate,
	blowdownRecovery
} from './blowdown';
export { type PlantCautionContext, plantCautions } from './cautions';
export {
	type CondensateReturnInput,
	type CondensateReturnResult,
	condensateReturn
} from './condensate-return';
export {
	type ExpansionLine,
	type HsPoint,
	type SaturationDome,
	TRIPLE_POINT_T,
	type TsPoint,
	expansionLine,
	saturationDome
} from './diagrams';
export { type ExpansionInput, type ExpansionResult, expandSteam } from './expansion';
export { type FlashRecoveryInput, type FlashRecoveryResult, flashRecovery } from './flash-recovery';
export { SATURATION_MATCH_K, superheatOf } from './inlet';
export { type LetdownInput, type LetdownResult, letdownTurbine } from './letdown';
export { type PumpInput, type PumpResult, pumpWork } from './pump';
export {
	KJ_PER_KWH,
	type RankineInput,
	type RankineResult,
	type TurbineInlet,
	rankineCycle
} from './rankine';
