'use client';

import { useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/components/api-fetch';
import type { PlacedFlag } from '@/lib/plans/risks';
import type { TreatmentOption, TreatmentOptions } from '@/lib/plans/treatment-options';
import { TreatmentCautions } from './cautions';
import { formatEffect, formatQuantity } from './quantity';

interface TreatmentOptionsProps {
  planId: string;
  version: number;
  flag: PlacedFlag;
  editable: boolean;
  onChoose: (flag: PlacedFlag, option: TreatmentOption) => void;
  onClose: () => void;
}

// The candidate treatments of one flag, each re-run through the engine on the server, with before → after.
export function TreatmentOptionsPanel({ planId, version, flag, editable, onChoose, onClose }: TreatmentOptionsProps) {
  const options = useQuery({
    queryKey: ['treatment-options', planId, version, flag.roomId, flag.runId, flag.id],
    queryFn: async () => {
      const result = await apiFetch<TreatmentOptions>(`/api/v1/plans/${planId}/treatments/evaluate`, { method: 'POST', body: { roomId: flag.roomId, runId: flag.runId, flagId: flag.id } });
      if (!result.ok) throw new Error(result.error.message);
      return result.data;
    },
    retry: false,
  });
  return (
    <section aria-label="Treatment options" className="space-y-2" data-testid="treatment-options">
      <div className="flex items-start gap-2">
        <p className="text-sm"><span className="font-medium">Treatments for:</span> {flag.reason}</p>
        <button type="button" className="btn-quiet ml-auto px-2 py-0.5 text-xs" onClick={onClose}>Close</button>
      </div>
      {options.isLoading && <p className="text-sm text-graphite-500" role="status">Re-running the engine for each treatment…</p>}
      {options.error && <p className="text-sm text-risk-ink" role="alert">{options.error.message}</p>}
      {options.data && (
        <table className="w-full text-left text-sm">
          <thead className="text-xs text-graphite-500"><tr><th className="py-1 pr-2 font-medium">Treatment</th><th className="pr-2 font-medium">Before → after</th><th className="pr-2 font-medium">Clears the flag</th><th /></tr></thead>
          <tbody>
            {options.data.options.map((option, index) => (
              <tr key={index} className="border-t border-graphite-100 align-top" data-testid="treatment-option" data-kind={option.treatment.kind}>
                <td className="py-1 pr-2">
                  {option.description}
                  {option.planChange === null && <span className="block text-xs text-graphite-500">Recorded in the list; draw it on the plan yourself.</span>}
                  {formatEffect(option.effect) && <span className="num block text-xs text-graphite-700" data-testid="option-effect">{formatEffect(option.effect)}</span>}
                </td>
                <td className="num pr-2 text-xs"><span data-testid="option-before">{formatQuantity(option.before)}</span> → <span data-testid="option-after">{formatQuantity(option.after)}</span></td>
                <td className="pr-2 text-xs">
                  {option.clears ? '✓ yes' : '✗ no'}
                  {option.raises.length > 0 && (
                    <details className="mt-0.5 text-risk-ink" data-testid="treatment-raises">
                      <summary className="cursor-pointer">but raises {option.raises.length} other flag{option.raises.length === 1 ? '' : 's'}</summary>
                      <ul className="mt-1 space-y-1 text-graphite-700">{option.raises.map((reason) => <li key={reason}>{reason}</li>)}</ul>
                    </details>
                  )}
                </td>
                <td className="py-1">{editable && <button type="button" className="btn-quiet whitespace-nowrap px-2 py-0.5 text-xs" onClick={() => onChoose(flag, option)}>Add to plan</button>}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      <TreatmentCautions />
    </section>
  );
}
