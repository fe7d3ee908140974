/**
 * Money as the savings charts label it: integer minor units of a currency, shown in major units
 * (en-US grouping), compact on an axis ("$1.2M") and in full in the text tables.
 */
import { fromMinorUnits } from '$lib/steam';
import { numberFormat } from '$lib/units';

export function moneyText(minor: number, currency: string): string {
	return numberFormat('en-US', {
		style: 'currency',
		currency,
		maximumFractionDigits: 0
	}).format(fromMinorUnits(minor, currency));
}

export function compactMoney(minor: number, currency: string): string {
	return numberFormat('en-US', {
		style: 'currency',
		currency,
		notation: 'compact',
		maximumSignificantDigits: 3
	}).format(fromMinorUnits(minor, currency));
}
