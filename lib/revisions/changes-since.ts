// What changed in a revision since the one before it: the key numbers of each run, and every
// change to the plan document (null for a first revision).
import type { UnitSystem } from '@/lib/plan/units';
import { compareRevisions, type RevisionChanges } from './changes';
import { previousRevision } from './data';
import { documentChanges, type DocumentChange } from './document-changes';
import type { RevisionView } from './types';

export interface ChangesSince { runs: RevisionChanges; plan: DocumentChange[] | null }

export async function changesSincePrevious(revision: RevisionView, units: UnitSystem): Promise<ChangesSince> {
  const previous = await previousRevision(revision.teamId, revision.planId, revision.number);
  const runs = compareRevisions(
    previous && { number: previous.number, analysis: previous.analysis, segmentCount: previous.document.segments.length },
    { analysis: revision.analysis, segmentCount: revision.document.segments.length },
  );
  const plan = previous && documentChanges(
    { document: previous.document, metresPerPixel: previous.metresPerPixel, labels: previous.extras.labels },
    { document: revision.document, metresPerPixel: revision.metresPerPixel, labels: revision.extras.labels },
    units,
  );
  return { runs, plan };
}
