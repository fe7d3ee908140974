/**
 * Inputs for the loss-engine rows of `npm run bench`: orifice flows from a failed trap or a
 * leak, and whole findings priced by evaluateFinding. Engine-only: python3-iapws has nothing
 * like them. The site and findings are demo data in the shapes the app stores.
 */
import {
	findingCommon as common,
	lossSite as site,
	mainsHeader as mains,
	superheatedHeader as superheated
} from '../tests/fixtures/loss-site.ts';
import {
	evaluateFinding,
	orificeSteamFlow,
	saturationTemperature,
	type FindingInput as Finding,
	type OrificeInput
} from '../src/lib/steam/index';

/** One pass over a row's inputs; returns a sum so the work cannot be optimised away. */
export interface LossRow {
	label: string;
	/** Calls per pass. */
	calls: number;
	/** Calls per second the row must reach, if it has a target. */
	target?: number;
	pass: () => number;
}

const ATMOSPHERE = 0.101325;

/**
 * Orifices as audits meet them: 1 to 40 bar(g) mains, dry saturated, wet (x = 0.95) and
 * superheated (+50 K) steam, into atmosphere (choked) or a condensate return at 2 bar(a)
 * (choked or not, by the pressure), 2 to 12 mm.
 */
function orificeInputs(): OrificeInput[] {
	const inputs: OrificeInput[] = [];
	for (const barg of [1, 3, 7, 10, 17, 25, 40]) {
		const p1 = barg / 10 + ATMOSPHERE;
		const Ts = saturationTemperature(p1);
		for (const upstream of [{}, { x1: 0.95 }, { T1: Ts + 50 }]) {
			for (const p2 of [ATMOSPHERE, 0.2]) {
				for (const diameter of [0.002, 0.006, 0.012]) {
					inputs.push({ p1, p2, diameter, cd: 0.7, ...upstream });
				}
			}
		}
	}
	return inputs;
}

/** Traps failed open or leaking, to atmosphere or a return, on both headers. */
function traps(): Finding[] {
	const findings: Finding[] = [];
	for (const header of [mains, superheated]) {
		for (const dn of [15, 20, 25] as const) {
			for (const condition of ['failed-open', 'leaking'] as const) {
				findings.push({
					...common,
					headerId: header.id,
					kind: 'trap',
					repairCost: 45000,
					inputs: { trapType: 'thermodynamic', dn, condition, discharge: 'atmosphere' }
				});
				findings.push({
					...common,
					headerId: header.id,
					kind: 'trap',
					repairCost: 45000,
					inputs: {
						trapType: 'inverted-bucket',
						dn,
						condition,
						discharge: 'condensate-return',
						backPressure: 0.2
					}
				});
			}
		}
	}
	return findings;
}

function leaks(): Finding[] {
	return [mains, superheated].flatMap((header) =>
		(['small', 'medium', 'large'] as const).map((sizeClass): Finding => ({
			...common,
			headerId: header.id,
			kind: 'leak',
			repairCost: 20000,
			inputs: { sizeClass }
		}))
	);
}

function insulationGaps(): Finding[] {
	return [mains, superheated].flatMap((header) =>
		([50, 100, 200] as const).map((dn): Finding => ({
			...common,
			headerId: header.id,
			kind: 'insulation',
			repairCost: 120000,
			inputs: {
				item: 'pipe',
				dn,
				length: 10,
				ambientTemperature: 293.15,
				windSpeed: 1,
				layers: [{ thickness: 0.05, material: 'mineral-wool' }],
				jacketEmissivity: 0.1,
				bareEmissivity: 0.9
			}
		}))
	);
}

function findingRow(label: string, findings: Finding[]): LossRow {
	return {
		label,
		calls: findings.length,
		pass: () => {
			let sum = 0;
			for (const finding of findings) sum += evaluateFinding(finding, site).heatLoss;
			return sum;
		}
	};
}

/** The loss-engine rows, each over its fixed inputs. */
export function lossRows(): LossRow[] {
	const orifices = orificeInputs();
	return [
		{
			label: 'orificeSteamFlow',
			calls: orifices.length,
			target: 20_000,
			pass: () => {
				let sum = 0;
				for (const input of orifices) sum += orificeSteamFlow(input).massFlow;
				return sum;
			}
		},
		findingRow('evaluateFinding, trap', traps()),
		findingRow('evaluateFinding, leak', leaks()),
		findingRow('evaluateFinding, insulation', insulationGaps())
	];
}
