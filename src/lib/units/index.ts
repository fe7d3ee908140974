/**
 * Units: conversions between the units people use and the engine's base units, named unit
 * systems (SI, US) and formatting for display. Pure TypeScript, no framework imports.
 */
export { atmosphericPressureAtElevation, ELEVATION_RANGE_M } from './atmosphere';
export * as unitConstants from './constants';
export { STANDARD_ATMOSPHERE_MPA } from './constants';
export { convert, fromBase, toBase } from './convert';
export { UnitError } from './errors';
export {
	formatQuantity,
	formatQuantityParts,
	MISSING_VALUE,
	type FormattedQuantity,
	type QuantityFormatOptions
} from './format';
export {
	DEFAULT_LOCALE,
	formatSignificant,
	numberFormat,
	roundToSignificant,
	type NumberFormatOptions
} from './number-format';
export { ATMOSPHERE_RANGE_MPA, type ConversionContext } from './pressure';
export {
	isQuantity,
	isUnit,
	isUnitOf,
	QUANTITIES,
	quantities,
	unitsOf,
	type Quantity,
	type QuantityOf,
	type Unit,
	type UnitOf
} from './quantities';
export {
	displayUnit,
	isUnitSystemId,
	UNIT_SYSTEMS,
	unitLabel,
	unitName,
	unitSystems,
	type UnitSystem,
	type UnitSystemId
} from './systems';
export type { UnitDef } from './unit-def';
