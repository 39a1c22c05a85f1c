'use client';

import { OCTAVE_BANDS_HZ } from '@/lib/acoustic';
import type { RoomNoisePath } from '@/lib/plans/noise-path/room-path';

const BAND_LABELS = OCTAVE_BANDS_HZ.map((hz) => (hz >= 1000 ? `${hz / 1000}k` : String(hz)));
const ELEMENT_WORDS: Record<string, string> = { duct: 'Duct', elbow: 'Elbow', split: 'Branch split', plenum: 'Plenum', silencer: 'Silencer', outlet: 'Outlet (end reflection)', loss: 'Loss' };

const cell = (value: number) => (Math.abs(value) < 0.05 ? 0 : value).toFixed(1);

// The noise path from the fan to the room's listener, one row per element read off the plan: its
// loss in each octave band and the sound power left after it; then the room correction, the level at
// the listener, the criterion and the margin, with the governing band marked in words and a shape.
export function NoisePathTable({ path }: { path: RoomNoisePath }) {
  const { result } = path;
  const governing = OCTAVE_BANDS_HZ.indexOf(path.governingHz as (typeof OCTAVE_BANDS_HZ)[number]);
  const head = (
    <tr className="border-b border-graphite-100 text-left text-graphite-500">
      <th scope="col" className="py-1 pr-2 font-medium">Element</th>
      {BAND_LABELS.map((label, band) => <th key={label} scope="col" className={`num py-1 pr-1 text-right font-medium ${band === governing ? 'text-risk-ink' : ''}`}>{label}{band === governing ? ' ▲' : ''}</th>)}
    </tr>
  );
  const row = (key: string, label: string, values: number[], options: { strong?: boolean; testId?: string } = {}) => (
    <tr key={key} className={`border-b border-graphite-100 ${options.strong ? 'font-medium' : ''}`} data-testid={options.testId}>
      <th scope="row" className="py-1 pr-2 text-left font-normal">{label}</th>
      {values.map((value, band) => <td key={band} className={`num py-1 pr-1 text-right ${band === governing ? 'bg-risk-soft' : ''}`}>{cell(value)}</td>)}
    </tr>
  );
  return (
    <div className="space-y-2" data-testid="noise-path">
      <div className="overflow-x-auto">
        <table className="w-full text-xs" aria-label="Noise path, fan to listener">
          <thead>{head}</thead>
          <tbody>
            {row('fan', 'Fan sound power (dB re 1 pW)', path.fanSoundPowerDb, { strong: true })}
            {result.steps.map((step, index) => row(`loss-${index}`, `${ELEMENT_WORDS[step.kind] ?? step.kind}: ${path.sources[index]?.label ?? ''} — loss`, step.lossDb.map((loss) => -loss),
              { testId: 'path-step' }))}
            {row('left', 'Sound power into the room (dB re 1 pW)', result.steps.at(-1)?.powerDb ?? [], { strong: true })}
            {row('room', 'Room correction, Schultz (Lp − Lw)', result.roomCorrectionDb)}
            {row('listener', 'Level at the listener (dB re 20 µPa)', result.listenerDb, { strong: true, testId: 'path-listener' })}
            {row('criterion', 'Criterion curve', path.criterionDb)}
            {row('margin', 'Margin (criterion − level; negative is above)', path.marginDb, { strong: true, testId: 'path-margin' })}
          </tbody>
        </table>
      </div>
      <p className="num text-xs" data-testid="path-ratings">
        At the listener: NC {result.nc.toFixed(0)} · NR {result.nr.toFixed(1)} · {result.dba.toFixed(1)} dB(A). The {path.governingHz >= 1000 ? `${path.governingHz / 1000} kHz` : `${path.governingHz} Hz`} band governs (▲).
      </p>
      {result.warnings.length > 0 && <ul className="space-y-0.5 text-xs text-risk-ink">{result.warnings.map((warning) => <li key={warning}><span aria-hidden="true">⚠ </span>{warning}</li>)}</ul>}
    </div>
  );
}
