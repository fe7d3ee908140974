/**
 * Figures and assumptions as people read them: big numbers with units in the person's
 * system, three significant figures, money in the site's currency.
 */
import type { Assumption } from '$lib/steam';
import {
	formatQuantityParts,
	formatSignificant,
	numberFormat,
	type UnitSystemId
} from '$lib/units';
import type { Figure, FigureKey } from './estimate';

export const FIGURE_LABELS: Record<FigureKey, string> = {
	steam: 'Steam lost',
	heat: 'Heat lost',
	fuel: 'Fuel energy',
	cost: 'Cost',
	co2: 'CO2',
	water: 'Water to drain'
};

export interface ShownFigure {
	number: string;
	unit: string;
}

/** Money to three significant figures in the site's currency: "€12,300". */
export function formatMoney(amount: number, currency: string): string {
	return numberFormat('en-US', {
		style: 'currency',
		currency,
		maximumSignificantDigits: 3
	}).format(amount);
}

/** A figure (engine base units, see Figure) in the person's units. */
export function showFigure(
	figure: Figure,
	system: UnitSystemId,
	currency: string | null
): ShownFigure {
	const parts = (
		valueInBase: number,
		quantity: Parameters<typeof formatQuantityParts>[1],
		target: never
	) => {
		const p = formatQuantityParts(valueInBase, quantity, target);
		return { number: p.number, unit: p.label };
	};
	switch (figure.key) {
		case 'steam':
			return parts(figure.value / 3600, 'massFlow', system as never);
		case 'heat':
			return parts(figure.value * 1000, 'power', system as never);
		case 'fuel': {
			const p = parts(figure.value * 1e9, 'energy', system as never);
			return { number: p.number, unit: `${p.unit} per year` };
		}
		case 'cost':
			return { number: formatMoney(figure.value, currency ?? 'USD'), unit: 'per year' };
		case 'co2':
			return { number: formatSignificant(figure.value / 1000), unit: 't CO2 per year' };
		case 'water': {
			const p = parts(figure.value, 'volume', system as never);
			return { number: p.number, unit: `${p.unit} per year` };
		}
	}
}

/**
 * An assumption's value in the person's units where its unit is one the units module knows
 * (pressures gauge except the atmosphere itself, temperatures, lengths, enthalpies), else as
 * the engine states it.
 */
export function showAssumption(
	a: Assumption,
	system: UnitSystemId,
	atmosphericPressure: number
): string {
	const ctx = { atmosphericPressure };
	const q = (quantity: Parameters<typeof formatQuantityParts>[1], unit?: string) => {
		const p = formatQuantityParts(a.value, quantity, (unit ?? system) as never, ctx);
		return `${p.number} ${p.label}`;
	};
	switch (a.unit) {
		case 'MPa abs':
			return a.key === 'atmosphericPressure'
				? q('pressure', system === 'US' ? 'psia' : 'bar_a')
				: q('pressure');
		case 'K':
			return a.key === 'saturationTolerance' ? q('temperatureDifference') : q('temperature');
		case 'm':
			return q(a.value < 0.5 ? 'shortLength' : 'length');
		case 'kJ/kg':
			return q('specificEnthalpy');
		case 'kg/s':
			return q('massFlow');
		case '':
			return formatSignificant(a.value);
		default:
			return `${formatSignificant(a.value)} ${a.unit}`;
	}
}
