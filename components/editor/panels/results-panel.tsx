'use client';

import { csvFileName } from '@/lib/csv/file-name';
import { reflectionPlace, reflectionsCsv, resonancesCsv } from '@/lib/plans/exports';
import type { RunResult } from '@/lib/plans/results';
import { formatSpeed, type UnitSystem } from '@/lib/plan/units';
import { EchoChart } from '../results/echo-chart';
import { ReflectionTable } from '../results/reflection-table';
import { ResonanceTable } from '../results/resonance-table';
import { DownloadCsvButton } from '../results/download-csv-button';

interface ResultsPanelProps {
  result: RunResult | null;
  loading: boolean;
  stale: boolean;
  error: string | null;
  selectedOrder: number | null;
  onSelectOrder: (order: number | null) => void;
  formatPosition: (metres: number) => string;
  /** Stable labels of the plan's points, for naming where each reflection happens. */
  nodeLabels?: Readonly<Record<string, string>>;
  unitSystem?: UnitSystem;
  /** The plan's name, for the downloaded files' names. */
  planName?: string;
}

function Section({ title, action, children }: { title: string; action?: React.ReactNode; children: React.ReactNode }) {
  return (
    <section className="space-y-2" aria-label={title}>
      <div className="flex items-center justify-between gap-2">
        <h3 className="text-xs font-semibold uppercase tracking-wider text-graphite-500">{title}</h3>
        {action}
      </div>
      {children}
    </section>
  );
}

// The chosen run's results: cut-off and warnings, resonances, reflections, echo chart.
export function ResultsPanel({ result, loading, stale, error, selectedOrder, onSelectOrder, formatPosition, nodeLabels, unitSystem = 'si', planName = 'plan' }: ResultsPanelProps) {
  if (error) return <p role="alert" className="text-sm text-risk-ink">The results could not be computed: {error}</p>;
  if (!result) return <p className="text-sm text-graphite-500">{loading ? 'Computing…' : 'Draw a run to see its resonances here: pick Draw (D), click at the fan end, then at each bend.'}</p>;
  if (result.problem) return <p role="status" className="rounded border border-risk bg-risk-soft p-2 text-sm text-risk-ink"><span className="font-semibold">Cannot analyse {result.name}: </span>{result.problem}</p>;
  const analysis = result.analysis!;
  const placeName = (atM: number, kind: string): string | null => (nodeLabels ? reflectionPlace(result.path, nodeLabels, atM, kind) : null);
  const fileName = (kind: string) => csvFileName([planName, result.name], kind);
  return (
    <div className={`space-y-5 ${stale ? 'opacity-60' : ''}`} aria-busy={stale}>
      <dl className="num grid grid-cols-2 gap-x-3 gap-y-1 text-sm" aria-label="Run summary">
        <dt className="text-graphite-500">Length along path</dt><dd>{formatPosition(analysis.lengthM)}</dd>
        <dt className="text-graphite-500">Plane-wave cut-off</dt><dd>{analysis.cutoffHz.toFixed(0)} Hz</dd>
        <dt className="text-graphite-500">End corrections</dt><dd>{formatPosition(analysis.endCorrectionM.start)} · {formatPosition(analysis.endCorrectionM.end)}</dd>
        <dt className="text-graphite-500">Speed of sound</dt><dd>{formatSpeed(analysis.speedOfSoundMps, unitSystem)}</dd>
        {result.fanTonesHz.length > 0 && (<><dt className="text-graphite-500">Fan tones</dt><dd>{result.fanTonesHz.map((hz) => hz.toFixed(0)).join(', ')} Hz</dd></>)}
      </dl>
      {analysis.warnings.length > 0 && (
        <ul className="space-y-1 text-sm text-risk-ink" aria-label="Warnings">
          {analysis.warnings.map((warning) => <li key={warning}><span aria-hidden="true">⚠ </span>{warning}</li>)}
        </ul>
      )}
      <ul className="space-y-0.5 text-xs text-graphite-700" aria-label="Assumptions" data-testid="run-assumptions">
        {(analysis.assumptions ?? []).map((assumption) => <li key={assumption}>{assumption}</li>)}
        {(analysis.broadbandRangesHz ?? []).length > 0 && (
          <li>Broadband (resonances overlap or Q under 5, nothing to dodge): {analysis.broadbandRangesHz.map(([lowHz, highHz]) => `${lowHz.toFixed(0)}–${highHz.toFixed(0)} Hz`).join(', ')}.</li>
        )}
      </ul>
      <Section title="Resonances" action={analysis.resonances.length > 0 && (
        <DownloadCsvButton what="the resonances" fileName={fileName('resonances')} csv={() => resonancesCsv(result, unitSystem)} />
      )}>
        <ResonanceTable resonances={analysis.resonances} nearFanTone={result.nearFanTone} selectedOrder={selectedOrder} onSelect={onSelectOrder} />
        <p className="text-xs text-graphite-500">
          Listed from {analysis.minHz.toFixed(0)} to {analysis.maxHz.toFixed(0)} Hz; orders count from the run’s lowest resonance
          {(analysis.resonances[0]?.order ?? 1) > 1 ? `, so ${(analysis.resonances[0]?.order ?? 1) - 1} below ${analysis.minHz.toFixed(0)} Hz are not listed` : ''}.
          {' '}Select a row to draw its pressure envelope on the plan (A antinode, N node).
        </p>
      </Section>
      <Section title="Reflections" action={analysis.reflections.length > 0 && (analysis.reflections[0]?.bands.length ?? 0) > 0 && (
        <DownloadCsvButton what="the reflections" fileName={fileName('reflections')} csv={() => reflectionsCsv(result, nodeLabels ?? {}, unitSystem)} />
      )}>
        <ReflectionTable reflections={analysis.reflections} formatPosition={formatPosition} placeName={placeName} />
      </Section>
      <Section title="Echo chart">
        <EchoChart echoes={analysis.echoes} lengthM={analysis.lengthM} />
      </Section>
      <p className="text-xs text-graphite-500">
        Plane-wave model below the cut-off; results are design predictions. Linings must meet the fire and smoke ratings your local codes require.
      </p>
    </div>
  );
}
