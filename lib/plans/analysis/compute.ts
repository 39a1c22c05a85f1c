// One plan version's analysis, computed from its document: the labels, every run's results, the
// risks read from those same run analyses, and the chosen treatments re-judged. Pure.
import type { PlanDocument } from '@/lib/plan/document';
import { assignLabels, planLabels } from '@/lib/plan/labels';
import { analysePlan } from '../results';
import { planRisks } from '../risks';
import { contentHash } from './content-hash';
import { checkChosenTreatments } from './treatment-checks';
import { ANALYSIS_FORMAT, type PlanAnalysis } from './types';

export function computePlanAnalysis(input: PlanDocument, metresPerPixel: number): PlanAnalysis {
  const document = assignLabels(input);
  const runs = analysePlan(document, metresPerPixel);
  const risks = planRisks(document, metresPerPixel, runs);
  return {
    format: ANALYSIS_FORMAT,
    contentHash: contentHash(document, metresPerPixel),
    labels: planLabels(document),
    runs,
    risks,
    treatments: checkChosenTreatments(document, metresPerPixel, risks),
  };
}
