// The rows of a revision a reviewer settles: every resonance of every run, and every risk
// flag when the revision holds risk flags. Each row has a stable target key.
import type { RunResult } from '@/lib/plans/results';
import type { RevisionExtras } from './types';

export interface ReviewRow {
  target: string;
  kind: 'resonance' | 'risk';
  runName: string;
  label: string;
  frequencyHz: number | null;
  /** The analysis marked it: a resonance near a fan tone, or a risk flag. Such rows are checked one by one. */
  atRisk: boolean;
}

export function resonanceTarget(runId: string, order: number): string {
  return `resonance:${runId}:${order}`;
}

export function riskTarget(riskId: string): string {
  return `risk:${riskId}`;
}

export function reviewRows(analysis: readonly RunResult[], extras: RevisionExtras): ReviewRow[] {
  const rows: ReviewRow[] = [];
  for (const run of analysis) {
    for (const resonance of run.analysis?.resonances ?? []) {
      rows.push({
        target: resonanceTarget(run.runId, resonance.order), kind: 'resonance', runName: run.name,
        label: `Order ${resonance.order}, ${resonance.frequencyHz.toFixed(1)} Hz`, frequencyHz: resonance.frequencyHz,
        atRisk: (run.nearFanTone[resonance.order] ?? null) !== null,
      });
    }
  }
  for (const risk of extras.risks ?? []) {
    const run = analysis.find((candidate) => candidate.runId === risk.runId);
    rows.push({ target: riskTarget(risk.id), kind: 'risk', runName: run?.name ?? '', label: risk.label, frequencyHz: null, atRisk: true });
  }
  return rows;
}
