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
