/**
 * Surface heat loss: bare and insulated pipe, flat surfaces, valves and flanges, and the saving
 * of an insulation gap. Base units: m, K, W (W/m per metre of pipe, W/m² per area).
 */
export {
	type AirProperties,
	airProperties,
	filmProperties,
	filmTemperature
} from './air-properties';
export { type BarePipeHeatLoss, type BarePipeInput, barePipeHeatLoss } from './bare-pipe';
export { STEFAN_BOLTZMANN, fahrenheitToKelvin } from './constants';
export {
	MIXED_CONVECTION_EXPONENT,
	combineMixedConvection,
	nusseltCylinderCrossFlow,
	nusseltFlatPlateForced,
	nusseltHorizontalCylinderNatural,
	nusseltVerticalPlateNatural,
	rayleighNumber,
	reynoldsNumber
} from './convection';
export {
	type EquivalentLength,
	FITTING_EQUIVALENT_LENGTH,
	type FittingHeatLoss,
	type FittingInput,
	type FittingKind,
	fittingHeatLoss
} from './fittings';
export {
	type FlatSurfaceHeatLoss,
	type FlatSurfaceInput,
	flatSurfaceHeatLoss
} from './flat-surface';
export {
	type InsulatedPipeHeatLoss,
	type InsulatedPipeInput,
	type InsulationLayer,
	insulatedPipeHeatLoss
} from './insulated-pipe';
export {
	type CustomMaterial,
	type InsulationMaterial,
	MATERIALS,
	type MaterialData,
	type NamedMaterial,
	conductivityAt,
	conductivityIntegral,
	materialData,
	meanConductivity
} from './insulation-materials';
export {
	type InsulationSaving,
	type InsulationSavingInput,
	insulationSaving
} from './insulation-saving';
export {
	NOMINAL_PIPE_SIZES,
	type NominalPipeSize,
	type PipeSizeInput,
	nominalPipeSize,
	pipeOutsideDiameter,
	resolveOuterDiameter
} from './pipe-sizes';
export { greyBodyFlux, radiationCoefficient } from './radiation';
export { type RootResult, findRoot } from './root-finding';
export {
	CONTACT_BURN_THRESHOLD,
	HOT_SURFACE_CAUTION,
	INSULATE_ABOVE,
	type SurfaceSafety,
	surfaceSafety
} from './surface-safety';
