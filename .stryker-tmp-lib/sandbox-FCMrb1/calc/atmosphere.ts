// @ts-nocheck
// The standard atmosphere's troposphere (ISO 2533:1975 / U.S. Standard Atmosphere 1976),
// used by forms to fill ambient pressure and temperature from altitude.
import { altitudeSchema, parseOrThrow } from "./schema";

/** Sea-level standard pressure (Pa). */
export const SEA_LEVEL_PRESSURE = 101_325;
/** Sea-level standard temperature (K). */
export const SEA_LEVEL_TEMPERATURE = 288.15;
/** Temperature lapse rate of the troposphere (K/m of geopotential height). */
export const TROPOSPHERE_LAPSE_RATE = 0.0065;
/** Gas constant of air as the standard atmosphere defines it (J/(kg·K)). */
export const ATMOSPHERE_GAS_CONSTANT = 287.05287;
/** Standard acceleration of gravity (m/s²). */
export const ATMOSPHERE_GRAVITY = 9.80665;
/** Earth radius used to turn geometric into geopotential altitude (m). */
export const ATMOSPHERE_EARTH_RADIUS = 6_356_766;

/** State of the standard atmosphere at one altitude. */
export interface AtmosphereState {
  /** Absolute pressure (Pa). */
  readonly pressure: number;
  /** Temperature (K). */
  readonly temperature: number;
  /** Density (kg/m³). */
  readonly density: number;
}

/** Unchecked standard atmosphere at a geometric altitude (m), troposphere only. */
export function standardAtmosphereUnchecked(altitude: number): AtmosphereState {
  const geopotential = (ATMOSPHERE_EARTH_RADIUS * altitude) / (ATMOSPHERE_EARTH_RADIUS + altitude);
  const temperature = SEA_LEVEL_TEMPERATURE - TROPOSPHERE_LAPSE_RATE * geopotential;
  const exponent = ATMOSPHERE_GRAVITY / (TROPOSPHERE_LAPSE_RATE * ATMOSPHERE_GAS_CONSTANT);
  const pressure = SEA_LEVEL_PRESSURE * (temperature / SEA_LEVEL_TEMPERATURE) ** exponent;
  return { pressure, temperature, density: pressure / (ATMOSPHERE_GAS_CONSTANT * temperature) };
}

/** Pressure (Pa), temperature (K) and density (kg/m³) of the standard atmosphere at a geometric altitude (m, −1000 to 11 000). */
export function standardAtmosphere(altitude: number): AtmosphereState {
  return standardAtmosphereUnchecked(parseOrThrow(altitudeSchema, altitude, "altitude"));
}
