// Attenuation along straight unlined galvanised sheet-metal ducts, per octave band, from the published tables.
import { FOOT_M, INCH_M } from '../constants';
import { inputError, requireAbove } from '../input-error';
import { sectionArea, sectionPerimeter } from '../section';
import { interpolateLogTable } from '../tables/log-axis-table';
import type { Section } from '../types';
import { validateSection } from '../validate-run';
import {
  RECT_BANDS_HZ,
  RECT_DB_PER_FT,
  RECT_PERIMETER_PER_AREA_PER_FT,
  ROUND_BANDS_HZ,
  ROUND_DB_PER_FT,
  ROUND_DIAMETER_IN,
} from './sheet-metal-tables';

/**
 * dB per metre in each band of bandsHz. Between the tabulated sizes and bands the table is read in
 * straight lines against log(P/A) (rectangular) or log D (round) and log f. Outside it the nearest
 * edge holds: rectangular P/A below 0.7 /ft (larger than 72 x 72 in) or above 8 /ft (smaller than
 * 6 x 6 in), round D below 7 in or above 60 in, and bands below 63 Hz or above the last column.
 */
export function unlinedDuctAttenuationDbPerM(section: Section, bandsHz: number[], path = 'section'): number[] {
  validateSection(section, path);
  if (!Array.isArray(bandsHz)) throw inputError('bandsHz', 'must be an array');
  const frequencies = bandsHz.map((hz, index) => requireAbove(hz, 0, `bandsHz[${index}]`));
  if (section.shape === 'round') {
    const diameterIn = section.diameterM / INCH_M;
    // ASHRAE Handbook, HVAC Applications, noise chapter: straight round ducts, dB/ft (from memory)
    return frequencies.map((hz) => interpolateLogTable(ROUND_DIAMETER_IN, ROUND_BANDS_HZ, ROUND_DB_PER_FT, diameterIn, hz) / FOOT_M);
  }
  const perimeterPerAreaPerFt = (sectionPerimeter(section) / sectionArea(section)) * FOOT_M;
  // ASHRAE Handbook, HVAC Applications, noise chapter: unlined rectangular ducts by P/A, dB/ft (from memory)
  return frequencies.map(
    (hz) => interpolateLogTable(RECT_PERIMETER_PER_AREA_PER_FT, RECT_BANDS_HZ, RECT_DB_PER_FT, perimeterPerAreaPerFt, hz) / FOOT_M,
  );
}
