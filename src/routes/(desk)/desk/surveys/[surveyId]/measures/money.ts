/** Money, payback and rates as the measures pages show them. */
import { formatSignificant } from '$lib/units';

export { money, paybackWords as years } from '$lib/figures';

export const percent = (rate: number | null) =>
	rate === null ? 'no single rate' : `${formatSignificant(rate * 100)} %`;

/** The figures a savings cell reads (cellText), from a measure's sums. */
export const chain = (
	m: { steamKgH: number; fuelGj: number; co2Kg: number; waterM3: number; annualSaving: number },
	currency: string
) => ({
	currency,
	steamKgH: m.steamKgH,
	heatKw: null,
	fuelGjYear: m.fuelGj,
	co2KgYear: m.co2Kg,
	waterM3Year: m.waterM3,
	costMinor: m.annualSaving,
	repairCostMinor: null
});
