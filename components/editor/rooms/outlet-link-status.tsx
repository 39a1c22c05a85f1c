'use client';

import type { OutletLink } from '@/lib/plan';
import { formatLength } from '@/lib/plan/units';
import type { UnitSystem } from '@/models/user';

interface OutletLinkStatusProps {
  link: OutletLink;
  unitSystem: UnitSystem;
  editable: boolean;
  /** Puts the outlet back at its duct end (one undo step). */
  onJoin: () => void;
}

// In words: whether the room's outlet sits at the duct end that feeds it, and what to do when not.
export function OutletLinkStatus({ link, unitSystem, editable, onJoin }: OutletLinkStatusProps) {
  const length = (metres: number) => formatLength(metres, unitSystem, 'run');
  return (
    <div className="text-xs text-graphite-700" data-testid="outlet-link" data-link={link.kind}>
      {link.kind === 'unlinked' && <p>Not joined to a duct end yet: choose the run end that feeds the room.</p>}
      {link.kind === 'at-end' && <p>At the duct end that feeds the room: moving either one moves both.</p>}
      {link.kind === 'end-outside' && (
        <p role="status" className="text-risk-ink">
          <span aria-hidden="true">⚠ </span>The duct end is outside the room ({length(link.outsideByM)} beyond its wall); the outlet stays at the nearest point inside.
          Move the end into the room, or place the outlet below to bring the end to it.
        </p>
      )}
      {link.kind === 'apart' && (
        <p role="status" className="text-risk-ink">
          <span aria-hidden="true">⚠ </span>The outlet is {length(link.apartM)} from its duct end.{' '}
          {editable && <button type="button" className="btn-quiet px-2 py-0.5 text-xs" onClick={onJoin}>Put the outlet at its duct end</button>}
        </p>
      )}
    </div>
  );
}
