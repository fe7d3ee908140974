/**
 * Repair economics, pure and unit-explicit: simple payback, NPV, IRR and the sums of a
 * measure. Money is whatever unit the caller passes (the app passes integer minor units);
 * rates are fractions per year; lives are whole years. docs/savings.md gives the formulas.
 */
export { simplePaybackYears } from './payback';
export {
	annuityFactor,
	netPresentValue,
	presentValueOfFlows,
	repairFlows,
	type NpvInput
} from './present-value';
export { internalRateOfReturn, repairIrr, signChanges } from './irr';
export {
	measureEconomics,
	measureSums,
	type ExtraCost,
	type LifeTerms,
	type MeasureEconomics,
	type MeasureFinding,
	type MeasureSums
} from './measure';
export { MAX_LIFE_YEARS } from './checks';
