/**
 * The standing safety caution (DEVELOPERS.md, "Safety"), one wording for the screens that
 * capture leaks and traps (SafetyNote) and for every report.
 */
export const STANDING_CAUTION_TITLE = 'Caution: live steam and hot surfaces';

export const STANDING_CAUTIONS = [
	'Keep clear of plumes: high-pressure steam is invisible near the orifice.',
	"Wear the site's PPE and follow its rules for hot surfaces and pressure systems.",
	"Never repair under pressure: isolate, drain and vent first, under the site's permit-to-work.",
	'Local codes and licensed practice come first. Figures here are engineering estimates, not guarantees.'
] as const;
