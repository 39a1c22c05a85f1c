'use client';

import type { ImageSource } from '@/lib/acoustic';
import { CHART, INK, linearScale, MUTED, ticks } from './chart-frame';
import { signedFixed } from '@/lib/signed-number';

const FLOOR_DB = -30;

/** Energy mean over the octave bands, dB relative to the direct sound. */
function meanLevelDb(levelsDb: number[]): number {
  return 10 * Math.log10(levelsDb.reduce((sum, levelDb) => sum + 10 ** (levelDb / 10), 0) / levelsDb.length);
}

// Arrivals at the listener (direct sound and image sources): delay after the direct sound across,
// level relative to the direct sound up. Direct: square; first order: filled circle; second: open circle.
export function Reflectogram({ images }: { images: ImageSource[] }) {
  const arrivals = images.map((image) => ({ image, levelDb: image.order === 0 ? 0 : Math.max(FLOOR_DB, meanLevelDb(image.relativeLevelDb)) }));
  const lastMs = Math.max(...images.map((image) => image.delayAfterDirectS * 1000), 1);
  const x = linearScale([0, lastMs], [CHART.left, CHART.width - CHART.right]);
  const y = linearScale([FLOOR_DB, 0], [CHART.height - CHART.bottom, CHART.top]);
  return (
    <figure>
      <svg viewBox={`0 0 ${CHART.width} ${CHART.height}`} className="w-full" role="img" aria-label={`Reflectogram: ${images.length - 1} reflections within ${lastMs.toFixed(1)} ms of the direct sound`}>
        <line x1={CHART.left} y1={y(FLOOR_DB)} x2={CHART.width - CHART.right} y2={y(FLOOR_DB)} stroke={MUTED} />
        {ticks(0, lastMs).map((ms) => <text key={ms} x={x(ms)} y={CHART.height - 8} fontSize="8" textAnchor="middle" fill={MUTED} className="num">{ms} ms</text>)}
        {[0, -10, -20, -30].map((db) => <text key={db} x={CHART.left - 4} y={y(db) + 3} fontSize="8" textAnchor="end" fill={MUTED} className="num">{signedFixed(db, 0)} dB</text>)}
        {arrivals.map(({ image, levelDb }, index) => {
          const cx = x(image.delayAfterDirectS * 1000);
          const cy = y(levelDb);
          return (
            <g key={index} data-testid="arrival">
              <line x1={cx} y1={y(FLOOR_DB)} x2={cx} y2={cy} stroke={INK} strokeWidth={0.7} />
              {image.order === 0 ? <rect x={cx - 3} y={cy - 3} width={6} height={6} fill={INK} /> : <circle cx={cx} cy={cy} r={2.5} fill={image.order === 1 ? INK : 'white'} stroke={INK} />}
              <title>{`${image.order === 0 ? 'direct sound' : `${image.order}. order: ${image.surfacesHit.join(', ')}`}; ${(image.delayAfterDirectS * 1000).toFixed(1)} ms, ${signedFixed(levelDb, 1)} dB`}</title>
            </g>
          );
        })}
      </svg>
      <figcaption className="mt-1 flex flex-wrap gap-x-3 text-xs text-graphite-500"><span>■ direct</span><span>● first order</span><span>○ second order</span><span>level: mean over the octave bands</span></figcaption>
    </figure>
  );
}
