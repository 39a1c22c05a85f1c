'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { apiFetch } from '@/components/api-fetch';
import { FormAlert } from '@/components/forms/form-alert';
import type { RunResult } from '@/lib/plans/results';
import { resonanceTarget, riskTarget } from '@/lib/revisions/rows';
import type { RiskRow } from '@/lib/revisions/types';
import type { Decision } from '@/lib/reviews/decisions';
import { RowDecision, type RowDecisionState } from './row-decision';

interface ReviewTableProps {
  revisionId: string;
  runs: RunResult[];
  risks: readonly RiskRow[];
  decisions: Record<string, RowDecisionState>;
  canReview: boolean;
}

// The frozen resonance table of every run (and the risk flags), each row with its mark: checked,
// a query, or not checked yet.
export function ReviewTable({ revisionId, runs, risks, decisions, canReview }: ReviewTableProps) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);

  const decide = async (target: string, decision: Decision, note: string) => {
    setBusy(true);
    setError(null);
    const answer = await apiFetch(`/api/v1/revisions/${revisionId}/decisions`, { method: 'PUT', body: { target, decision, note } });
    setBusy(false);
    if (!answer.ok) setError(answer.error.message);
    else router.refresh();
  };

  return (
    <div className="space-y-4">
      <FormAlert message={error} />
      {runs.map((run) => (
        <section key={run.runId} className="panel p-4" aria-label={`Resonances of ${run.name}`}>
          <h3 className="mb-2 font-semibold">{run.name}</h3>
          {run.problem && <p className="text-sm text-risk-ink">Not analysed: {run.problem}</p>}
          {run.analysis && (
            <table className="w-full text-sm">
              <thead>
                <tr className="border-b border-graphite-100 text-left text-xs text-graphite-500">
                  <th scope="col" className="py-1 pr-2 font-medium">Order</th>
                  <th scope="col" className="py-1 pr-2 text-right font-medium">Frequency</th>
                  <th scope="col" className="py-1 pr-2 text-right font-medium">Q</th>
                  <th scope="col" className="py-1 pr-2 font-medium">Fan tone</th>
                  <th scope="col" className="py-1 font-medium">Check</th>
                </tr>
              </thead>
              <tbody>
                {run.analysis.resonances.map((resonance) => {
                  const target = resonanceTarget(run.runId, resonance.order);
                  const tone = run.nearFanTone[resonance.order] ?? null;
                  const label = `${run.name} order ${resonance.order}`;
                  return (
                    <tr key={target} data-testid={`review-row-${run.name}-${resonance.order}`} className="border-b border-graphite-100 align-top">
                      <td className="py-1 pr-2">{resonance.order}</td>
                      <td className="num py-1 pr-2 text-right">{resonance.frequencyHz.toFixed(1)} Hz</td>
                      <td className="num py-1 pr-2 text-right">{resonance.q === null ? '—' : resonance.q.toFixed(1)}</td>
                      <td className="py-1 pr-2">{tone === null ? <span className="text-graphite-300">clear</span> : <span className="rounded bg-risk-soft px-1 text-xs text-risk-ink">⚠ meets {tone.toFixed(0)} Hz</span>}</td>
                      <td className="py-1">
                        <RowDecision label={label} current={decisions[target] ?? null} canReview={canReview} busy={busy} onDecide={(decision, note) => decide(target, decision, note)} />
                      </td>
                    </tr>
                  );
                })}
              </tbody>
            </table>
          )}
        </section>
      ))}
      {risks.length > 0 && (
        <section className="panel p-4" aria-label="Risk flags">
          <h3 className="mb-2 font-semibold">Risk flags</h3>
          <ul className="divide-y divide-graphite-100 text-sm">
            {risks.map((risk) => {
              const target = riskTarget(risk.id);
              return (
                <li key={risk.id} className="py-2" data-testid={`review-risk-${risk.id}`}>
                  <p className="font-medium">{risk.label} <span className="text-xs text-graphite-500">({risk.severity})</span></p>
                  <p className="text-xs text-graphite-500">{risk.detail}</p>
                  <RowDecision label={risk.label} current={decisions[target] ?? null} canReview={canReview} busy={busy} onDecide={(decision, note) => decide(target, decision, note)} />
                </li>
              );
            })}
          </ul>
        </section>
      )}
    </div>
  );
}
