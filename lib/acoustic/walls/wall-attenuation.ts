// Attenuation per metre along a duct for each kind of wall.
import { airProperties } from '../air';
import { DB_PER_NEPER, DEFAULT_TEMPERATURE_C, OCTAVE_BANDS_HZ } from '../constants';
import { inputError, requireAtLeast } from '../input-error';
import { sectionArea, sectionPerimeter } from '../section';
import { interpolateLogAxis } from '../tables/log-axis-table';
import type { Section } from '../types';
import { kirchhoffAttenuationNpPerM } from '../wall-losses';
import type { Wall } from './wall-types';
import { unlinedDuctAttenuationDbPerM } from './unlined-duct-attenuation';

/** Throws a RangeError naming the field unless wall is a Wall; a measured wall needs 8 bands, each >= 0 dB/m. */
export function validateWall(wall: unknown, path: string): Wall {
  if (typeof wall !== 'object' || wall === null) throw inputError(path, 'must be an object');
  const candidate = wall as Record<string, unknown>;
  switch (candidate.kind) {
    case 'rigid':
    case 'sheet-metal':
      return wall as Wall;
    case 'measured': {
      const bands = candidate.attenuationDbPerM;
      if (!Array.isArray(bands) || bands.length !== OCTAVE_BANDS_HZ.length) {
        throw inputError(`${path}.attenuationDbPerM`, `must have ${OCTAVE_BANDS_HZ.length} octave-band values`);
      }
      bands.forEach((value, band) => requireAtLeast(value, 0, `${path}.attenuationDbPerM[${band}]`));
      return wall as Wall;
    }
    default:
      throw inputError(`${path}.kind`, "must be 'rigid', 'sheet-metal' or 'measured'");
  }
}

/**
 * dB per metre in each band: rigid walls lose only to the air's viscosity and heat conduction at the
 * wall (Kirchhoff); sheet metal as tabulated; measured figures as given at 63..8000 Hz, read between
 * bands in straight lines against log f and held beyond them.
 */
export function wallAttenuationDbPerM(wall: Wall, section: Section, bandsHz: readonly number[], temperatureC = DEFAULT_TEMPERATURE_C): number[] {
  switch (wall.kind) {
    case 'sheet-metal':
      return unlinedDuctAttenuationDbPerM(section, [...bandsHz]);
    case 'measured':
      return bandsHz.map((hz) => interpolateLogAxis(OCTAVE_BANDS_HZ, wall.attenuationDbPerM, hz));
    case 'rigid': {
      const air = airProperties(temperatureC);
      const perimeterM = sectionPerimeter(section);
      const areaM2 = sectionArea(section);
      // Kirchhoff (1868), via kirchhoffAttenuationNpPerM; amplitude nepers to decibels: 20 / ln 10 dB per Np
      return bandsHz.map((hz) => kirchhoffAttenuationNpPerM(hz, perimeterM, areaM2, air) * DB_PER_NEPER);
    }
  }
}
