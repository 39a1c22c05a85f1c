'use client';

import type { RoomMode } from '@/lib/acoustic';
import { CHART, COOL, frequencyTickText, INK, logScale, MUTED, octaveTicks, RISK } from './chart-frame';

const MODE_HEIGHT = { axial: 56, tangential: 38, oblique: 20 } as const;
const HEIGHT = 120;
/** The chart reaches a little past the highest fan tone, so its labels fit. */
const TONE_MARGIN = 1.15;
/** The axis starts an octave-third below the lowest thing drawn, and never below 10 Hz. */
const LOW_MARGIN = 1.25;
const LOWEST_HZ = 10;
/** Fan-tone labels closer than this, px, are left off (the triangles stay). */
const TONE_LABEL_GAP_PX = 34;

interface ModeChartProps {
  modes: RoomMode[];
  resonancesHz: number[];
  fanTonesHz: number[];
  schroederHz: number;
}

// Room modes (tall: axial, middle: tangential, short: oblique) above the axis up to the Schroeder
// frequency, a hatched band above it where they overlap; duct resonances (circles) and fan tones
// (triangles) below it, all on one logarithmic frequency axis (each octave the same width, so the
// low modes that matter most are not squeezed into the first few pixels).
export function ModeChart({ modes, resonancesHz, fanTonesHz, schroederHz }: ModeChartProps) {
  const maxHz = Math.max(...modes.map((mode) => mode.frequencyHz), ...fanTonesHz.map((hz) => hz * TONE_MARGIN), 50);
  const lowest = Math.min(...modes.map((mode) => mode.frequencyHz), ...resonancesHz.filter((hz) => hz > 0), ...fanTonesHz.filter((hz) => hz > 0), maxHz);
  const minHz = Math.max(LOWEST_HZ, lowest / LOW_MARGIN);
  const x = logScale([minHz, maxHz], [CHART.left, CHART.width - CHART.right]);
  const axisY = CHART.top + 62;
  const shown = (hz: number) => hz >= minHz && hz <= maxHz;
  // fan-tone labels that would run into the one before are left off
  const toneLabels = fanTonesHz.filter(shown).reduce<{ lastPx: number; keep: boolean[] }>((acc, hz) => {
    const keep = x(hz) - acc.lastPx >= TONE_LABEL_GAP_PX;
    return { lastPx: keep ? x(hz) : acc.lastPx, keep: [...acc.keep, keep] };
  }, { lastPx: -Infinity, keep: [] }).keep;
  const distinct = modes.filter((mode) => mode.frequencyHz <= schroederHz);
  return (
    <figure>
      <svg viewBox={`0 0 ${CHART.width} ${HEIGHT}`} className="w-full" role="img"
        aria-label={`Mode chart from ${minHz.toFixed(0)} to ${maxHz.toFixed(0)} Hz on a logarithmic axis: ${distinct.length} distinct room modes, ${resonancesHz.filter(shown).length} duct resonances, ${fanTonesHz.filter(shown).length} fan tones`}>
        <line x1={CHART.left} y1={axisY} x2={CHART.width - CHART.right} y2={axisY} stroke={MUTED} />
        <defs>
          <pattern id="overlap-hatch" width="4" height="4" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
            <line x1="0" y1="0" x2="0" y2="4" stroke={MUTED} strokeWidth="0.6" />
          </pattern>
        </defs>
        {octaveTicks(minHz, maxHz).map((hz) => (
          <g key={hz}>
            <line x1={x(hz)} y1={axisY} x2={x(hz)} y2={axisY + 3} stroke={MUTED} />
            <text x={x(hz)} y={HEIGHT - 4} fontSize="8" textAnchor="middle" fill={MUTED} className="num" data-testid="mode-chart-tick">{frequencyTickText(hz)}</text>
          </g>
        ))}
        <text x={CHART.width - CHART.right} y={HEIGHT - 14} fontSize="8" textAnchor="end" fill={MUTED}>Hz</text>
        {shown(schroederHz) && (
          <g>
            <rect x={x(schroederHz)} y={axisY - MODE_HEIGHT.axial} width={x(maxHz) - x(schroederHz)} height={MODE_HEIGHT.axial} fill="url(#overlap-hatch)" opacity={0.5} />
            <text x={(x(schroederHz) + x(maxHz)) / 2} y={axisY - MODE_HEIGHT.axial - 3} fontSize="8" textAnchor="middle" fill={MUTED}>modes overlap</text>
          </g>
        )}
        {distinct.map((mode, index) => (
          <line key={index} x1={x(mode.frequencyHz)} y1={axisY} x2={x(mode.frequencyHz)} y2={axisY - MODE_HEIGHT[mode.type]} stroke={INK} strokeWidth={mode.type === 'axial' ? 1.4 : 0.7} data-testid="room-mode-line">
            <title>{`${mode.frequencyHz.toFixed(1)} Hz, ${mode.type} (${mode.indices.join(',')})`}</title>
          </line>
        ))}
        {shown(schroederHz) && (
          <g>
            <line x1={x(schroederHz)} y1={CHART.top - 10} x2={x(schroederHz)} y2={axisY} stroke={MUTED} strokeDasharray="3 2" />
            <text x={x(schroederHz) - 2} y={CHART.top - 4} fontSize="8" textAnchor="end" fill={MUTED}>Schroeder {schroederHz.toFixed(0)} Hz</text>
          </g>
        )}
        {resonancesHz.filter(shown).map((hz, index) => (
          <circle key={index} cx={x(hz)} cy={axisY + 10} r={3} fill="none" stroke={COOL} strokeWidth={1.3}><title>{`duct resonance ${hz.toFixed(1)} Hz`}</title></circle>
        ))}
        {fanTonesHz.filter(shown).map((hz, index) => (
          <g key={index}>
            <polygon points={`${x(hz)},${axisY + 16} ${x(hz) - 4},${axisY + 24} ${x(hz) + 4},${axisY + 24}`} fill={RISK}><title>{`fan tone ${hz.toFixed(1)} Hz`}</title></polygon>
            {toneLabels[index] && <text x={x(hz) + 5} y={axisY + 24} fontSize="8" fill={RISK} className="num">{index === 0 ? 'blade pass' : `${index + 1}×`}</text>}
          </g>
        ))}
      </svg>
      <figcaption className="mt-1 flex flex-wrap gap-x-3 text-xs text-graphite-500">
        <span>| room modes: tall axial, middle tangential, short oblique; hatched: above the Schroeder frequency</span>
        <span>○ duct resonances</span>
        <span>▲ fan tones</span>
      </figcaption>
    </figure>
  );
}
