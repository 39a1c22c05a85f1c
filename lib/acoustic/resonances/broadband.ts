// Which resonances are broad: a Q below BROADBAND_Q, or a -3 dB bandwidth at least the distance to a
// neighbouring resonance (the modes overlap, so no single one stands out; the modal-overlap idea of
// Schroeder's room frequency applied along the run; product rule).
import { BROADBAND_Q } from '../constants';

interface Mode {
  frequencyHz: number;
  q: number | null;
  bandwidthHz: number | null;
}

export function broadbandFlags(modes: readonly Mode[]): boolean[] {
  return modes.map((mode, index) => {
    if (mode.q === null || mode.bandwidthHz === null) return false;
    if (mode.q < BROADBAND_Q) return true;
    const below = index > 0 ? mode.frequencyHz - modes[index - 1].frequencyHz : Infinity;
    const above = index < modes.length - 1 ? modes[index + 1].frequencyHz - mode.frequencyHz : Infinity;
    return mode.bandwidthHz >= Math.min(below, above);
  });
}

/** The union of the broadband resonances' -3 dB bands, ascending. */
export function broadbandRangesHz(modes: readonly Mode[], broadband: readonly boolean[]): [number, number][] {
  const ranges: [number, number][] = [];
  modes.forEach((mode, index) => {
    if (!broadband[index] || mode.bandwidthHz === null) return;
    const low = Math.max(0, mode.frequencyHz - mode.bandwidthHz / 2);
    const high = mode.frequencyHz + mode.bandwidthHz / 2;
    const last = ranges[ranges.length - 1];
    if (last && low <= last[1]) last[1] = Math.max(last[1], high);
    else ranges.push([low, high]);
  });
  return ranges;
}
