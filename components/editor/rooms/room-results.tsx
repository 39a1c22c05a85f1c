'use client';

import { directivityAt, type RiskFlag } from '@/lib/acoustic';
import type { RoomResult } from '@/lib/plans/risks';
import { ModeChart } from './mode-chart';
import { ModeList } from './mode-list';
import { Reflectogram } from './reflectogram';
import { NoisePathTable } from './noise-path-table';
import { SpectrumChart } from './spectrum-chart';

// The room's results from the saved plan: figures, mode chart with the run's resonances and fan
// tones, the mode list (with the modes the room's flags cite), the reflectogram at the listener and
// the spectrum against the criterion.
export function RoomResults({ result, flags }: { result: RoomResult | null; flags: readonly RiskFlag[] }) {
  if (!result) return <p className="text-sm text-graphite-500">Results appear once the room is saved.</p>;
  if (result.problem || !result.analysis) return <p className="text-sm text-graphite-700" role="status">{result.problem ?? 'No results yet.'}</p>;
  const analysis = result.analysis;
  const q = (hz: number) => directivityAt(analysis.outletBoundaryGain, hz).toFixed(1);
  return (
    <div className="space-y-4" data-testid="room-results">
      <dl className="num grid grid-cols-2 gap-x-3 gap-y-1 text-xs">
        <dt className="text-graphite-500">Volume</dt><dd>{analysis.volumeM3.toFixed(0)} m³</dd>
        <dt className="text-graphite-500">Reverberation (500 Hz–1 kHz)</dt><dd>{analysis.midReverberationTimeS.toFixed(2)} s</dd>
        <dt className="text-graphite-500">Schroeder frequency</dt><dd>{analysis.schroederHz.toFixed(0)} Hz</dd>
        <dt className="text-graphite-500">Outlet boundary gain</dt><dd>Q {q(63)} at 63 Hz, {q(250)} at 250 Hz, {q(1000)} at 1 kHz</dd>
        <dt className="text-graphite-500">First comb notch</dt><dd>{analysis.firstCombNotchHz === null ? '—' : `${analysis.firstCombNotchHz.toFixed(0)} Hz`}</dd>
      </dl>
      <section><h3 className="mb-1 text-xs font-semibold">Modes, duct resonances and fan tones</h3>
        <ModeChart modes={analysis.modes} resonancesHz={result.resonancesHz} fanTonesHz={result.fanTonesHz} schroederHz={analysis.schroederHz} /></section>
      <ModeList modes={analysis.modes} flags={flags} />
      <section><h3 className="mb-1 text-xs font-semibold">Reflectogram at the listener</h3><Reflectogram images={analysis.images} /></section>
      <section><h3 className="mb-1 text-xs font-semibold">Spectrum against the criterion</h3>
        <SpectrumChart levels={result.noisePath ? result.noisePath.result.listenerDb.map((levelDb, band) => ({ hz: result.noisePath!.result.bandsHz[band], levelDb, criterionDb: result.criterionDb[band] })) : result.levels}
          criterionDb={result.criterionDb} criterionNc={result.criterionNc} levelsNc={result.noisePath ? result.noisePath.result.nc : result.levelsNc} /></section>
      <section><h3 className="mb-1 text-xs font-semibold">Noise path, fan to listener</h3>
        {result.noisePath ? <NoisePathTable path={result.noisePath} /> : <p className="text-xs text-graphite-500" data-testid="noise-path-missing">{result.noisePathProblem ?? 'Connect the room to the run end that feeds it.'}</p>}</section>
    </div>
  );
}

