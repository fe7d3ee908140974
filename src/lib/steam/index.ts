/**
 * Steamwisp's water and steam properties: IAPWS-IF97 (IAPWS R7-97(2012)) in its base units,
 * p MPa absolute, T K, v m³/kg, h and u kJ/kg, s, cp and cv kJ/(kg K), w m/s.
 * Every function throws SteamRangeError for inputs outside the formulation; none returns NaN.
 */
export { SteamRangeError } from './errors';
export { saturationPressure, saturationTemperature } from './region4';
export { stateFromPT } from './forward';
export { stateFromPH, stateFromPS } from './inverse';
export { saturatedLiquid, saturatedVapour, stateFromPX, stateFromTX } from './saturation';
export type { Phase, Properties, Region, SteamState } from './types';
export * from './vocabulary';
export * from './losses/index';
export * from './heat/index';
export * from './plant/index';
