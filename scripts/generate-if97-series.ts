/**
 * Writes the IF97 power series of the steam engine out term by term, as straight-line code:
 * `npx tsx scripts/generate-if97-series.ts` (run by hand after changing a table or the
 * emitter; with `--check` it only reports whether the committed files are current).
 *
 * Why: the general evaluator in power-series.ts fills its power tables in a loop through index
 * arrays, which V8 cannot unroll; for the 43 terms of region 2 that loop was a third of the
 * time of a whole stateFromPT, and the backward equations' a sixth of stateFromPH. Written
 * out (if97-series-emit.ts), each term costs a multiply-add or a few.
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import * as prettier from 'prettier';
import * as table2 from '../src/lib/steam/region1-coefficients';
import * as table11 from '../src/lib/steam/region2-coefficients';
import * as table37 from '../src/lib/steam/region5-coefficients';
import { TABLE_6, TABLE_8 } from '../src/lib/steam/region1-backward-coefficients';
import {
	TABLE_20,
	TABLE_21,
	TABLE_22,
	TABLE_25,
	TABLE_26,
	TABLE_27
} from '../src/lib/steam/region2-backward-coefficients';
import { gibbsFunctions, idealFunction, valueFunction } from './if97-series-emit';

interface GeneratedFile {
	/** Relative to src/lib/steam. */
	file: string;
	/** Where its tables are, for the header. */
	source: string;
	/** Module text after the header. */
	body: string;
}

const GIBBS_IMPORT = "import { F, F_X, F_XX, F_XY, F_Y, F_YY, F_YYY } from './power-series';";

const FILES: GeneratedFile[] = [
	{
		file: 'region1-series.generated.ts',
		source: 'IAPWS R7-97(2012) table 2, in region1-coefficients.ts',
		body: `${GIBBS_IMPORT}\n${gibbsFunctions({
			name: 'region1Series',
			summary: 'γ = Σ nᵢ x^Iᵢ y^Jᵢ, table 2 (eq. 7),',
			x: '7.1 − π',
			y: 'τ − 1.222',
			...table2
		})}`
	},
	{
		file: 'region2-series.generated.ts',
		source: 'IAPWS R7-97(2012) tables 10 and 11, in region2-coefficients.ts',
		body: `${GIBBS_IMPORT}\n${idealFunction({
			name: 'region2IdealInto',
			summary: 'γ° − ln π = Σ n°ᵢ y^J°ᵢ, table 10 (eq. 16),',
			x: '',
			y: 'τ',
			I: table11.J0.map(() => 0),
			J: table11.J0,
			n: table11.n0
		})}\n${gibbsFunctions({
			name: 'region2Residual',
			summary: 'γʳ = Σ nᵢ x^Iᵢ y^Jᵢ, table 11 (eq. 17),',
			x: 'π',
			y: 'τ − 0.5',
			...table11
		})}`
	},
	{
		file: 'region5-series.generated.ts',
		source: 'IAPWS R7-97(2012) tables 37 and 38, in region5-coefficients.ts',
		body: `${GIBBS_IMPORT}\n${idealFunction({
			name: 'region5IdealInto',
			summary: 'γ° − ln π = Σ n°ᵢ y^J°ᵢ, table 37 (eq. 33),',
			x: '',
			y: 'τ',
			I: table37.J0.map(() => 0),
			J: table37.J0,
			n: table37.n0
		})}\n${gibbsFunctions({
			name: 'region5Residual',
			summary: 'γʳ = Σ nᵢ x^Iᵢ y^Jᵢ, table 38 (eq. 34),',
			x: 'π',
			y: 'τ',
			...table37
		})}`
	},
	{
		file: 'region1-backward-series.generated.ts',
		source: 'IAPWS R7-97(2012) tables 6 and 8, in region1-backward-coefficients.ts',
		body: [
			valueFunction({
				name: 'region1ThetaPH',
				summary: 'θ = T/(1 K) = Σ nᵢ x^Iᵢ y^Jᵢ of table 6 (eq. 11)',
				x: 'π = p/(1 MPa)',
				y: 'η + 1, η = h/(2500 kJ/kg)',
				...TABLE_6
			}),
			valueFunction({
				name: 'region1ThetaPS',
				summary: 'θ = T/(1 K) = Σ nᵢ x^Iᵢ y^Jᵢ of table 8 (eq. 13)',
				x: 'π = p/(1 MPa)',
				y: 'σ + 2, σ = s/(1 kJ/(kg K))',
				...TABLE_8
			})
		].join('\n')
	},
	{
		file: 'region2-backward-ph-series.generated.ts',
		source: 'IAPWS R7-97(2012) tables 20–22, in region2-backward-coefficients.ts',
		body: [
			valueFunction({
				name: 'region2aThetaPH',
				summary: 'θ = T/(1 K) = Σ nᵢ x^Iᵢ y^Jᵢ of table 20 (eq. 22, subregion 2a)',
				x: 'π = p/(1 MPa)',
				y: 'η − 2.1, η = h/(2000 kJ/kg)',
				...TABLE_20
			}),
			valueFunction({
				name: 'region2bThetaPH',
				summary: 'θ = T/(1 K) = Σ nᵢ x^Iᵢ y^Jᵢ of table 21 (eq. 23, subregion 2b)',
				x: 'π − 2',
				y: 'η − 2.6, η = h/(2000 kJ/kg)',
				...TABLE_21
			}),
			valueFunction({
				name: 'region2cThetaPH',
				summary: 'θ = T/(1 K) = Σ nᵢ x^Iᵢ y^Jᵢ of table 22 (eq. 24, subregion 2c)',
				x: 'π + 25',
				y: 'η − 1.8, η = h/(2000 kJ/kg)',
				...TABLE_22
			})
		].join('\n')
	},
	{
		file: 'region2-backward-ps-series.generated.ts',
		source: 'IAPWS R7-97(2012) tables 25–27, in region2-backward-coefficients.ts',
		body: [
			valueFunction({
				name: 'region2aThetaPS',
				summary: 'θ = T/(1 K) = Σ nᵢ π^Iᵢ y^Jᵢ of table 25 (eq. 25, subregion 2a)',
				x: 'π^(1/4), as its Iᵢ are quarters',
				y: 'σ − 2, σ = s/(2 kJ/(kg K))',
				root: 4,
				...TABLE_25
			}),
			valueFunction({
				name: 'region2bThetaPS',
				summary: 'θ = T/(1 K) = Σ nᵢ x^Iᵢ y^Jᵢ of table 26 (eq. 26, subregion 2b)',
				x: 'π = p/(1 MPa)',
				y: '10 − σ, σ = s/(0.7853 kJ/(kg K))',
				...TABLE_26
			}),
			valueFunction({
				name: 'region2cThetaPS',
				summary: 'θ = T/(1 K) = Σ nᵢ x^Iᵢ y^Jᵢ of table 27 (eq. 27, subregion 2c)',
				x: 'π = p/(1 MPa)',
				y: '2 − σ, σ = s/(2.9251 kJ/(kg K))',
				...TABLE_27
			})
		].join('\n')
	}
];

function source({ source, body }: GeneratedFile): string {
	return `/**
 * GENERATED by scripts/generate-if97-series.ts
 * from ${source}.
 * Do not edit: change the table or the script, then run \`npx tsx scripts/generate-if97-series.ts\`.
 *
 * The series written out term by term: cᵢ is table row i, nᵢ·y^Jᵢ, with nᵢ as the release
 * prints it; the rows sharing a power of x are summed before it is multiplied in.
 */
${body}
`;
}

async function main(): Promise<void> {
	const check = process.argv.includes('--check');
	const dir = fileURLToPath(new URL('../src/lib/steam/', import.meta.url));
	let stale = 0;
	for (const generated of FILES) {
		const path = dir + generated.file;
		const options = { ...(await prettier.resolveConfig(path)), filepath: path };
		const text = await prettier.format(source(generated), options);
		let current = '';
		try {
			current = readFileSync(path, 'utf8');
		} catch {
			// Not written yet.
		}
		if (current === text) continue;
		stale++;
		if (check)
			console.error(`${generated.file} is out of date: run scripts/generate-if97-series.ts`);
		else writeFileSync(path, text);
	}
	if (check && stale > 0) process.exit(1);
	if (!check) console.log(`${stale} of ${FILES.length} generated files rewritten`);
}

await main();
