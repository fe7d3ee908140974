/**
 * Hot-surface thresholds and the caution carried with any result that involves them.
 */
import { fahrenheitToKelvin } from './constants';

/**
 * Contact burn threshold [K]: 60 °C (140 °F), the surface temperature commonly taken from
 * ASTM C1055 (Standard Guide for Heated System Surface Conditions that Produce Contact Burn
 * Injuries) for a few seconds' contact with a metal surface (from memory; common practice for
 * personnel protection).
 */
export const CONTACT_BURN_THRESHOLD = fahrenheitToKelvin(140);

/**
 * Temperature above which a surface should be insulated [K]: 120 °F (49 °C), the US DOE steam
 * fact sheet on insulating steam distribution and condensate return lines.
 */
export const INSULATE_ABOVE = fahrenheitToKelvin(120);

/** Carried with results for surfaces hotter than the contact burn threshold. */
export const HOT_SURFACE_CAUTION =
	'Hot surface: bare steam and condensate surfaces above 60 °C (140 °F) burn on brief contact. ' +
	"Keep clear, wear the site's PPE, and fit or repair insulation only with the line isolated " +
	"and cooled under the site's permit-to-work. These are engineering estimates, not guarantees.";

export interface SurfaceSafety {
	/** Surface hotter than the contact burn threshold (60 °C). */
	burnRisk: boolean;
	/** Surface hotter than the temperature above which insulation is advised (49 °C). */
	insulationAdvised: boolean;
}

/** Burn risk and insulation advice for a surface at temperature T [K]. */
export function surfaceSafety(T: number): SurfaceSafety {
	return { burnRisk: T > CONTACT_BURN_THRESHOLD, insulationAdvised: T > INSULATE_ABOVE };
}
