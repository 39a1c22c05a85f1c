// Paths of the revision screens, for pages, mails and the activity list.
export function revisionPath(planId: string, number: number): string {
  return `/plans/${planId}/revisions/${number}`;
}

export function revisionsPath(planId: string): string {
  return `/plans/${planId}/revisions`;
}

export function schedulePath(planId: string, number: number): string {
  return `/plans/${planId}/revisions/${number}/schedule`;
}
