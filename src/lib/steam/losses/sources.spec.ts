import { describe, expect, it } from 'vitest';
import {
	findingCommon,
	lossSite as site,
	mainsHeader as header
} from '../../../../tests/fixtures/loss-site';
import { FITTING_EQUIVALENT_LENGTH } from '../heat/fittings';
import { MATERIALS } from '../heat/insulation-materials';
import { FUEL_KINDS, INSULATION_MATERIALS } from '../vocabulary';
import { evaluateFinding } from './evaluate';
import { COLD_INLET_MARGIN } from './field-readings';
import { FUELS } from './fuels';
import type { FindingInput } from './inputs';
import { DISCHARGE_COEFFICIENT, TRAP_FACTORS } from './traps';

/** Every source a person can read names a publication, common practice or where it was entered. */
const unconfirmed = /from memory/i;

describe('sources people read', () => {
	it('never say "from memory" in the engine’s defaults', () => {
		const sources = [
			...FUEL_KINDS.flatMap((kind) => [
				FUELS[kind].emissionFactor?.source ?? '',
				...Object.values(FUELS[kind].energyContent).map((e) => e.source)
			]),
			...INSULATION_MATERIALS.map((m) => MATERIALS[m].source),
			...Object.values(FITTING_EQUIVALENT_LENGTH).map((f) => f.source),
			TRAP_FACTORS.failedOpen.source,
			TRAP_FACTORS.leaking.source,
			DISCHARGE_COEFFICIENT.source,
			COLD_INLET_MARGIN.source
		];
		expect(sources.length).toBeGreaterThan(15);
		for (const source of sources) expect(source).not.toMatch(unconfirmed);
	});

	it('never say "from memory" in any result’s assumptions', () => {
		const common = { id: findingCommon.id, headerId: header.id };
		const findings: FindingInput[] = [
			{
				...common,
				kind: 'trap',
				inputs: {
					trapType: 'thermodynamic',
					dn: 15,
					condition: 'failed-open',
					discharge: 'atmosphere',
					inletTemperature: 350
				}
			},
			{ ...common, kind: 'leak', inputs: { sizeClass: 'large', component: 'flange' } },
			...INSULATION_MATERIALS.map((material): FindingInput => ({
				...common,
				kind: 'insulation',
				inputs: {
					item: 'valve',
					dn: 50,
					count: 1,
					ambientTemperature: 293.15,
					windSpeed: 2,
					layers: [{ thickness: 0.04, material }],
					jacketEmissivity: 0.1,
					bareEmissivity: 0.9,
					surfaceState: 'wet'
				}
			})),
			{ ...common, kind: 'header', inputs: { measuredPressure: 1.1 } }
		];
		for (const finding of findings) {
			const result = evaluateFinding(finding, site);
			for (const a of result.assumptions) expect(a.source, a.key).not.toMatch(unconfirmed);
		}
	});
});
