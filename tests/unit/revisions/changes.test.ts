import { describe, expect, it } from 'vitest';
import type { RunResult } from '@/lib/plans/results';
import { compareRevisions } from '@/lib/revisions/changes';

function run(runId: string, lengthM: number, hz: number[]): RunResult {
  return {
    runId, name: runId, problem: null, path: [], fanTonesHz: [], nearFanTone: {},
    analysis: {
      speedOfSoundMps: 343, lengthM, cutoffHz: 800, endCorrectionM: { start: 0, end: 0 }, reflections: [], echoes: [], warnings: [], assumptions: [], broadbandRangesHz: [], minHz: 20, maxHz: 800,
      resonances: hz.map((frequencyHz, index) => ({ order: index + 1, frequencyHz, q: null, bandwidthHz: null, antinodesM: [], nodesM: [], dampingHz: 0, broadband: false })),
    },
  };
}

describe('compareRevisions', () => {
  it('puts each run’s key numbers side by side and marks added and removed runs', () => {
    const changes = compareRevisions(
      { number: 1, analysis: [run('a', 10, [17, 34, 51, 68]), run('b', 5, [34])], segmentCount: 4 },
      { analysis: [run('a', 12, [14, 28]), run('c', 3, [57])], segmentCount: 5 },
    );
    expect(changes.previousNumber).toBe(1);
    expect(changes.segmentCount).toEqual([4, 5]);
    expect(changes.runs.find((entry) => entry.runId === 'a')).toMatchObject({ status: 'kept', lengthM: [10, 12], firstResonancesHz: [[17, 34, 51], [14, 28]], resonanceCount: [4, 2] });
    expect(changes.runs.find((entry) => entry.runId === 'b')).toMatchObject({ status: 'removed', lengthM: [5, null] });
    expect(changes.runs.find((entry) => entry.runId === 'c')).toMatchObject({ status: 'added', lengthM: [null, 3] });
  });
  it('has no “before” for the first revision', () => {
    expect(compareRevisions(null, { analysis: [run('a', 10, [17])], segmentCount: 1 })).toMatchObject({ previousNumber: null, runCount: [null, 1], runs: [{ status: 'kept', lengthM: [null, 10] }] });
  });
});
