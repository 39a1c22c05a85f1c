'use client';

import type { PlacedFlag } from '@/lib/plans/risks';
import { formatQuantity } from './quantity';
import { SeverityBadge } from './severity-badge';

interface RiskListProps {
  flags: PlacedFlag[];
  /** The rules behind the flags (null while loading). */
  rules: { temperatureSwingC: number; speedSlipPercent: number; nearMaximumWavelengths: number } | null;
  canEvaluate: boolean;
  openFlagId: string | null;
  onOpen: (flag: PlacedFlag) => void;
}

// Every flag across the plan: severity (word and shape), where, what, and the way to its treatments.
export function RiskList({ flags, rules, canEvaluate, openFlagId, onOpen }: RiskListProps) {
  const ruleText = rules && (
    <p className="text-xs text-graphite-500" data-testid="risk-rules">
      A duct resonance is flagged when its band meets a fan tone or room mode anywhere over the operating envelope (the fan&apos;s speed range, or ±{rules.speedSlipPercent} % belt slip
      without one; the supply air ±{rules.temperatureSwingC} °C) and the run adds at least 3 dB there over its smooth response (low from 3 dB, medium from 6, high from 10);
      broad resonances (Q under 5, or overlapping their neighbours) are not flagged. A room mode counts below the room&apos;s Schroeder frequency when the outlet or listener is within {(rules.nearMaximumWavelengths * 100).toFixed(1)} % of a wavelength of its pressure maximum.
    </p>
  );
  if (flags.length === 0) {
    return <>{ruleText}<p className="text-sm text-graphite-500" data-testid="no-risks">No flags on the saved plan. Give each run its fan and connect each room to the run end that feeds it to check them.</p></>;
  }
  return (
    <>
    {ruleText}
    <table className="w-full text-left text-sm" data-testid="risk-list">
      <thead className="text-xs text-graphite-500">
        <tr><th className="py-1 pr-2 font-medium">Severity</th><th className="pr-2 font-medium">Where</th><th className="pr-2 font-medium">Why</th><th className="pr-2 font-medium">Quantity</th><th /></tr>
      </thead>
      <tbody>
        {flags.map((flag) => (
          <tr key={`${flag.roomId ?? flag.runId}:${flag.id}`} className={`border-t border-graphite-100 align-top ${openFlagId === flag.id ? 'bg-risk-soft' : ''}`} data-testid="risk-row" data-subject={flag.subject}>
            <td className="py-1 pr-2"><SeverityBadge severity={flag.severity} /></td>
            <td className="pr-2 text-xs">{flag.roomName ?? 'no room'} · {flag.runName}</td>
            <td className="pr-2">{flag.reason}</td>
            <td className="num pr-2 text-xs">{formatQuantity(flag.quantity)}</td>
            <td className="py-1">
              {canEvaluate && <button type="button" className="btn-quiet whitespace-nowrap px-2 py-0.5 text-xs" onClick={() => onOpen(flag)} aria-label={`Treatments for: ${flag.reason}`}>Treatments…</button>}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
    </>
  );
}
