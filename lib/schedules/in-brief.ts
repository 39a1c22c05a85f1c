// What the first page says plainly: for each room, its predicted noise against its criterion and
// whether it meets it; then the runs' resonances near fan tones and the chosen treatments.
import type { PlanDocument } from '@/lib/plan/document';
import type { RoomRow, TreatmentRow } from '@/lib/revisions/types';

export interface RoomVerdict {
  room: string;
  /** true meets, false does not, null when no level could be predicted. */
  meets: boolean | null;
  text: string;
}

function predictedNc(row: RoomRow): { nc: number; criterionNc: number | null; where: string } | null {
  if (row.noise && row.noise.listeners.length > 0) {
    const worst = row.noise.listeners.find((listener) => listener.listenerId === row.noise!.worstListenerId) ?? row.noise.listeners[0];
    const where = row.noise.listeners.length > 1 ? ` at ${worst.name}, the worst of ${row.noise.listeners.length} listeners` : ` at ${worst.name}`;
    return { nc: worst.nc, criterionNc: row.noise.criterionNc, where };
  }
  if (row.path) return { nc: row.path.nc, criterionNc: null, where: ' at the listener' };
  return null;
}

/** "Room 1.04: NC 30 predicted against NC 25 — does not meet its criterion." */
export function roomVerdicts(rooms: readonly RoomRow[], document: PlanDocument): RoomVerdict[] {
  return rooms.map((row) => {
    const criterionNc = document.rooms.find((room) => room.id === row.id)?.criterionNc ?? null;
    const predicted = predictedNc(row);
    const criterion = predicted?.criterionNc ?? criterionNc;
    if (!predicted || criterion === null) {
      return { room: row.name, meets: null, text: `${row.name}: no level predicted${row.problem ? ` (${row.problem.replace(/\.$/, '')})` : ''}, so it is not judged against its criterion.` };
    }
    const meets = predicted.nc <= criterion;
    const margin = Math.abs(criterion - predicted.nc);
    const verdict = meets
      ? `meets its criterion${margin > 0 ? ` with ${margin} to spare` : ', with nothing to spare'}`
      : `does not meet its criterion, by ${margin}`;
    return { room: row.name, meets, text: `${row.name}: NC ${predicted.nc.toFixed(0)} predicted${predicted.where} against NC ${criterion} — ${verdict}.` };
  });
}

export function treatmentsInBrief(treatments: readonly TreatmentRow[]): string {
  if (treatments.length === 0) return 'No treatments are chosen in this revision.';
  const clearing = treatments.filter((treatment) => treatment.clears).length;
  const count = `${treatments.length} treatment${treatments.length === 1 ? '' : 's'} chosen`;
  return `${count} (marked T1${treatments.length > 1 ? `–T${treatments.length}` : ''} on the plan); ${clearing === treatments.length ? (treatments.length === 1 ? 'it clears its flag' : 'each clears its flag') : `${clearing} of ${treatments.length} clear their flags`} on this revision. Room predictions include them.`;
}
