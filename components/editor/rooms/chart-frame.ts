// Shared sizes and scales of the room charts (SVG, drawn with shapes and labels, not colour alone).
export const CHART = { width: 340, height: 170, left: 38, right: 10, top: 14, bottom: 26 } as const;
export const INK = '#25282d';
export const MUTED = '#5d626b';
export const RISK = '#b5541b';
export const COOL = '#2d6a96';

export function linearScale(domain: [number, number], range: [number, number]): (value: number) => number {
  const [d0, d1] = domain;
  const [r0, r1] = range;
  const span = d1 - d0 || 1;
  return (value) => r0 + ((value - d0) / span) * (r1 - r0);
}

/** Round tick values across the domain (1, 2 or 5 times a power of ten apart). */
export function ticks(min: number, max: number, count = 5): number[] {
  const rough = (max - min) / count;
  const power = 10 ** Math.floor(Math.log10(rough || 1));
  const step = [1, 2, 5, 10].map((factor) => factor * power).find((candidate) => candidate >= rough) ?? power * 10;
  const first = Math.ceil(min / step) * step;
  return Array.from({ length: Math.floor((max - first) / step) + 1 }, (_, index) => first + index * step);
}

/** A logarithmic scale (frequency axes: each octave the same width). */
export function logScale(domain: [number, number], range: [number, number]): (value: number) => number {
  const [d0, d1] = domain.map((value) => Math.log10(Math.max(value, Number.MIN_VALUE)));
  const [r0, r1] = range;
  const span = d1 - d0 || 1;
  return (value) => r0 + ((Math.log10(Math.max(value, Number.MIN_VALUE)) - d0) / span) * (r1 - r0);
}

/** Nominal octave-band centre frequencies (IEC 61260-1), as ticks of a frequency axis. */
const OCTAVE_TICKS_HZ = [16, 31.5, 63, 125, 250, 500, 1000, 2000, 4000, 8000] as const;

export function octaveTicks(minHz: number, maxHz: number): number[] {
  return OCTAVE_TICKS_HZ.filter((hz) => hz >= minHz && hz <= maxHz);
}

/** "31.5", "125", "1k", "2k". */
export function frequencyTickText(hz: number): string {
  return hz >= 1000 ? `${hz / 1000}k` : String(hz);
}

/**
 * Label positions along one axis moved apart until each is at least gapPx from the next, in the
 * given order, kept within [minPx, maxPx] (labels beside close lines, echo arrivals).
 */
export function spreadLabels(positionsPx: readonly number[], gapPx: number, minPx: number, maxPx: number): number[] {
  const order = positionsPx.map((position, index) => ({ position, index })).sort((a, b) => a.position - b.position);
  const placed: number[] = [];
  for (const [rank, item] of order.entries()) placed[rank] = Math.max(item.position, minPx, rank > 0 ? placed[rank - 1] + gapPx : -Infinity);
  // pushed past the end: walk back from it
  for (let rank = placed.length - 1; rank >= 0; rank -= 1) {
    const ceiling = rank === placed.length - 1 ? maxPx : placed[rank + 1] - gapPx;
    placed[rank] = Math.min(placed[rank], ceiling);
  }
  const result: number[] = new Array(positionsPx.length);
  order.forEach((item, rank) => { result[item.index] = placed[rank]; });
  return result;
}
