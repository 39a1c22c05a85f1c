// The plan's limits as editor commands meet them: a point placed off the plan, and an edit that
// would take the plan past its number of runs, segments, points or rooms, are refused in words.
import type { PlanDocument } from '../document';
import { PlanError, type PlanLocation } from '../errors';
import type { Point } from '../geometry/point';
import { MAX_PLAN_COORDINATE_PX, MAX_PLAN_NODES, MAX_PLAN_ROOMS, MAX_PLAN_RUNS, MAX_PLAN_SEGMENTS, planCoordinateSchema } from '../schema-parts';

const coordinate = planCoordinateSchema('a coordinate');
const within = (value: number) => coordinate.safeParse(value).success;

/** Refuses a point that is not a finite position within the plan's coordinate limit. */
export function requireOnPlan(point: Point, where: PlanLocation = {}): void {
  if (!within(point.x) || !within(point.y)) {
    throw new PlanError(`That point is off the plan (more than ${MAX_PLAN_COORDINATE_PX} px from its origin).`, where);
  }
}

const COUNTS: ReadonlyArray<[keyof Pick<PlanDocument, 'runs' | 'segments' | 'nodes' | 'rooms'>, number, string]> = [
  ['runs', MAX_PLAN_RUNS, 'runs'],
  ['segments', MAX_PLAN_SEGMENTS, 'segments'],
  ['nodes', MAX_PLAN_NODES, 'points'],
  ['rooms', MAX_PLAN_ROOMS, 'rooms'],
];

/** Refuses an edit that adds runs, segments, points or rooms beyond the plan's limits (removing is always allowed). */
export function requireWithinPlanLimits(before: PlanDocument, after: PlanDocument): void {
  for (const [key, most, what] of COUNTS) {
    if (after[key].length > most && after[key].length > before[key].length) {
      throw new PlanError(`A plan holds at most ${most} ${what}; split the drawing into several plans.`);
    }
  }
}
