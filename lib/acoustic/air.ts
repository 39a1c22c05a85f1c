// Properties of dry air as functions of temperature.
import {
  AIR_HEAT_CAPACITY_RATIO,
  AIR_PRANDTL_NUMBER,
  DRY_AIR_GAS_CONSTANT_J_PER_KG_K,
  ISO_9613_REFERENCE_SPEED_OF_SOUND_MPS,
  ISO_9613_REFERENCE_TEMPERATURE_K,
  STANDARD_PRESSURE_PA,
  SUTHERLAND_CONSTANT_K,
  SUTHERLAND_REFERENCE_TEMPERATURE_K,
  SUTHERLAND_REFERENCE_VISCOSITY_PA_S,
  ZERO_CELSIUS_K,
} from './constants';
import { requireAbove } from './input-error';

function kelvin(temperatureC: number): number {
  return requireAbove(temperatureC, -ZERO_CELSIUS_K, 'temperatureC') + ZERO_CELSIUS_K;
}

/** Speed of sound in dry air, m/s. */
export function speedOfSound(temperatureC: number): number {
  // ISO 9613-1 (1993), eq. (A.3) reference form: c = 343.2 sqrt(T / 293.15)
  return ISO_9613_REFERENCE_SPEED_OF_SOUND_MPS * Math.sqrt(kelvin(temperatureC) / ISO_9613_REFERENCE_TEMPERATURE_K);
}

/** Density of dry air, kg/m³. */
export function airDensity(temperatureC: number, pressurePa: number = STANDARD_PRESSURE_PA): number {
  // Ideal gas law: rho = p / (R T)
  return pressurePa / (DRY_AIR_GAS_CONSTANT_J_PER_KG_K * kelvin(temperatureC));
}

/** Specific characteristic impedance of air, rho·c, Pa·s/m. */
export function characteristicImpedance(temperatureC: number): number {
  // Kinsler & Frey, Fundamentals of Acoustics, ch. 5: z0 = rho0 c
  return airDensity(temperatureC) * speedOfSound(temperatureC);
}

/** Dynamic viscosity of air, Pa·s. */
export function dynamicViscosity(temperatureC: number): number {
  const temperatureK = kelvin(temperatureC);
  // Sutherland (1893), Phil. Mag. 36, 507: mu = mu0 (T/T0)^1.5 (T0 + S)/(T + S)
  return (
    SUTHERLAND_REFERENCE_VISCOSITY_PA_S *
    Math.pow(temperatureK / SUTHERLAND_REFERENCE_TEMPERATURE_K, 1.5) *
    ((SUTHERLAND_REFERENCE_TEMPERATURE_K + SUTHERLAND_CONSTANT_K) / (temperatureK + SUTHERLAND_CONSTANT_K))
  );
}

/** The air properties the propagation model needs, at one temperature. */
export interface AirProperties {
  temperatureC: number;
  speedOfSoundMps: number;
  densityKgM3: number;
  dynamicViscosityPaS: number;
  heatCapacityRatio: number;
  prandtlNumber: number;
}

export function airProperties(temperatureC: number): AirProperties {
  return {
    temperatureC,
    speedOfSoundMps: speedOfSound(temperatureC),
    densityKgM3: airDensity(temperatureC),
    dynamicViscosityPaS: dynamicViscosity(temperatureC),
    heatCapacityRatio: AIR_HEAT_CAPACITY_RATIO,
    prandtlNumber: AIR_PRANDTL_NUMBER,
  };
}
