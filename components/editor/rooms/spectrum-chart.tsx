'use client';

import { NR_COEFFICIENTS, nrRating, OCTAVE_BANDS_HZ, type OutletLevelBand } from '@/lib/acoustic';
import { CHART, INK, linearScale, MUTED, RISK } from './chart-frame';
import { signedFixed } from '@/lib/signed-number';

const BAND_LABELS = OCTAVE_BANDS_HZ.map((hz) => (hz >= 1000 ? `${hz / 1000}k` : String(hz)));

// Predicted octave-band levels at the listener (solid line, dots; a triangle where above) against the
// room's NC criterion curve (dashed) and the NR curve of the same number (dotted; ISO/R 1996 noise
// rating curves L = a + b N, for readers who work to NR).
export function SpectrumChart({ levels, criterionDb, criterionNc, levelsNc }: { levels: Pick<OutletLevelBand, 'hz' | 'levelDb' | 'criterionDb'>[] | null; criterionDb: number[]; criterionNc: number; levelsNc: number | null }) {
  const nrCurveDb = NR_COEFFICIENTS.map(({ a, b }) => a + b * criterionNc);
  const levelsNr = levels ? nrRating(levels.map((band) => band.levelDb)) : null;
  const values = [...criterionDb, ...nrCurveDb, ...(levels?.map((band) => band.levelDb) ?? [])];
  const minDb = Math.floor(Math.min(...values) / 10) * 10;
  const maxDb = Math.ceil(Math.max(...values) / 10) * 10;
  const x = linearScale([0, BAND_LABELS.length - 1], [CHART.left + 8, CHART.width - CHART.right - 8]);
  const y = linearScale([minDb, maxDb], [CHART.height - CHART.bottom, CHART.top]);
  const line = (series: number[]) => series.map((db, index) => `${x(index)},${y(db)}`).join(' ');
  return (
    <figure>
      <svg viewBox={`0 0 ${CHART.width} ${CHART.height}`} className="w-full" role="img"
        aria-label={`Spectrum against NC ${criterionNc}${levelsNc !== null ? `: predicted NC ${levelsNc.toFixed(0)}` : ''}`}>
        {BAND_LABELS.map((label, index) => <text key={label} x={x(index)} y={CHART.height - 8} fontSize="8" textAnchor="middle" fill={MUTED} className="num">{label}</text>)}
        {[minDb, (minDb + maxDb) / 2, maxDb].map((db) => <text key={db} x={CHART.left - 4} y={y(db) + 3} fontSize="8" textAnchor="end" fill={MUTED} className="num">{signedFixed(db, 0)} dB</text>)}
        <polyline points={line(criterionDb)} fill="none" stroke={MUTED} strokeDasharray="4 3" />
        <polyline points={line(nrCurveDb)} fill="none" stroke={MUTED} strokeDasharray="1 2" data-testid="nr-curve" />
        {levels && <polyline points={line(levels.map((band) => band.levelDb))} fill="none" stroke={INK} strokeWidth={1.4} />}
        {levels?.map((band, index) => (band.levelDb > band.criterionDb
          ? <polygon key={band.hz} points={`${x(index)},${y(band.levelDb) - 4} ${x(index) - 4},${y(band.levelDb) + 3} ${x(index) + 4},${y(band.levelDb) + 3}`} fill={RISK}><title>{`${band.hz} Hz: ${signedFixed(band.levelDb, 1)} dB, above the criterion`}</title></polygon>
          : <circle key={band.hz} cx={x(index)} cy={y(band.levelDb)} r={2.5} fill={INK}><title>{`${band.hz} Hz: ${signedFixed(band.levelDb, 1)} dB`}</title></circle>))}
      </svg>
      <figcaption className="mt-1 flex flex-wrap gap-x-3 text-xs text-graphite-500">
        <span>- - NC {criterionNc} criterion</span>
        <span>· · NR {criterionNc} for comparison{levelsNr !== null ? ` (predicted NR ${Math.ceil(levelsNr)})` : ''}</span>
        {levels ? <span>— predicted at the listener{levelsNc !== null ? ` (NC ${levelsNc.toFixed(0)})` : ''}; ▲ above the criterion</span> : <span>Give the outlet&apos;s sound power to predict the levels.</span>}
      </figcaption>
    </figure>
  );
}
