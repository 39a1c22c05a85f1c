'use client';

import { useState } from 'react';
import { directivityAt, OCTAVE_BANDS_HZ, type RiskFlag } from '@/lib/acoustic';
import type { RoomResult } from '@/lib/plans/risks';
import { ModeChart } from './mode-chart';
import { ModeList } from './mode-list';
import { NoiseSummary } from './noise-summary';
import { Reflectogram } from './reflectogram';
import { SpectrumChart } from './spectrum-chart';

// The room's results from the saved plan: figures, mode chart with the run's resonances and fan
// tones, the mode list (with the modes the room's flags cite), the reflectogram at the first listener,
// the spectrum at a chosen listener against the criterion, and each listener's ratings (the full noise
// path tables open on a sheet over the canvas).
export function RoomResults({ result, flags, onShowNoiseTables }: { result: RoomResult | null; flags: readonly RiskFlag[]; onShowNoiseTables: () => void }) {
  const [chosenListenerId, setListenerId] = useState<string | null>(null);
  if (!result) return <p className="text-sm text-graphite-500">Results appear once the room is saved.</p>;
  if (result.problem || !result.analysis) return <p className="text-sm text-graphite-700" role="status">{result.problem ?? 'No results yet.'}</p>;
  const analysis = result.analysis;
  const q = (hz: number) => directivityAt(analysis.outletBoundaryGain, hz).toFixed(1);
  const noise = result.noise;
  const listenerId = noise && noise.listeners.some((listener) => listener.listenerId === chosenListenerId) ? chosenListenerId! : noise?.worstListenerId ?? null;
  const listener = noise?.listeners.find((candidate) => candidate.listenerId === listenerId) ?? null;
  const mid = analysis.bands.filter((band) => band.hz === 500 || band.hz === 1000);
  const eyringMid = mid.reduce((sum, band) => sum + band.eyringReverberationTimeS, 0) / mid.length;
  return (
    <div className="space-y-4" data-testid="room-results">
      <dl className="num grid grid-cols-2 gap-x-3 gap-y-1 text-xs">
        <dt className="text-graphite-500">Volume</dt><dd>{analysis.volumeM3.toFixed(0)} m³</dd>
        <dt className="text-graphite-500">Reverberation (500 Hz–1 kHz)</dt><dd>{analysis.midReverberationTimeS.toFixed(2)} s Sabine, {eyringMid.toFixed(2)} s Eyring</dd>
        <dt className="text-graphite-500">Reverberation at 2, 4, 8 kHz (with the air)</dt><dd>{analysis.bands.slice(5).map((band) => band.reverberationTimeS.toFixed(2)).join(', ')} s</dd>
        <dt className="text-graphite-500">Schroeder frequency</dt><dd>{analysis.schroederHz.toFixed(0)} Hz</dd>
        <dt className="text-graphite-500">Outlet boundary gain</dt><dd>Q {q(63)} at 63 Hz, {q(250)} at 250 Hz, {q(1000)} at 1 kHz</dd>
        <dt className="text-graphite-500">First comb notch</dt><dd>{analysis.firstCombNotchHz === null ? '—' : `${analysis.firstCombNotchHz.toFixed(0)} Hz`}</dd>
      </dl>
      <section><h3 className="mb-1 text-xs font-semibold">Modes, duct resonances and fan tones</h3>
        <ModeChart modes={analysis.modes} resonancesHz={result.resonancesHz} fanTonesHz={result.fanTonesHz} schroederHz={analysis.schroederHz} /></section>
      <ModeList modes={analysis.modes} flags={flags} />
      <section><h3 className="mb-1 text-xs font-semibold">Reflectogram at the first listener</h3><Reflectogram images={analysis.images} /></section>
      <section>
        <div className="mb-1 flex items-center gap-2">
          <h3 className="text-xs font-semibold">Spectrum against the criterion{listener ? ` at ${listener.name}` : ''}</h3>
          {noise && noise.listeners.length > 1 && (
            <select aria-label="Listener" className="field-input ml-auto w-auto py-0.5 text-xs" value={listenerId ?? ''} onChange={(event) => setListenerId(event.target.value)}>
              {noise.listeners.map((candidate) => <option key={candidate.listenerId} value={candidate.listenerId}>{candidate.name}{candidate.listenerId === noise.worstListenerId ? ' (the worst)' : ''}</option>)}
            </select>
          )}
        </div>
        <SpectrumChart levels={listener ? listener.levelDb.map((levelDb, band) => ({ hz: OCTAVE_BANDS_HZ[band], levelDb, criterionDb: result.criterionDb[band] })) : result.levels}
          criterionDb={result.criterionDb} criterionNc={result.criterionNc} levelsNc={listener ? listener.nc : result.levelsNc} />
      </section>
      <section><h3 className="mb-1 text-xs font-semibold">Noise path, fan to listener</h3>
        {noise ? <NoiseSummary noise={noise} onShowTables={onShowNoiseTables} />
          : <p className="text-xs text-graphite-500" data-testid="noise-path-missing">{result.noiseProblem ?? 'Connect the room to the run end that feeds it.'}</p>}</section>
    </div>
  );
}
