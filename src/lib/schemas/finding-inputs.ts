/**
 * Kind-specific inputs of a finding, in the engine's base units (p MPa absolute, T K,
 * lengths m, mass flow kg/s), with plain error messages for the forms. Each schema is checked
 * at compile time against the engine's own input type (src/lib/steam/losses/inputs.ts), and
 * every numeric bound comes from INPUT_LIMITS (./ranges.ts).
 */
import { z } from 'zod';
import type {
	HeaderInputs,
	InsulationInputs,
	InsulationLayerInput,
	InsulationMaterialInput,
	LeakInputs,
	TrapInputs
} from '../steam/losses/inputs';
import type { Agrees } from './agrees';
import { dnSchema } from './common';
import {
	INSULATION_ITEMS,
	INSULATION_MATERIALS,
	INSULATION_STATES,
	LEAK_COMPONENTS,
	LEAK_SIZE_CLASSES,
	TRAP_CONDITIONS,
	TRAP_DISCHARGES,
	TRAP_TEST_METHODS,
	TRAP_TYPES
} from './finding-vocabulary';
import { INPUT_LIMITS, limitedNumber } from './ranges';

export type {
	HeaderInputs,
	InsulationInputs,
	LeakInputs,
	TrapInputs
} from '../steam/losses/inputs';
export type InsulationMaterial = InsulationMaterialInput;
export type InsulationLayer = InsulationLayerInput;

const TRAP = INPUT_LIMITS.trap;
const LEAK = INPUT_LIMITS.leak;
const INSULATION = INPUT_LIMITS.insulation;
const LAYER = INPUT_LIMITS.layer;
const HEADER = INPUT_LIMITS.header;

/** A diameter in metres, > 0 and at most `max` m. */
export const diameterSchema = (label: string, max: number) =>
	limitedNumber(label, { min: 0, max, exclusiveMin: true, quantity: 'shortLength', unit: 'm' });

export const trapInputsSchema = z
	.object({
		trapType: z.enum(TRAP_TYPES, { error: 'Choose the trap’s type' }),
		/** Nominal connection size (DN); sets the default discharge orifice. */
		dn: dnSchema,
		/** Discharge orifice diameter, m; defaults from the size and type table when absent. */
		orificeDiameter: limitedNumber('Orifice diameter', TRAP.orificeDiameter).optional(),
		condition: z.enum(TRAP_CONDITIONS, { error: 'Choose the trap’s condition' }),
		discharge: z.enum(TRAP_DISCHARGES, { error: 'Choose where the trap discharges' }),
		/** Pressure the trap discharges into, MPa absolute; required for a condensate return. */
		backPressure: limitedNumber('Back pressure', TRAP.backPressure).optional(),
		testMethod: z.enum(TRAP_TEST_METHODS, { error: 'Choose how the trap was tested' }).optional(),
		/** Hours per year this trap is live, overriding the site's operating hours. */
		operatingHours: limitedNumber('Operating hours', TRAP.operatingHours).optional(),
		/** Condensate the trap passes, kg/s: priced as lost water and heat when it goes to drain. */
		condensateLoad: limitedNumber('Condensate load', TRAP.condensateLoad).optional(),
		/** Temperature test readings either side of the trap, K. */
		inletTemperature: limitedNumber('Inlet temperature', TRAP.inletTemperature).optional(),
		outletTemperature: limitedNumber('Outlet temperature', TRAP.outletTemperature).optional()
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
const _trap: Agrees<typeof trapInputsSchema, TrapInputs> = true;

export const leakInputsSchema = z
	.object({
		/** Equivalent hole diameter, m: the round hole that would pass the same steam. */
		holeDiameter: limitedNumber('Hole diameter', LEAK.holeDiameter).optional(),
		/** A size class chosen from the guidance when the hole cannot be measured. */
		sizeClass: z.enum(LEAK_SIZE_CLASSES, { error: 'Choose the leak’s size' }).optional(),
		/** Where on the line the leak is. */
		component: z.enum(LEAK_COMPONENTS, { error: 'Choose where the leak is' }).optional(),
		operatingHours: limitedNumber('Operating hours', LEAK.operatingHours).optional()
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
const _leak: Agrees<typeof leakInputsSchema, LeakInputs> = true;

export const insulationMaterialSchema = z.union(
	[
		z.enum(INSULATION_MATERIALS),
		z.object({ conductivity: limitedNumber('Conductivity', LAYER.conductivity) })
	],
	{ error: 'Choose the insulation material, or give its conductivity in W/(m K)' }
);
const _material: Agrees<typeof insulationMaterialSchema, InsulationMaterialInput> = true;

export const insulationLayerSchema = z.object({
	thickness: limitedNumber('Layer thickness', LAYER.thickness),
	material: insulationMaterialSchema
});
const _layer: Agrees<typeof insulationLayerSchema, InsulationLayerInput> = true;

export const insulationInputsSchema = z
	.object({
		item: z.enum(INSULATION_ITEMS, {
			error: 'Choose what is bare: a pipe, valve, flange or surface'
		}),
		/** Nominal pipe size (DN) of the pipe, valve or flange pair. */
		dn: dnSchema.optional(),
		/** Bare outside diameter, m, when it is not a standard pipe size (wins over dn). */
		outerDiameter: limitedNumber('Outer diameter', INSULATION.outerDiameter).optional(),
		/** Bare length, m (pipe). */
		length: limitedNumber('Length', INSULATION.length).optional(),
		/** Number of bare valves or flange pairs. */
		count: limitedNumber('Count', INSULATION.count).optional(),
		/** Height of a flat surface, m: the run the warm air rises along. */
		height: limitedNumber('Height', INSULATION.height).optional(),
		/** Bare area, m² (flat surface: tank, vessel, heat-exchanger shell). */
		area: limitedNumber('Area', INSULATION.area).optional(),
		/** Process temperature, K; when absent, the header's steam temperature. */
		processTemperature: limitedNumber(
			'Process temperature',
			INSULATION.processTemperature
		).optional(),
		ambientTemperature: limitedNumber('Ambient temperature', INSULATION.ambientTemperature),
		windSpeed: limitedNumber('Wind speed', INSULATION.windSpeed),
		/** Proposed insulation, innermost layer first. */
		layers: z
			.array(insulationLayerSchema, { error: 'Layers must be a list' })
			.min(1, { error: 'Propose at least one insulation layer' })
			.max(4, { error: 'At most 4 insulation layers' }),
		jacketEmissivity: limitedNumber('Jacket emissivity', INSULATION.jacketEmissivity),
		bareEmissivity: limitedNumber('Bare-surface emissivity', INSULATION.bareEmissivity),
		operatingHours: limitedNumber('Operating hours', INSULATION.operatingHours).optional(),
		/** What is there today; damaged and wet insulation are priced as bare. */
		surfaceState: z
			.enum(INSULATION_STATES, { error: 'Choose what the surface is like today' })
			.optional()
	})
	.superRefine((ins, ctx) => {
		const issue = (path: string, message: string) =>
			ctx.addIssue({ code: 'custom', path: [path], message });
		if (ins.item === 'surface') {
			if (ins.area === undefined) issue('area', 'A flat surface needs its bare area in m²');
			if (ins.height === undefined) issue('height', 'A flat surface needs its height in metres');
		} else if (ins.dn === undefined && ins.outerDiameter === undefined) {
			issue('dn', `${ITEM_WORDS[ins.item]} needs a nominal size (DN) or an outer diameter`);
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
const _insulation: Agrees<typeof insulationInputsSchema, InsulationInputs> = true;

const ITEM_WORDS = { pipe: 'A pipe', valve: 'A valve', 'flange-pair': 'A flange pair' } as const;

export const headerInputsSchema = z.object({
	/** Measured line pressure, MPa absolute (the form converts gauge with the site's atmosphere). */
	measuredPressure: limitedNumber('Measured pressure', HEADER.measuredPressure),
	/** Measured line temperature, K, when a thermometer reading was taken. */
	measuredTemperature: limitedNumber('Measured temperature', HEADER.measuredTemperature).optional()
});
const _header: Agrees<typeof headerInputsSchema, HeaderInputs> = true;
