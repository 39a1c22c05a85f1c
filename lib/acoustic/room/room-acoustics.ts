// Statistical room acoustics of a rectangular room: Sabine reverberation, Schroeder frequency,
// modal density and room constant, per octave band from the surfaces' absorption.
import { speedOfSound } from '../air';
import { DEFAULT_TEMPERATURE_C, SABINE_CONSTANT_S_PER_M, SCHROEDER_COEFFICIENT } from '../constants';
import { requireAbove, requireBetween } from '../input-error';
import type { RoomBox } from '../types';
import { SURFACE_NAMES, type RoomSurfaces, type SurfaceName } from './room-input';

/** Schroeder frequency, Hz: f_s = 2000 sqrt(T60 / V) (Schroeder & Kuttruff (1962), JASA 34, 76, from memory; Kuttruff, Room Acoustics, ch. 3). */
export function schroederFrequencyHz(reverberationTimeS: number, volumeM3: number): number {
  requireAbove(reverberationTimeS, 0, 'reverberationTimeS');
  requireAbove(volumeM3, 0, 'volumeM3');
  return SCHROEDER_COEFFICIENT * Math.sqrt(reverberationTimeS / volumeM3);
}

/** Sabine reverberation time, s: T60 = 0.161 V / A, A the absorption area in m² (W. C. Sabine, 1900; Kuttruff, Room Acoustics, ch. 5). */
export function sabineReverberationTimeS(volumeM3: number, absorptionAreaM2: number): number {
  requireAbove(volumeM3, 0, 'volumeM3');
  requireAbove(absorptionAreaM2, 0, 'absorptionAreaM2');
  return (SABINE_CONSTANT_S_PER_M * volumeM3) / absorptionAreaM2;
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
  /** Absorption area A = sum S_i alpha_i, m². */
  absorptionAreaM2: number;
  meanAbsorption: number;
  roomConstantM2: number;
  reverberationTimeS: number;
}

/** Absorption, room constant and Sabine T60 in each octave band. */
export function roomBands(room: RoomBox, surfaces: RoomSurfaces, bandsHz: readonly number[]): RoomBand[] {
  const areas = surfaceAreasM2(room);
  const { volumeM3, surfaceM2 } = roomGeometry(room);
  return bandsHz.map((hz, band) => {
    const absorptionAreaM2 = SURFACE_NAMES.reduce((sum, name) => sum + areas[name] * surfaces[name][band], 0);
    const meanAbsorption = absorptionAreaM2 / surfaceM2;
    return {
      hz,
      absorptionAreaM2,
      meanAbsorption,
      roomConstantM2: meanAbsorption < 1 ? roomConstantM2(surfaceM2, meanAbsorption) : Infinity,
      reverberationTimeS: absorptionAreaM2 > 0 ? sabineReverberationTimeS(volumeM3, absorptionAreaM2) : Infinity,
    };
  });
}
