// Geometry of a duct cross-section: area, perimeter, equivalent radius, plane-wave cut-off.
import { BESSEL_J1_PRIME_FIRST_ZERO } from './constants';
import type { Section } from './types';

/** Cross-sectional area, m². */
export function sectionArea(section: Section): number {
  return section.shape === 'round' ? (Math.PI * section.diameterM * section.diameterM) / 4 : section.widthM * section.heightM;
}

/** Wetted perimeter, m. */
export function sectionPerimeter(section: Section): number {
  return section.shape === 'round' ? Math.PI * section.diameterM : 2 * (section.widthM + section.heightM);
}

/**
 * Radius used for end corrections and radiation: the radius for a round duct; for a rectangular
 * duct, the radius of the circle of equal area (an approximation: the published radiation models are for round pipes).
 */
export function equivalentRadiusM(section: Section): number {
  return section.shape === 'round' ? section.diameterM / 2 : Math.sqrt(sectionArea(section) / Math.PI);
}

/** Frequency above which the first higher-order mode propagates, Hz. */
export function cutoffHz(section: Section, speedOfSoundMps: number): number {
  if (section.shape === 'round') {
    // Kinsler & Frey, Fundamentals of Acoustics, ch. 9: (1,1) mode of a round duct, f = 1.84118 c / (pi d)
    return (BESSEL_J1_PRIME_FIRST_ZERO * speedOfSoundMps) / (Math.PI * section.diameterM);
  }
  // Kinsler & Frey, Fundamentals of Acoustics, ch. 9: (1,0) mode of a rectangular duct, f = c / (2 a), a the larger side
  return speedOfSoundMps / (2 * Math.max(section.widthM, section.heightM));
}
