// Plain words for a section and a termination, as printed in the schedule.
import type { Section, Termination } from '@/lib/acoustic';

export function describeSection(section: Section): string {
  return section.shape === 'round'
    ? `round Ø ${(section.diameterM * 1000).toFixed(0)} mm`
    : `rectangular ${(section.widthM * 1000).toFixed(0)} × ${(section.heightM * 1000).toFixed(0)} mm`;
}

export function describeTermination(termination: Termination): string {
  switch (termination.kind) {
    case 'closed': return 'closed (rigid)';
    case 'open': return termination.flange === 'flanged' ? 'open, flanged' : 'open, unflanged';
    case 'lined': return `lined, absorption ${termination.absorption.toFixed(2)}`;
    case 'anechoic': return 'anechoic (no reflection)';
  }
}

/** A duct size as marked on a drawing: "Ø315" or "600×400" (mm). */
export function describeSize(section: Section): string {
  return section.shape === 'round'
    ? `Ø${(section.diameterM * 1000).toFixed(0)}`
    : `${(section.widthM * 1000).toFixed(0)}×${(section.heightM * 1000).toFixed(0)}`;
}
