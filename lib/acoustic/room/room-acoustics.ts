// Statistical room acoustics of a rectangular room: Sabine and Eyring reverberation with the air's own
// absorption, Schroeder frequency, modal density and room constant, per octave band from the surfaces'
// absorption.
import { speedOfSound } from '../air';
import { DEFAULT_TEMPERATURE_C, SABINE_CONSTANT_S_PER_M, SCHROEDER_COEFFICIENT } from '../constants';
import { requireAbove, requireBetween } from '../input-error';
import type { RoomBox } from '../types';
import { airAttenuationBandDbPerM, DEFAULT_ROOM_RELATIVE_HUMIDITY_PERCENT, energyAttenuationPerM } from './air-absorption';
import { SURFACE_NAMES, type RoomSurfaces, type SurfaceName } from './room-input';

/** Schroeder frequency, Hz: f_s = 2000 sqrt(T60 / V) (Schroeder & Kuttruff (1962), JASA 34, 76, from memory; Kuttruff, Room Acoustics, ch. 3). */
export function schroederFrequencyHz(reverberationTimeS: number, volumeM3: number): number {
  requireAbove(reverberationTimeS, 0, 'reverberationTimeS');
  requireAbove(volumeM3, 0, 'volumeM3');
  return SCHROEDER_COEFFICIENT * Math.sqrt(reverberationTimeS / volumeM3);
}

/**
 * Sabine reverberation time, s: T60 = 0.161 V / (A + 4 m V), A the surfaces' absorption area in m², m
 * the air's energy attenuation per metre (W. C. Sabine, 1900; the air's term as in Kuttruff, Room
 * Acoustics, ch. 5). Without airPerM the air is left out.
 */
export function sabineReverberationTimeS(volumeM3: number, absorptionAreaM2: number, airPerM = 0): number {
  requireAbove(volumeM3, 0, 'volumeM3');
  requireAbove(absorptionAreaM2 + 4 * airPerM * volumeM3, 0, 'absorptionAreaM2');
  // Sabine: T60 = 0.161 V / (A + 4 m V)
  return (SABINE_CONSTANT_S_PER_M * volumeM3) / (absorptionAreaM2 + 4 * airPerM * volumeM3);
}

/**
 * Eyring reverberation time, s: T60 = 0.161 V / (-S ln(1 - a) + 4 m V), a the surfaces' mean absorption
 * (Eyring (1930), JASA 1, 217; the air's term as in Kuttruff, Room Acoustics, ch. 5). Shorter than
 * Sabine's in a well-damped room, the same as a tends to 0.
 */
export function eyringReverberationTimeS(volumeM3: number, surfaceM2: number, meanAbsorption: number, airPerM = 0): number {
  requireAbove(volumeM3, 0, 'volumeM3');
  requireAbove(surfaceM2, 0, 'surfaceM2');
  requireBetween(meanAbsorption, 0, 1, 'meanAbsorption');
  const absorption = meanAbsorption >= 1 ? Infinity : -surfaceM2 * Math.log(1 - meanAbsorption) + 4 * airPerM * volumeM3;
  // Eyring: T60 = 0.161 V / (-S ln(1 - a) + 4 m V)
  return absorption > 0 ? (SABINE_CONSTANT_S_PER_M * volumeM3) / absorption : Infinity;
}

/**
 * Asymptotic modal density of a rectangular room, modes per Hz:
 * dN/df = 4 pi V f^2 / c^3 + pi S f / (2 c^2) + L / (8 c), S the total surface, L the total edge length
 * (Morse & Bolt (1944), Rev. Mod. Phys. 16, 69; Kuttruff, Room Acoustics, ch. 3).
 */
export function modalDensityPerHz(room: RoomBox, frequencyHz: number): number {
  const { volumeM3, surfaceM2, edgeLengthM } = roomGeometry(room);
  const c = roomSpeedOfSound(room);
  return (4 * Math.PI * volumeM3 * frequencyHz ** 2) / c ** 3 + (Math.PI * surfaceM2 * frequencyHz) / (2 * c ** 2) + edgeLengthM / (8 * c);
}

/** Room constant, m²: R = S a / (1 - a), a the mean absorption coefficient (Long, Architectural Acoustics, 2nd ed., ch. 8). */
export function roomConstantM2(surfaceM2: number, meanAbsorption: number): number {
  requireAbove(surfaceM2, 0, 'surfaceM2');
  requireBetween(meanAbsorption, 0, 1, 'meanAbsorption');
  return (surfaceM2 * meanAbsorption) / (1 - meanAbsorption);
}

export function roomSpeedOfSound(room: RoomBox): number {
  return room.speedOfSoundMps ?? speedOfSound(room.temperatureC ?? DEFAULT_TEMPERATURE_C);
}

export function roomGeometry(room: RoomBox): { volumeM3: number; surfaceM2: number; edgeLengthM: number } {
  const { lengthM, widthM, heightM } = room;
  return {
    volumeM3: lengthM * widthM * heightM,
    surfaceM2: 2 * (lengthM * widthM + lengthM * heightM + widthM * heightM),
    edgeLengthM: 4 * (lengthM + widthM + heightM),
  };
}

/** Area of each surface, m². */
export function surfaceAreasM2(room: RoomBox): Record<SurfaceName, number> {
  const { lengthM, widthM, heightM } = room;
  return {
    wallXMin: widthM * heightM,
    wallXMax: widthM * heightM,
    wallYMin: lengthM * heightM,
    wallYMax: lengthM * heightM,
    floor: lengthM * widthM,
    ceiling: lengthM * widthM,
  };
}

export interface RoomBand {
  hz: number;
  /** The surfaces' absorption area A = sum S_i alpha_i, m². */
  absorptionAreaM2: number;
  /** The surfaces' mean absorption A / S. */
  meanAbsorption: number;
  /** The air's attenuation in this band, dB/m (ISO 9613-1 at the room's temperature and humidity). */
  airAttenuationDbPerM: number;
  /** The air's absorption area 4 m V, m². */
  airAbsorptionAreaM2: number;
  /** R = S a / (1 - a) with a = (A + 4 m V) / S: the surfaces and the air. */
  roomConstantM2: number;
  /** Sabine's T60 with the air's absorption, s. */
  reverberationTimeS: number;
  /** Eyring's T60 with the air's absorption, s. */
  eyringReverberationTimeS: number;
}

/** Absorption (surfaces and air), room constant and T60 (Sabine and Eyring) in each octave band. */
export function roomBands(room: RoomBox, surfaces: RoomSurfaces, bandsHz: readonly number[]): RoomBand[] {
  const areas = surfaceAreasM2(room);
  const { volumeM3, surfaceM2 } = roomGeometry(room);
  const air = { temperatureC: room.temperatureC ?? DEFAULT_TEMPERATURE_C, relativeHumidityPercent: room.relativeHumidityPercent ?? DEFAULT_ROOM_RELATIVE_HUMIDITY_PERCENT };
  return bandsHz.map((hz, band) => {
    const absorptionAreaM2 = SURFACE_NAMES.reduce((sum, name) => sum + areas[name] * surfaces[name][band], 0);
    const meanAbsorption = absorptionAreaM2 / surfaceM2;
    const airAttenuationDbPerM = airAttenuationBandDbPerM(hz, air);
    const airPerM = energyAttenuationPerM(airAttenuationDbPerM);
    const airAbsorptionAreaM2 = 4 * airPerM * volumeM3;
    const totalAbsorption = Math.min(1, (absorptionAreaM2 + airAbsorptionAreaM2) / surfaceM2);
    return {
      hz,
      absorptionAreaM2,
      meanAbsorption,
      airAttenuationDbPerM,
      airAbsorptionAreaM2,
      roomConstantM2: totalAbsorption < 1 ? roomConstantM2(surfaceM2, totalAbsorption) : Infinity,
      reverberationTimeS: absorptionAreaM2 + airAbsorptionAreaM2 > 0 ? sabineReverberationTimeS(volumeM3, absorptionAreaM2, airPerM) : Infinity,
      eyringReverberationTimeS: eyringReverberationTimeS(volumeM3, surfaceM2, Math.min(1, meanAbsorption), airPerM),
    };
  });
}
