// What changed between two revisions: the key numbers of each run side by side.
import type { RunResult } from '@/lib/plans/results';

export interface RunChange {
  runId: string;
  name: string;
  status: 'added' | 'removed' | 'kept';
  lengthM: [number | null, number | null];
  firstResonancesHz: [number[], number[]];
  resonanceCount: [number | null, number | null];
}

export interface RevisionChanges {
  previousNumber: number | null;
  runCount: [number | null, number];
  segmentCount: [number | null, number];
  runs: RunChange[];
}

const FIRST_RESONANCES = 3;

function firstHz(run: RunResult | undefined): number[] {
  return (run?.analysis?.resonances ?? []).slice(0, FIRST_RESONANCES).map((resonance) => resonance.frequencyHz);
}

export function compareRevisions(
  previous: { number: number; analysis: readonly RunResult[]; segmentCount: number } | null,
  current: { analysis: readonly RunResult[]; segmentCount: number },
): RevisionChanges {
  const before = new Map((previous?.analysis ?? []).map((run) => [run.runId, run]));
  const after = new Map(current.analysis.map((run) => [run.runId, run]));
  const ids = [...new Set([...after.keys(), ...before.keys()])];
  const runs = ids.map((runId): RunChange => {
    const old = before.get(runId);
    const now = after.get(runId);
    return {
      runId,
      name: now?.name ?? old?.name ?? runId,
      status: !previous ? 'kept' : !old ? 'added' : !now ? 'removed' : 'kept',
      lengthM: [old?.analysis?.lengthM ?? null, now?.analysis?.lengthM ?? null],
      firstResonancesHz: [firstHz(old), firstHz(now)],
      resonanceCount: [old?.analysis ? old.analysis.resonances.length : null, now?.analysis ? now.analysis.resonances.length : null],
    };
  });
  return {
    previousNumber: previous?.number ?? null,
    runCount: [previous ? previous.analysis.length : null, current.analysis.length],
    segmentCount: [previous ? previous.segmentCount : null, current.segmentCount],
    runs,
  };
}
