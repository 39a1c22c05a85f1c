import { describe, expect, it } from 'vitest';
import { cutoffHz, equivalentRadiusM, sectionArea, sectionPerimeter, analyzeRun } from '@/lib/acoustic';
import { expectClose } from './tolerance';

describe('sections and cut-off', () => {
  it('areas and perimeters are the geometric ones', () => {
    expectClose(sectionArea({ shape: 'round', diameterM: 0.2 }), Math.PI * 0.01, 1e-15, 'round area');
    expectClose(sectionPerimeter({ shape: 'round', diameterM: 0.2 }), Math.PI * 0.2, 1e-15, 'round perimeter');
    expectClose(sectionArea({ shape: 'rect', widthM: 0.3, heightM: 0.2 }), 0.06, 1e-15, 'rect area');
    expectClose(sectionPerimeter({ shape: 'rect', widthM: 0.3, heightM: 0.2 }), 1.0, 1e-15, 'rect perimeter');
  });

  it('a rectangle\'s equivalent radius is that of the circle of equal area', () => {
    const radius = equivalentRadiusM({ shape: 'rect', widthM: 0.3, heightM: 0.2 });
    expectClose(Math.PI * radius * radius, 0.06, 1e-15, 'equal area');
  });

  // Kinsler & Frey, Fundamentals of Acoustics, ch. 9: rectangular c / (2a); round 1.84118 c / (pi d) (first zero of J1').
  it('rectangular cut-off c / (2 a), a the larger side: 0.6 m -> 286.0 Hz (Kinsler & Frey ch. 9)', () => {
    expectClose(cutoffHz({ shape: 'rect', widthM: 0.6, heightM: 0.3 }, 343.2), 343.2 / 1.2, 1e-9, 'formula');
    expectClose(cutoffHz({ shape: 'rect', widthM: 0.3, heightM: 0.6 }, 343.2), 286.0, 0.05, 'sheet');
  });

  it('round cut-off 1.84118 c / (pi d): d = 0.5 m -> 402.3 Hz (Kinsler & Frey ch. 9)', () => {
    expectClose(cutoffHz({ shape: 'round', diameterM: 0.5 }, 343.2), (1.84118 * 343.2) / (Math.PI * 0.5), 1e-9, 'formula');
    expectClose(cutoffHz({ shape: 'round', diameterM: 0.5 }, 343.2), 402.3, 0.05, 'sheet');
  });

  it('the run reports its lowest cut-off, defaults maxHz to it and warns when asked above it', () => {
    const segments = [
      { lengthM: 1, section: { shape: 'round' as const, diameterM: 0.2 } },
      { lengthM: 1, section: { shape: 'rect' as const, widthM: 0.6, heightM: 0.3 } },
    ];
    const base = analyzeRun({ segments, start: { kind: 'closed' }, end: { kind: 'closed' } });
    expectClose(base.cutoffHz, 343.2 / 1.2, 1e-9, 'lowest cut-off');
    expectClose(base.maxHz, base.cutoffHz, 1e-12, 'default maxHz = min(2000, cut-off)');
    expect(base.warnings).toEqual([]);
    const above = analyzeRun({ segments, start: { kind: 'closed' }, end: { kind: 'closed' }, maxHz: 400 });
    expect(above.warnings.some((warning) => warning.includes('cut-off'))).toBe(true);
  });
});
