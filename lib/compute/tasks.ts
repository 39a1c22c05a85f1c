// The work that runs off the request thread, as plain data in and out: one duct run's analysis (the
// answer's JSON text, with the pressure envelopes asked for), the analysis of a plan version, the
// envelopes asked for of a plan version's resonances, the candidate treatments of one flag, and a DXF
// drawing read into the plan's paths. Pure:
// the worker threads run these; errors come back as plain data so their kind survives the thread boundary.
import { analyzeRun, type RunInput } from '@/lib/acoustic';
import { NO_ENVELOPES, type EnvelopeRequest } from '@/lib/analysis/envelope-request';
import { roundedRunAnalysis } from '@/lib/analysis/round-answer';
import { withEnvelopesAsked } from '@/lib/analysis/select-envelopes';
import { readDxf } from '@/lib/dxf/read';
import { AppError, type ErrorCode } from '@/lib/errors';
import type { PlanDocument } from '@/lib/plan/document';
import { PlanError } from '@/lib/plan/errors';
import { computePlanAnalysis } from '@/lib/plans/analysis/compute';
import { planRunEnvelopes } from '@/lib/plans/run-envelopes';
import { treatmentOptionsFromAnalysis } from '@/lib/plans/treatment-options';
import type { PlanAnalysis } from '@/lib/plans/analysis/types';
import type { RiskTarget } from '@/lib/plans/risk-context';

export type ComputeTask =
  | { kind: 'analyze-run'; input: unknown; envelopes?: EnvelopeRequest }
  | { kind: 'plan-analysis'; document: PlanDocument; metresPerPixel: number }
  | { kind: 'plan-envelopes'; document: PlanDocument; metresPerPixel: number; runId: string | null; envelopes: EnvelopeRequest }
  | { kind: 'treatment-options'; document: PlanDocument; metresPerPixel: number; analysis: PlanAnalysis; target: RiskTarget; flagId: string }
  | { kind: 'dxf-drawing'; bytes: Uint8Array; fileName: string };

export interface TaskError { name: string; message: string; code?: ErrorCode; field?: string }
export type TaskOutcome = { ok: true; value: unknown } | { ok: false; error: TaskError };

function perform(task: ComputeTask): unknown {
  switch (task.kind) {
    case 'analyze-run':
      // The answer's JSON text, made here: a string crosses to the server's thread as one copy, where the
      // objects of thousands of envelope samples would be cloned one by one.
      return JSON.stringify(roundedRunAnalysis(withEnvelopesAsked(analyzeRun(task.input as RunInput), task.envelopes ?? NO_ENVELOPES)));
    case 'plan-analysis':
      return computePlanAnalysis(task.document, task.metresPerPixel);
    case 'plan-envelopes':
      return planRunEnvelopes(task.document, task.metresPerPixel, task.runId, task.envelopes);
    case 'treatment-options':
      return treatmentOptionsFromAnalysis(task.document, task.metresPerPixel, task.analysis, task.target, task.flagId);
    case 'dxf-drawing':
      return readDxf(task.bytes, task.fileName);
  }
}

export function runComputeTask(task: ComputeTask): TaskOutcome {
  try {
    return { ok: true, value: perform(task) };
  } catch (error) {
    if (error instanceof AppError) return { ok: false, error: { name: 'AppError', message: error.message, code: error.code, field: error.field } };
    if (error instanceof PlanError || error instanceof RangeError) return { ok: false, error: { name: error.name === 'PlanError' ? 'PlanError' : 'RangeError', message: error.message } };
    const message = error instanceof Error ? `${error.name}: ${error.message}\n${error.stack ?? ''}` : String(error);
    return { ok: false, error: { name: 'Error', message } };
  }
}
