// What one segment's walls and lining take from a plane wave along it, per octave band.
import { DB_PER_NEPER, DUCT_FLANKING_CAP_DB, OCTAVE_BANDS_HZ } from '../constants';
import { sabineLinedDuctDbPerM } from '../lining-attenuation';
import { fibrousLinerAbsorption } from '../lining/fibrous-liner-absorption';
import { sectionArea, sectionPerimeter } from '../section';
import type { Segment } from '../types';
import type { Wall } from './wall-types';
import { wallAttenuationDbPerM } from './wall-attenuation';

const BANDS_HZ: readonly number[] = OCTAVE_BANDS_HZ;
/** The walls of a segment that names none, in a run that names none. */
export const DEFAULT_WALL: Wall = { kind: 'sheet-metal' };

export interface SegmentAttenuation {
  /** Amplitude attenuation in each band 63 Hz to 8 kHz, Np/m, after the flanking cap. */
  npPerM: number[];
  /** The bands whose attenuation the flanking cap limited. */
  cappedBandsHz: number[];
}

/** The liner's attenuation in each band: one absorption given by the user, or fibrous liner of that thickness. */
function liningDbPerM(segment: Segment): number[] {
  const lining = segment.lining;
  if (!lining) return BANDS_HZ.map(() => 0);
  const perimeterM = sectionPerimeter(segment.section);
  const areaM2 = sectionArea(segment.section);
  const absorption = lining.absorption === undefined ? fibrousLinerAbsorption(lining.thicknessM, BANDS_HZ) : BANDS_HZ.map(() => lining.absorption as number);
  // Sabine (1940), J. Acoust. Soc. Am. 12, 53, via sabineLinedDuctDbPerM, with the liner's absorption in each band
  return absorption.map((alpha) => sabineLinedDuctDbPerM(alpha, perimeterM, areaM2));
}

/**
 * The wall's attenuation beyond the air's own boundary layer (which the chain carries separately as
 * Kirchhoff's loss): none for rigid walls, the published table for sheet metal, the user's figures
 * for measured walls; plus the liner's. Over the segment the two together never take more than
 * DUCT_FLANKING_CAP_DB (40 dB) in a band: sound breaking out of the duct and back in sets a floor
 * (common practice, no source), as the noise path's duct element does.
 */
export function segmentAttenuation(segment: Segment, runWall: Wall | undefined, wallLosses: boolean): SegmentAttenuation {
  const wall = segment.wall ?? runWall ?? DEFAULT_WALL;
  const wallDbPerM = !wallLosses || wall.kind === 'rigid' ? BANDS_HZ.map(() => 0) : wallAttenuationDbPerM(wall, segment.section, BANDS_HZ);
  const liningDb = liningDbPerM(segment);
  const capDbPerM = DUCT_FLANKING_CAP_DB / segment.lengthM;
  const cappedBandsHz: number[] = [];
  const npPerM = BANDS_HZ.map((hz, band) => {
    const totalDbPerM = wallDbPerM[band] + liningDb[band];
    if (totalDbPerM > capDbPerM) cappedBandsHz.push(hz);
    return Math.min(totalDbPerM, capDbPerM) / DB_PER_NEPER;
  });
  return { npPerM, cappedBandsHz };
}
