/** How one unit maps onto its quantity's base unit. */
export interface UnitDef {
	/** Short label for the UI, e.g. "bar g", "°C", "kg/h". */
	readonly label: string;
	/** Long name for menus and screen readers, e.g. "bar (gauge)". */
	readonly name: string;
	/** Base units per unit: base = (value + offset) × factor. */
	readonly factor: number;
	/**
	 * Added before scaling, in this unit's own scale. Non-zero only for temperature scales
	 * whose zero is not absolute zero (°C: 273.15, °F: 459.67).
	 */
	readonly offset?: number;
	/** Gauge pressure: base = value × factor + atmospheric pressure (MPa). */
	readonly gauge?: boolean;
}

/** The units of one quantity, keyed by unit id. */
export type UnitTable = Readonly<Record<string, UnitDef>>;
