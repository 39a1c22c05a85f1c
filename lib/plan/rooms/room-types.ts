// Rooms on the plan and the plan's chosen treatments: plain readonly data inside the plan document.
import type { FlaggedQuantity, RiskKind, SurfaceName, Treatment } from '@/lib/acoustic';
import type { Lining, Termination } from '../document';

export type { SurfaceName };

/** A point in the room, m, from its corner at the rectangle's top-left on the plan: x along lengthM (plan x), y along widthM (plan y), z up. */
export interface RoomPoint {
  readonly xM: number;
  readonly yM: number;
  readonly zM: number;
}

/** One surface: the finish it was picked from (or null when typed in) and its absorption in the 8 octave bands 63 Hz to 8 kHz. */
export interface RoomSurface {
  readonly finishId: string | null;
  readonly absorption: readonly number[];
}

export interface RoomOutlet extends RoomPoint {
  /** The run's open end that feeds the room (a node id), or null while unconnected. */
  readonly nodeId: string | null;
}

/** A further outlet into the room, fed from its own run end (the room's first outlet is `outlet`). */
export interface ExtraOutlet extends RoomOutlet {
  readonly id: string;
}

/** A further listener position in the room (the room's first listener, "L1", is `listener`). */
export interface RoomListener extends RoomPoint {
  readonly id: string;
  /** Short name shown in the tables and on the plan, e.g. "L2" or "Front row". */
  readonly name: string;
}

/**
 * How the level at a listener follows from the sound power into the room: Schultz's empirical relation
 * for furnished rooms, or the room equation with the room's own absorption for bare rooms.
 */
export type RoomCorrectionChoice = 'furnished' | 'bare';

/**
 * A rectangular room, drawn as an axis-aligned rectangle whose top-left corner sits at (x, y) in
 * plan pixels and whose size on the plan follows the plan scale (lengthM along x, widthM along y).
 */
export interface PlanRoom {
  readonly id: string;
  readonly name: string;
  readonly x: number;
  readonly y: number;
  readonly lengthM: number;
  readonly widthM: number;
  readonly heightM: number;
  readonly surfaces: Readonly<Record<SurfaceName, RoomSurface>>;
  /** The room's criterion, an NC value. */
  readonly criterionNc: number;
  readonly outlet: RoomOutlet;
  readonly listener: RoomPoint;
  /** Sound power arriving at the outlet, octave bands 63 Hz to 8 kHz, dB re 1 pW; null: no level prediction. */
  readonly outletSoundPowerDb: readonly number[] | null;
  /** Further outlets, each fed from its own run end (absent in documents saved before there could be more than one). */
  readonly extraOutlets?: readonly ExtraOutlet[];
  /** Further listener positions (absent likewise). */
  readonly extraListeners?: readonly RoomListener[];
  /** Furnished (Schultz, the default: absent in documents saved before the choice existed) or bare (the room equation). */
  readonly roomCorrection?: RoomCorrectionChoice;
}

/** What choosing a treatment changed on the plan (null in PlanTreatment when it changes nothing drawn). */
export type PlanChange =
  | { readonly kind: 'length-override'; readonly segmentId: string; readonly lengthM: number }
  | { readonly kind: 'lining'; readonly segmentId: string; readonly lining: Lining }
  | { readonly kind: 'termination'; readonly nodeId: string; readonly termination: Termination };

/** What the changed element held before: null for a segment without a length override or lining. */
export type PlanChangePrevious =
  | { readonly kind: 'length-override'; readonly segmentId: string; readonly lengthM: number | null }
  | { readonly kind: 'lining'; readonly segmentId: string; readonly lining: Lining | null }
  | { readonly kind: 'termination'; readonly nodeId: string; readonly termination: Termination };

/** A treatment the acoustician chose for a flag, with the engine's before and after. */
export interface PlanTreatment {
  readonly id: string;
  readonly runId: string;
  readonly roomId: string | null;
  readonly flagId: string;
  readonly flagKind: RiskKind;
  readonly flagSubject: string;
  readonly flagReason: string;
  readonly treatment: Treatment;
  readonly description: string;
  readonly before: FlaggedQuantity;
  readonly after: FlaggedQuantity;
  readonly clears: boolean;
  readonly planChange: PlanChange | null;
  /** What the element held before the change, for removing the treatment exactly (absent in older lists). */
  readonly previous?: PlanChangePrevious | null;
}
