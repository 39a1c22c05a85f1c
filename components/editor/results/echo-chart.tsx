'use client';

import type { Echo } from '@/lib/acoustic';
import { echoPolyline } from './echo-geometry';
import { spreadLabels } from '../rooms/chart-frame';
import { signedFixed } from '@/lib/signed-number';

const WIDTH = 320;
const HEIGHT = 260;
const MARGIN = { left: 52, right: 12, top: 18, bottom: 8 };
const LABEL_FONT_PX = 8;
/** Labels of arrivals close in time stand at least this far apart, px (the font's height and a little). */
const LABEL_GAP_PX = 9.5;

// Space-time diagram of the reflections seen from the start end: position along the run
// across, time down. Upright reflections solid, inverted ones dashed, each labelled.
export function EchoChart({ echoes, lengthM, maxEchoes = 10 }: { echoes: Echo[]; lengthM: number; maxEchoes?: number }) {
  const shown = echoes.slice(0, maxEchoes);
  if (shown.length === 0) return <p className="text-sm text-graphite-500">No reflection comes back above the threshold: the ends absorb what arrives.</p>;
  const lastS = shown[shown.length - 1].delayS;
  const x = (positionM: number) => MARGIN.left + (positionM / lengthM) * (WIDTH - MARGIN.left - MARGIN.right);
  const y = (timeS: number) => MARGIN.top + (timeS / lastS) * (HEIGHT - MARGIN.top - MARGIN.bottom);
  const polylines = shown.map((echo) => echoPolyline(echo, lengthM));
  // each label beside its arrival, moved down or up just enough to clear its neighbours; a short
  // leader joins a moved label to its arrival
  const tails = polylines.map((points) => points[points.length - 1]);
  const labelYs = spreadLabels(tails.map((tail) => y(tail.timeS) - 2), LABEL_GAP_PX, MARGIN.top + LABEL_FONT_PX, HEIGHT);
  return (
    <figure>
      <svg viewBox={`0 0 ${WIDTH} ${HEIGHT}`} className="w-full" role="img" aria-label={`Echo chart: ${shown.length} arrivals back at the start end, the last after ${(lastS * 1000).toFixed(1)} ms`}>
        <line x1={x(0)} y1={MARGIN.top} x2={x(0)} y2={HEIGHT - MARGIN.bottom} stroke="#a3a7ae" />
        <line x1={x(lengthM)} y1={MARGIN.top} x2={x(lengthM)} y2={HEIGHT - MARGIN.bottom} stroke="#a3a7ae" />
        <text x={x(0)} y={12} fontSize="9" textAnchor="middle" fill="#5d626b">start</text>
        <text x={x(lengthM)} y={12} fontSize="9" textAnchor="end" fill="#5d626b">end {lengthM.toFixed(2)} m</text>
        {[0, 0.5, 1].map((fraction) => (
          <text key={fraction} x={MARGIN.left - 4} y={y(lastS * fraction) + 3} fontSize="8" textAnchor="end" fill="#5d626b" className="num">
            {signedFixed(lastS * fraction * 1000, 1)} ms
          </text>
        ))}
        {shown.map((echo, index) => {
          const points = polylines[index];
          const inverted = echo.amplitude < 0;
          const tail = tails[index];
          const labelY = labelYs[index];
          const moved = Math.abs(labelY - (y(tail.timeS) - 2)) > 1;
          return (
            <g key={index} data-testid="echo-line" data-inverted={inverted}>
              <polyline
                points={points.map((point) => `${x(point.positionM)},${y(point.timeS)}`).join(' ')}
                fill="none"
                stroke={inverted ? '#b5541b' : '#25282d'}
                strokeWidth={1}
                strokeDasharray={inverted ? '4 3' : undefined}
                opacity={Math.max(0.35, Math.min(1, Math.abs(echo.amplitude) * 2))}
              />
              {moved && <line x1={x(tail.positionM)} y1={y(tail.timeS)} x2={x(tail.positionM) + 10} y2={labelY - 3} stroke="#a3a7ae" strokeWidth={0.5} />}
              <text x={x(tail.positionM) + (moved ? 11 : 3)} y={labelY} fontSize={LABEL_FONT_PX} fill="#25282d" className="num" data-testid="echo-label">
                {inverted ? '−' : '+'}{Math.abs(echo.amplitude).toFixed(2)}
              </text>
            </g>
          );
        })}
      </svg>
      <figcaption className="mt-1 flex gap-4 text-xs text-graphite-500">
        <span><svg width="22" height="6" aria-hidden="true"><line x1="0" y1="3" x2="22" y2="3" stroke="#25282d" /></svg> upright (+)</span>
        <span><svg width="22" height="6" aria-hidden="true"><line x1="0" y1="3" x2="22" y2="3" stroke="#b5541b" strokeDasharray="4 3" /></svg> inverted (−)</span>
        <span>first {shown.length} arrivals</span>
      </figcaption>
    </figure>
  );
}
