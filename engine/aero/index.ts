/**
 * engine/aero's public surface (hand-written; docs/style.md §5): the 1976
 * standard atmosphere, the four airspeeds, and the drag polar's
 * coefficients. Other layers import this file, never the modules.
 */
export { atmosphere, MAX_PRESSURE_ALTITUDE_M, MIN_PRESSURE_ALTITUDE_M, type AtmosphereState } from './standardAtmosphere';
export { airspeedsAt, type Airspeeds, type SpeedInput } from './airspeeds';
export { polarCoefficients, type DragPolarModel } from './dragPolar';
