// A revision-shaped plan for the schedule benchmark and tests: `runs` straight runs drawn with
// the editor's own commands, each with a fan, analysed as a revision would freeze it.
import { manySegments } from '../editor/plans';
import type { PlanDocument } from '@/lib/plan/document';
import { analysePlan } from '@/lib/plans/results';
import type { RevisionView } from '@/lib/revisions/types';

export function benchDocument(runs: number, segmentsPerRun: number): PlanDocument {
  const doc = manySegments(runs, segmentsPerRun);
  return { ...doc, runs: doc.runs.map((run, index) => ({ ...run, name: `Supply run ${index + 1}`, fan: { blades: 8, rpm: 1200 + 20 * index } })) };
}

export function benchRevision(runs: number, segmentsPerRun = 4): RevisionView {
  const document = benchDocument(runs, segmentsPerRun);
  const metresPerPixel = 0.005;
  return {
    id: '00000000-0000-4000-8000-000000000001', planId: '00000000-0000-4000-8000-000000000002', teamId: '00000000-0000-4000-8000-000000000003',
    number: 1, planVersion: 1, contentHash: null, state: 'waiting', note: '', submittedByName: 'Ines Varga', reviewedByName: null, reviewedAt: null, reviewNote: '',
    createdAt: new Date(0).toISOString(), planName: 'Level 3 supply', project: { id: '', name: 'Harbour Lane Recital Hall' },
    metresPerPixel, document, analysis: analysePlan(document, metresPerPixel), extras: {}, background: null,
  };
}
