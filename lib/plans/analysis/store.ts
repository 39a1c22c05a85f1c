// Stored analyses of plan versions: read by content hash, computed in the compute pool when missing
// (one computation per version, however many ask at once), and the candidate treatments of each
// flag evaluated ahead by the job worker (an analyse-plan job) and kept beside it. Saving the plan changes its hash, so a new
// version is analysed afresh and only that plan's older rows are pruned.
import { Op } from 'sequelize';
import { compute, whenIdle } from '@/lib/compute/pool';
import { consumeRateLimit } from '@/lib/http/rate-limit';
import { sendJob } from '@/lib/jobs/queue';
import type { PlanView } from '@/lib/plans/data';
import { PlanAnalysisRow } from '@/models';
import type { RiskTarget } from '../risk-context';
import type { TreatmentOptions } from '../treatment-options';
import { contentHash } from './content-hash';
import { ANALYSIS_FORMAT, candidateKey, type CandidateMap, type PlanAnalysis } from './types';

/** Analyses kept per plan: the newest few versions (revisions freeze their own copy). */
const KEPT_PER_PLAN = 4;
/** Flags whose candidates are evaluated ahead of being asked for, per version. */
const PRECOMPUTED_FLAGS = 40;
const REDUCE_PLAN = 'the plan (fewer or shorter runs, fewer segments, or a lower frequency range)';

const inFlight = new Map<string, Promise<unknown>>();

function once<T>(key: string, work: () => Promise<T>): Promise<T> {
  const running = inFlight.get(key);
  if (running) return running as Promise<T>;
  const started = work().finally(() => inFlight.delete(key));
  inFlight.set(key, started);
  return started;
}

async function storedRow(planId: string, hash: string): Promise<PlanAnalysisRow | null> {
  return PlanAnalysisRow.findOne({ where: { planId, contentHash: hash, format: ANALYSIS_FORMAT } });
}

async function prune(planId: string): Promise<void> {
  const keep = await PlanAnalysisRow.findAll({ where: { planId }, attributes: ['id'], order: [['updatedAt', 'DESC']], limit: KEPT_PER_PLAN });
  await PlanAnalysisRow.destroy({ where: { planId, id: { [Op.notIn]: keep.map((row) => row.id) } } });
}

/**
 * The analysis of the plan as saved: stored, or computed now in the pool and stored. A computation
 * counts against the asking person's analysis rate limit (reading a stored analysis does not); with
 * the plan's team, a version computed here is queued for its candidates to be evaluated ahead.
 */
export async function planAnalysisOf(plan: Pick<PlanView, 'id' | 'document' | 'metresPerPixel'>, askedBy: string | null = null, teamId: string | null = null): Promise<PlanAnalysis> {
  const hash = contentHash(plan.document, plan.metresPerPixel);
  const row = await storedRow(plan.id, hash);
  if (row) return row.analysis as PlanAnalysis;
  if (askedBy !== null) await consumeRateLimit('analysis', askedBy);
  const analysis = await once(`analysis:${plan.id}:${hash}`, async () => {
    const computed = await compute<PlanAnalysis>({ kind: 'plan-analysis', document: plan.document, metresPerPixel: plan.metresPerPixel }, { reduce: REDUCE_PLAN });
    await PlanAnalysisRow.findOrCreate({ where: { planId: plan.id, contentHash: hash, format: ANALYSIS_FORMAT }, defaults: { planId: plan.id, contentHash: hash, format: ANALYSIS_FORMAT, analysis: computed } });
    await prune(plan.id);
    return computed;
  });
  if (analysis.risks.flags.length > 0) void askForAnalysisAhead(plan.id, teamId);
  return analysis;
}

/**
 * Asks the job worker to analyse the plan's current version and evaluate its flags' candidates
 * ahead (after `delayS`, so an analysis someone is already waiting for is stored by then). A queue
 * that cannot be reached costs only the head start: everything is still computed when asked for.
 */
export async function askForAnalysisAhead(planId: string, teamId: string | null, delayS = 0): Promise<void> {
  if (!teamId) return;
  try {
    await sendJob('analyse-plan', { planId, teamId }, { key: planId, delayS });
  } catch (error) {
    console.warn(`[analysis] plan ${planId} was not queued for analysis ahead:`, error instanceof Error ? error.message : error);
  }
}

/** The candidate treatments of one flag: stored beside the analysis, or evaluated now in the pool and stored. */
export async function candidatesOf(plan: Pick<PlanView, 'id' | 'document' | 'metresPerPixel'>, analysis: PlanAnalysis, target: RiskTarget, flagId: string): Promise<TreatmentOptions> {
  const key = candidateKey({ roomId: 'roomId' in target ? target.roomId : null, runId: 'runId' in target ? target.runId : null }, flagId);
  const row = await storedRow(plan.id, analysis.contentHash);
  const stored = (row?.candidates as CandidateMap | undefined)?.[key];
  if (stored) return stored;
  return once(`candidates:${plan.id}:${analysis.contentHash}:${key}`, async () => {
    const options = await compute<TreatmentOptions>(
      { kind: 'treatment-options', document: plan.document, metresPerPixel: plan.metresPerPixel, analysis, target, flagId },
      { reduce: REDUCE_PLAN },
    );
    await PlanAnalysisRow.sequelize!.query(
      `update plan_analyses set candidates = jsonb_set(candidates, array[:key], :options::jsonb), updated_at = now()
        where plan_id = :planId and content_hash = :hash and format = :format`,
      { replacements: { key, options: JSON.stringify(options), planId: plan.id, hash: analysis.contentHash, format: ANALYSIS_FORMAT } },
    );
    return options;
  });
}

/** The analysis of the plan's version and every flag's candidates, each computed if missing (the analyse-plan job). */
export async function analyseAhead(plan: Pick<PlanView, 'id' | 'document' | 'metresPerPixel'>): Promise<{ flags: number; evaluated: number }> {
  const analysis = await planAnalysisOf(plan);
  const flags = analysis.risks.flags.slice(0, PRECOMPUTED_FLAGS);
  let evaluated = 0;
  for (const flag of flags) {
    const target: RiskTarget = flag.roomId ? { roomId: flag.roomId } : { runId: flag.runId };
    try {
      await whenIdle();
      await candidatesOf(plan, analysis, target, flag.id);
      evaluated += 1;
    } catch (error) {
      console.warn(`[analysis] candidates of flag ${flag.id} on plan ${plan.id} were not evaluated ahead:`, error instanceof Error ? error.message : error);
    }
  }
  return { flags: flags.length, evaluated };
}
