// One fan feeding several runs: a run may share the fan of another run (fanOfRunId). Its fan, speed
// range and sound power are then that run's, and the sound power divides between every run that
// shares the fan in proportion to the area of each run's first duct (the branch power split,
// 10 log10(total area / own area); ASHRAE Handbook, HVAC Applications, noise chapter, from memory).
import { findRun, type Fan, type PlanDocument, type PlanRun } from './document';

export interface RunFan {
  /** The run that holds the fan's data (the run itself, or the one it shares). */
  owner: PlanRun;
  fan: Fan | null;
  fanSoundPowerDb: readonly number[] | null;
  /** Every run the fan feeds, the owner first. */
  sharers: PlanRun[];
}

export function runFan(doc: PlanDocument, run: PlanRun): RunFan {
  const owner = (run.fanOfRunId != null ? findRun(doc, run.fanOfRunId) : undefined) ?? run;
  const sharers = [owner, ...doc.runs.filter((candidate) => candidate.id !== owner.id && candidate.fanOfRunId === owner.id)];
  return { owner, fan: owner.fan, fanSoundPowerDb: owner.fanSoundPowerDb ?? null, sharers };
}

/** The area of the duct leaving a run's start, m² (null when nothing is drawn from it yet). */
export function startAreaM2(doc: PlanDocument, run: PlanRun, area: (segment: PlanDocument['segments'][number]) => number): number | null {
  const first = doc.segments.find((segment) => segment.from === run.startNodeId || segment.to === run.startNodeId);
  return first ? area(first) : null;
}
