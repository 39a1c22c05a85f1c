// What a noise path starts from: the fan's sound power as given (at the speed its data are for), moved
// by the fan laws to the top of its speed range, where it is loudest.
import { fanSpeedSoundPowerChangeDb } from '@/lib/acoustic';
import type { PlanRun } from '@/lib/plan/document';

export interface FanSpeedChange {
  /** The speed the sound power data are given at. */
  ratedRpm: number;
  /** The speed the path is worked at: the top of the range. */
  worstRpm: number;
  /** 50 log10(worst / rated), dB. */
  changeDb: number;
}

export interface FanStart {
  /** As typed into the run, dB re 1 pW. */
  fanSoundPowerDb: number[];
  /** Null when the fan has no speed range above or below its rated speed. */
  speed: FanSpeedChange | null;
  /** The path's first sound power. */
  startPowerDb: number[];
}

export function fanStart(run: PlanRun, fanSoundPowerDb: readonly number[]): FanStart {
  const given = [...fanSoundPowerDb];
  const topRpm = run.fan?.maxRpm ?? null;
  if (!run.fan || topRpm === null || topRpm === run.fan.rpm) return { fanSoundPowerDb: given, speed: null, startPowerDb: given };
  const changeDb = fanSpeedSoundPowerChangeDb(run.fan.rpm, topRpm);
  return { fanSoundPowerDb: given, speed: { ratedRpm: run.fan.rpm, worstRpm: topRpm, changeDb }, startPowerDb: given.map((levelDb) => levelDb + changeDb) };
}
