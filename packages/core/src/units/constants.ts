/**
 * Physical constants, exact in the SI since 2019 (CODATA 2018 recommended values), and the
 * thermal voltage they give. Diodes use it for their junctions; noise analyses for 4kTR.
 */

/** Boltzmann constant k, J/K (exact). */
export const BOLTZMANN = 1.380649e-23;
/** Elementary charge q, C (exact). */
export const ELEMENTARY_CHARGE = 1.602176634e-19;
/** 0 °C in kelvin (exact, by the definition of the Celsius scale). */
export const ZERO_CELSIUS = 273.15;

/** Absolute temperature in kelvin of `celsius`. */
export function kelvin(celsius: number): number {
  return celsius + ZERO_CELSIUS;
}

/** Thermal voltage kT/q in volts at `celsius` (about 25.7 mV at 25 °C). */
export function thermalVoltage(celsius: number): number {
  return (BOLTZMANN * kelvin(celsius)) / ELEMENTARY_CHARGE;
}
