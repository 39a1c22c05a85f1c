// Where a comment lives: its revision page when it belongs to one, else the plan page.
import { revisionPath } from '@/lib/revisions/links';

export function commentPath(planId: string, revisionNumber: number | null, commentId: string): string {
  const page = revisionNumber === null ? `/plans/${planId}` : revisionPath(planId, revisionNumber);
  return `${page}?comment=${commentId}#comment-${commentId}`;
}
