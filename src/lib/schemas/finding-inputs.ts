/**
 * Kind-specific inputs of a finding, in the engine's base units (p MPa absolute, T K,
 * lengths m, mass flow kg/s), with plain error messages for the forms.
 */
import { z } from 'zod';
import { dnSchema, oneOf, pressureSchema, temperatureSchema } from './common';
import {
	INSULATION_ITEMS,
	INSULATION_MATERIALS,
	LEAK_SIZE_CLASSES,
	TRAP_CONDITIONS,
	TRAP_DISCHARGES,
	TRAP_TEST_METHODS,
	TRAP_TYPES
} from './finding-vocabulary';

const operatingHoursSchema = z
	.number({ error: 'Operating hours must be a number of hours per year' })
	.gt(0, { error: 'Operating hours must be greater than 0 h per year' })
	.max(8784, { error: 'Operating hours cannot exceed 8784 h per year (a leap year)' });

/** A diameter in metres, > 0 and at most `max` m. */
export const diameterSchema = (label: string, max: number) =>
	z
		.number({ error: `${label} must be a number (metres)` })
		.positive({ error: `${label} must be greater than 0 m` })
		.max(max, { error: `${label} must be at most ${max} m` });

const emissivity = (label: string) =>
	z
		.number({ error: `${label} must be a number between 0 and 1` })
		.gt(0, { error: `${label} must be greater than 0` })
		.max(1, { error: `${label} cannot exceed 1` });

export const trapInputsSchema = z
	.object({
		trapType: z.enum(TRAP_TYPES, oneOf('Trap type', TRAP_TYPES)),
		/** Nominal connection size (DN); sets the default discharge orifice. */
		dn: dnSchema,
		/** Discharge orifice diameter, m; defaults from the size and type table when absent. */
		orificeDiameter: diameterSchema('Orifice diameter', 0.05).optional(),
		condition: z.enum(TRAP_CONDITIONS, oneOf('Trap condition', TRAP_CONDITIONS)),
		discharge: z.enum(TRAP_DISCHARGES, oneOf('Discharge', TRAP_DISCHARGES)),
		/** Pressure the trap discharges into, MPa absolute; required for a condensate return. */
		backPressure: pressureSchema('Back pressure', 22).optional(),
		testMethod: z.enum(TRAP_TEST_METHODS, oneOf('Test method', TRAP_TEST_METHODS)).optional(),
		/** Hours per year this trap is live, overriding the site's operating hours. */
		operatingHours: operatingHoursSchema.optional(),
		/** Condensate the trap passes, kg/s: priced as lost water and heat when it goes to drain. */
		condensateLoad: z
			.number({ error: 'Condensate load must be a number (kg/s)' })
			.min(0, { error: 'Condensate load cannot be negative' })
			.max(50, { error: 'Condensate load must be at most 50 kg/s' })
			.optional()
	})
	.superRefine((trap, ctx) => {
		if (trap.discharge === 'condensate-return' && trap.backPressure === undefined) {
			ctx.addIssue({
				code: 'custom',
				path: ['backPressure'],
				message: 'A trap discharging to a condensate return needs the return’s back pressure'
			});
		}
	});
export type TrapInputs = z.infer<typeof trapInputsSchema>;

export const leakInputsSchema = z
	.object({
		/** Equivalent hole diameter, m: the round hole that would pass the same steam. */
		holeDiameter: diameterSchema('Hole diameter', 0.1).optional(),
		/** A size class chosen from the guidance when the hole cannot be measured. */
		sizeClass: z.enum(LEAK_SIZE_CLASSES, oneOf('Leak size class', LEAK_SIZE_CLASSES)).optional(),
		operatingHours: operatingHoursSchema.optional()
	})
	.superRefine((leak, ctx) => {
		if (leak.holeDiameter === undefined && leak.sizeClass === undefined) {
			ctx.addIssue({
				code: 'custom',
				path: ['holeDiameter'],
				message: 'Give the leak’s equivalent hole diameter or choose a size class'
			});
		}
	});
export type LeakInputs = z.infer<typeof leakInputsSchema>;

export const insulationMaterialSchema = z.union(
	[
		z.enum(INSULATION_MATERIALS),
		z.object({
			conductivity: z
				.number({ error: 'Conductivity must be a number (W/(m K))' })
				.positive({ error: 'Conductivity must be greater than 0 W/(m K)' })
				.max(1, { error: 'Conductivity must be at most 1 W/(m K) for an insulation' })
		})
	],
	{
		error: `Material must be one of ${INSULATION_MATERIALS.join(', ')} or a conductivity in W/(m K)`
	}
);
export type InsulationMaterial = z.infer<typeof insulationMaterialSchema>;

export const insulationLayerSchema = z.object({
	thickness: z
		.number({ error: 'Layer thickness must be a number (metres)' })
		.positive({ error: 'Layer thickness must be greater than 0 m' })
		.max(0.5, { error: 'Layer thickness must be at most 0.5 m' }),
	material: insulationMaterialSchema
});
export type InsulationLayer = z.infer<typeof insulationLayerSchema>;

export const insulationInputsSchema = z
	.object({
		item: z.enum(INSULATION_ITEMS, oneOf('Item', INSULATION_ITEMS)),
		/** Nominal pipe size (DN) of the pipe, valve or flange pair. */
		dn: dnSchema.optional(),
		/** Bare outside diameter, m, when it is not a standard pipe size (wins over dn). */
		outerDiameter: diameterSchema('Outer diameter', 3).optional(),
		/** Bare length, m (pipe). */
		length: z
			.number({ error: 'Length must be a number (metres)' })
			.positive({ error: 'Length must be greater than 0 m' })
			.max(10_000, { error: 'Length must be at most 10 000 m' })
			.optional(),
		/** Number of bare valves or flange pairs. */
		count: z
			.number({ error: 'Count must be a whole number' })
			.int({ error: 'Count must be a whole number' })
			.min(1, { error: 'Count must be at least 1' })
			.max(10_000, { error: 'Count must be at most 10 000' })
			.optional(),
		/** Height of a flat surface, m: the run the warm air rises along. */
		height: z
			.number({ error: 'Height must be a number (metres)' })
			.positive({ error: 'Height must be greater than 0 m' })
			.max(50, { error: 'Height must be at most 50 m' })
			.optional(),
		/** Bare area, m² (flat surface: tank, vessel, heat-exchanger shell). */
		area: z
			.number({ error: 'Area must be a number (m²)' })
			.positive({ error: 'Area must be greater than 0 m²' })
			.max(100_000, { error: 'Area must be at most 100 000 m²' })
			.optional(),
		/** Process temperature, K; when absent, the header's steam temperature. */
		processTemperature: temperatureSchema('Process temperature', 273.15, 923.15).optional(),
		ambientTemperature: temperatureSchema('Ambient temperature', 223.15, 333.15),
		windSpeed: z
			.number({ error: 'Wind speed must be a number (m/s)' })
			.min(0, { error: 'Wind speed cannot be negative' })
			.max(35, { error: 'Wind speed must be at most 35 m/s' }),
		/** Proposed insulation, innermost layer first. */
		layers: z
			.array(insulationLayerSchema, { error: 'Layers must be a list' })
			.min(1, { error: 'Propose at least one insulation layer' })
			.max(4, { error: 'At most 4 insulation layers' }),
		jacketEmissivity: emissivity('Jacket emissivity'),
		bareEmissivity: emissivity('Bare-surface emissivity'),
		operatingHours: operatingHoursSchema.optional()
	})
	.superRefine((ins, ctx) => {
		const issue = (path: string, message: string) =>
			ctx.addIssue({ code: 'custom', path: [path], message });
		if (ins.item === 'surface') {
			if (ins.area === undefined) issue('area', 'A flat surface needs its bare area in m²');
			if (ins.height === undefined) issue('height', 'A flat surface needs its height in metres');
		} else if (ins.dn === undefined && ins.outerDiameter === undefined) {
			issue('dn', `A ${ins.item} needs a nominal size (DN) or an outer diameter`);
		} else if (ins.outerDiameter === undefined && ins.dn !== undefined && ins.dn < 15) {
			issue('dn', 'Pipe sizes for insulation start at DN 15 (NPS 1/2); give the outer diameter');
		}
		if (ins.item === 'pipe' && ins.length === undefined) {
			issue('length', 'A bare pipe needs its length in metres');
		}
		if ((ins.item === 'valve' || ins.item === 'flange-pair') && ins.count === undefined) {
			issue('count', `Give the number of bare ${ins.item === 'valve' ? 'valves' : 'flange pairs'}`);
		}
		if (ins.processTemperature !== undefined && ins.processTemperature <= ins.ambientTemperature) {
			issue('processTemperature', 'Process temperature must be above the ambient temperature');
		}
	});
export type InsulationInputs = z.infer<typeof insulationInputsSchema>;

export const headerInputsSchema = z.object({
	/** Measured line pressure, MPa absolute (the form converts gauge with the site's atmosphere). */
	measuredPressure: pressureSchema('Measured pressure', 22),
	/** Measured line temperature, K, when a thermometer reading was taken. */
	measuredTemperature: temperatureSchema('Measured temperature', 273.16, 1073.15).optional()
});
export type HeaderInputs = z.infer<typeof headerInputsSchema>;
