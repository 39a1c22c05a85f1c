// Attenuation of sound by the air itself, by the closed-form equations of ISO 9613-1 (1993),
// "Acoustics — Attenuation of sound during propagation outdoors — Part 1: Calculation of the absorption
// of sound by the atmosphere": the classical (viscous and thermal) loss plus the relaxation of oxygen
// and nitrogen, whose relaxation frequencies follow the molar concentration of water vapour.
import { ISO_9613_REFERENCE_TEMPERATURE_K, STANDARD_PRESSURE_PA, ZERO_CELSIUS_K } from '../constants';
import { requireAbove, requireBetween, requireFinite } from '../input-error';
import { MAX_AIR_TEMPERATURE_C, MIN_AIR_TEMPERATURE_C } from '../input-limits';

/** Triple-point isotherm temperature of water, K (ISO 9613-1, eq. (B.3)). */
const TRIPLE_POINT_K = 273.16;
/** Ten times log10(e): an intensity decay of m per metre is 10 lg(e)·m dB per metre (definition of the neper). */
const DB_PER_INTENSITY_NEPER = 10 * Math.LOG10E;

/** Default conditions of room air where none are given: 20 °C and 50 % relative humidity (the conditions named in the product's brief). */
export const DEFAULT_ROOM_RELATIVE_HUMIDITY_PERCENT = 50;

export interface AirConditions {
  temperatureC: number;
  relativeHumidityPercent: number;
  /** Ambient pressure, Pa; default the standard atmosphere, 101 325 Pa. */
  pressurePa?: number;
}

/** Molar concentration of water vapour, %: h = h_r (p_sat / p_r) / (p_a / p_r), with log10(p_sat / p_r) = -6.8346 (T01/T)^1.261 + 4.6151 (ISO 9613-1, eqs. (B.1)–(B.3)). */
function waterVapourPercent(temperatureK: number, relativeHumidityPercent: number, pressureRatio: number): number {
  // ISO 9613-1 eq. (B.1): C = -6.8346 (T01 / T)^1.261 + 4.6151, p_sat / p_r = 10^C
  const saturationRatio = 10 ** (-6.8346 * (TRIPLE_POINT_K / temperatureK) ** 1.261 + 4.6151);
  return (relativeHumidityPercent * saturationRatio) / pressureRatio;
}

/** Pure-tone attenuation coefficient of air, dB per metre, at frequencyHz (ISO 9613-1, eq. (5)). */
export function airAttenuationDbPerM(frequencyHz: number, conditions: AirConditions): number {
  const hz = requireAbove(frequencyHz, 0, 'frequencyHz');
  const temperatureK = requireBetween(conditions.temperatureC, MIN_AIR_TEMPERATURE_C, MAX_AIR_TEMPERATURE_C, 'temperatureC') + ZERO_CELSIUS_K;
  const humidity = requireBetween(conditions.relativeHumidityPercent, 0, 100, 'relativeHumidityPercent');
  const pressureRatio = requireAbove(requireFinite(conditions.pressurePa ?? STANDARD_PRESSURE_PA, 'pressurePa'), 0, 'pressurePa') / STANDARD_PRESSURE_PA;
  const h = waterVapourPercent(temperatureK, humidity, pressureRatio);
  const t = temperatureK / ISO_9613_REFERENCE_TEMPERATURE_K;
  // ISO 9613-1 eq. (3): f_rO = (p_a/p_r) (24 + 4.04e4 h (0.02 + h) / (0.391 + h))
  const oxygenHz = pressureRatio * (24 + (4.04e4 * h * (0.02 + h)) / (0.391 + h));
  // ISO 9613-1 eq. (4): f_rN = (p_a/p_r) (T/T0)^(-1/2) (9 + 280 h exp(-4.170 ((T/T0)^(-1/3) - 1)))
  const nitrogenHz = pressureRatio * t ** -0.5 * (9 + 280 * h * Math.exp(-4.17 * (t ** (-1 / 3) - 1)));
  // ISO 9613-1 eq. (5): α = 8.686 f² [1.84e-11 (p_a/p_r)^-1 (T/T0)^(1/2) + (T/T0)^(-5/2) (0.01275 e^(-2239.1/T) / (f_rO + f²/f_rO) + 0.1068 e^(-3352/T) / (f_rN + f²/f_rN))]
  const classical = 1.84e-11 * (1 / pressureRatio) * Math.sqrt(t);
  const oxygen = (0.01275 * Math.exp(-2239.1 / temperatureK)) / (oxygenHz + (hz * hz) / oxygenHz);
  const nitrogen = (0.1068 * Math.exp(-3352.0 / temperatureK)) / (nitrogenHz + (hz * hz) / nitrogenHz);
  return 8.686 * hz * hz * (classical + t ** -2.5 * (oxygen + nitrogen));
}

/** Exact mid-band frequency of the octave band with a nominal centre, Hz: 1000 · 10^(3k/10) (IEC 61260-1 (2014), base-ten system). */
export function exactOctaveMidbandHz(nominalHz: number): number {
  const k = Math.round((10 / 3) * Math.log10(requireAbove(nominalHz, 0, 'nominalHz') / 1000));
  return 1000 * 10 ** ((3 * k) / 10);
}

/** Octave-band attenuation of air, dB per metre: the pure-tone value at the exact mid-band frequency (as ISO 9613-2 (1996), Table 2, tabulates it). */
export function airAttenuationBandDbPerM(nominalHz: number, conditions: AirConditions): number {
  return airAttenuationDbPerM(exactOctaveMidbandHz(nominalHz), conditions);
}

/** The energy attenuation coefficient m, 1/m, of Sabine's and Eyring's 4 m V: m = α / (10 lg e), α in dB/m (Kuttruff, Room Acoustics, ch. 5). */
export function energyAttenuationPerM(attenuationDbPerM: number): number {
  return attenuationDbPerM / DB_PER_INTENSITY_NEPER;
}
