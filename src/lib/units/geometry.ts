import { FT_M, GAL_US_M3, IN_M } from './constants';
import type { UnitTable } from './unit-def';

/** Length units; base m. in = 0.0254 m, ft = 0.3048 m exactly (NIST SP 811 B.8). */
export const lengthUnits = {
	mm: { label: 'mm', name: 'millimetres', factor: 1e-3 },
	m: { label: 'm', name: 'metres', factor: 1 },
	in: { label: 'in', name: 'inches', factor: IN_M },
	ft: { label: 'ft', name: 'feet', factor: FT_M }
} as const satisfies UnitTable;

/**
 * Area units, for flat surfaces; base m². ft² = 0.092 903 04 m² and in² = 6.4516 E-04 m²
 * exactly (NIST SP 811 B.8).
 */
export const areaUnits = {
	m2: { label: 'm²', name: 'square metres', factor: 1 },
	ft2: { label: 'ft²', name: 'square feet', factor: FT_M * FT_M },
	in2: { label: 'in²', name: 'square inches', factor: IN_M * IN_M }
} as const satisfies UnitTable;

/** Volume units; base m³. L = 1e-3 m³; US gal = 231 in³ exactly (NIST SP 811 B.8). */
export const volumeUnits = {
	m3: { label: 'm³', name: 'cubic metres', factor: 1 },
	L: { label: 'L', name: 'litres', factor: 1e-3 },
	gal_US: { label: 'US gal', name: 'US gallons', factor: GAL_US_M3 }
} as const satisfies UnitTable;
