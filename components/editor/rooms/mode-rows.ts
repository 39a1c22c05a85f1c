// The room's mode list with the flags that cite each mode: every mode the room analysis computed,
// lowest first, and any cited mode the analysis did not list (so no flag points at nothing).
import type { RiskFlag, RoomMode } from '@/lib/acoustic';

export interface ModeRow {
  readonly mode: RoomMode;
  /** The room-mode flags that cite this mode (a duct resonance near it), highest severity first. */
  readonly flags: readonly RiskFlag[];
}

const SEVERITY_RANK = { high: 0, medium: 1, low: 2 } as const;

/** The flag subject of a room mode, as the engine writes it: "room-mode:1,0,0". */
export function modeSubject(mode: Pick<RoomMode, 'indices'>): string {
  return `room-mode:${mode.indices.join(',')}`;
}

export function modeRows(modes: readonly RoomMode[], flags: readonly RiskFlag[]): { rows: ModeRow[]; unlisted: RiskFlag[] } {
  const bySubject = new Map<string, RiskFlag[]>();
  for (const flag of flags) {
    if (flag.kind !== 'resonance-near-room-mode') continue;
    bySubject.set(flag.subject, [...(bySubject.get(flag.subject) ?? []), flag]);
  }
  const listed = new Set<string>();
  const rows = [...modes].sort((a, b) => a.frequencyHz - b.frequencyHz).map((mode) => {
    const subject = modeSubject(mode);
    listed.add(subject);
    const cited = [...(bySubject.get(subject) ?? [])].sort((a, b) => SEVERITY_RANK[a.severity] - SEVERITY_RANK[b.severity]);
    return { mode, flags: cited };
  });
  const unlisted = [...bySubject.entries()].filter(([subject]) => !listed.has(subject)).flatMap(([, cited]) => cited);
  return { rows, unlisted };
}
