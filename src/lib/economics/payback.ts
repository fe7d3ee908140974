/**
 * Simple payback: how many years of saving buy back the repair, with no discounting and no
 * life (common practice: the first figure a plant manager asks for; NPV and IRR say more).
 */
import { finite, nonNegative } from './checks';

/**
 * Simple payback, years = repair cost ÷ annual saving.
 * @param repairCost what the repair costs, in any currency unit (minor or major) — null when
 *   nobody has priced the repair yet
 * @param annualSaving what it saves per year, in the same unit — null when unknown
 * @returns years (0 for a free repair that saves something); null when there is no cost to
 *   pay back (unknown) or no saving to pay it back with (zero, negative or unknown), since such a
 *   repair never pays back in money
 */
export function simplePaybackYears(
	repairCost: number | null,
	annualSaving: number | null
): number | null {
	if (repairCost === null || annualSaving === null) return null;
	nonNegative('Repair cost', repairCost);
	finite('Annual saving', annualSaving);
	if (annualSaving <= 0) return null;
	return repairCost / annualSaving;
}
