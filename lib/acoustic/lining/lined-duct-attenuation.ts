// Insertion loss of a straight duct lined inside with fibrous liner, per octave band, capped by flanking.
import { DUCT_FLANKING_CAP_DB } from '../constants';
import { fieldPath, inputError, requireAbove } from '../input-error';
import { sabineLinedDuctDbPerM } from '../lining-attenuation';
import { sectionArea, sectionPerimeter } from '../section';
import type { Section } from '../types';
import { validateSection } from '../validate-run';
import { fibrousLinerAbsorption } from './fibrous-liner-absorption';

/**
 * dB over lengthM in each band of bandsHz: Sabine's lined-duct attenuation (1.05 α^1.4 P/S dB/m, the
 * section being the free airway inside the liner) with the liner's absorption α in that band for its
 * thickness, times the length, and never more than DUCT_FLANKING_CAP_DB (40 dB) however long the run:
 * beyond that, sound breaking out of the duct and back in sets the level (common practice, no source).
 * Not modelled: the fall of attenuation at high frequency in wide ducts, where sound beams down the
 * middle of the airway past the liner.
 */
export function linedDuctAttenuationDb(
  section: Section,
  lining: { thicknessM: number },
  lengthM: number,
  bandsHz: number[],
  path = '',
): number[] {
  const field = (name: string) => fieldPath(path, name);
  validateSection(section, field('section'));
  if (typeof lining !== 'object' || lining === null) throw inputError(field('lining'), 'must be an object');
  requireAbove(lengthM, 0, field('lengthM'));
  const absorption = fibrousLinerAbsorption(lining.thicknessM, bandsHz, field('lining.thicknessM'));
  const perimeterM = sectionPerimeter(section);
  const areaM2 = sectionArea(section);
  // Sabine (1940), J. Acoust. Soc. Am. 12, 53, via sabineLinedDuctDbPerM; capped at the flanking limit
  return absorption.map((alpha) => Math.min(sabineLinedDuctDbPerM(alpha, perimeterM, areaM2) * lengthM, DUCT_FLANKING_CAP_DB));
}
