// Chart axes: a logarithmic frequency axis gives every octave the same width; octave ticks are the
// nominal centre frequencies of IEC 61260-1; labels close together are spread to a minimum gap.
import { describe, expect, it } from 'vitest';
import { frequencyTickText, logScale, octaveTicks, spreadLabels } from '@/components/editor/rooms/chart-frame';
import { expectClose } from '../../acoustic/tolerance';

describe('chart axes', () => {
  it('every octave is the same width on a logarithmic axis (log10 2 of a decade each)', () => {
    const x = logScale([20, 2000], [0, 200]); // two decades over 200 px: 100 px a decade
    expectClose(x(20), 0, 1e-9, 'start');
    expectClose(x(200), 100, 1e-9, 'one decade');
    expectClose(x(80) - x(40), x(1000) - x(500), 1e-9, 'octaves alike');
    expectClose(x(40) - x(20), 100 * Math.log10(2), 1e-9, 'an octave is 30.1 px');
  });

  it('ticks at the nominal octave centres within the range', () => {
    expect(octaveTicks(20, 1200)).toEqual([31.5, 63, 125, 250, 500, 1000]);
    expect(frequencyTickText(2000)).toBe('2k');
    expect(frequencyTickText(31.5)).toBe('31.5');
  });

  it('spreads close labels to the gap, in order, within the bounds', () => {
    expect(spreadLabels([10, 12, 50], 8, 0, 100)).toEqual([10, 18, 50]);
    expect(spreadLabels([98, 99, 99.5], 8, 0, 100)).toEqual([84, 92, 100]);
    expect(spreadLabels([30, 20], 8, 0, 100)).toEqual([30, 20]);
  });
});
