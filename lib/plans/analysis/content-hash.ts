// The identity of a plan's content: a SHA-256 of its document (labels assigned) and scale, written
// with sorted keys so the same content always gives the same hash, however it was stored.
import { createHash } from 'node:crypto';
import type { PlanDocument } from '@/lib/plan/document';
import { assignLabels } from '@/lib/plan/labels';

function canonical(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonical).join(',')}]`;
  if (value !== null && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>).filter(([, item]) => item !== undefined).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([key, item]) => `${JSON.stringify(key)}:${canonical(item)}`).join(',')}}`;
  }
  return JSON.stringify(value ?? null);
}

export function contentHash(document: PlanDocument, metresPerPixel: number): string {
  return createHash('sha256').update(canonical({ document: assignLabels(document), metresPerPixel })).digest('hex');
}
