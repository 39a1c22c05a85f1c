// A room's noise path result: the path from the drawing through the engine, the criterion curve, the
// margin per band (criterion minus level; negative where the level is above it) and the band that
// governs; and the level flags it raises at the listener.
import { ncCriterionCurveDb, noisePath, OCTAVE_BANDS_HZ, type NoisePathResult, type PathElement, type RiskFlag } from '@/lib/acoustic';
import type { PlanDocument } from '@/lib/plan/document';
import type { PlanRoom } from '@/lib/plan/rooms/room-types';
import { derivePath, type PathElementSource } from './derive-path';

/** Above the criterion by more than this is high, more than MEDIUM_EXCESS_DB medium (product rule, as for outlet levels). */
const HIGH_EXCESS_DB = 5;
const MEDIUM_EXCESS_DB = 2;

export interface RoomNoisePath {
  runId: string;
  result: NoisePathResult;
  /** The fan's sound power the path starts from, per band, dB re 1 pW. */
  fanSoundPowerDb: number[];
  /** The elements as read off the drawing, one per step. */
  elements: PathElement[];
  sources: PathElementSource[];
  criterionDb: number[];
  marginDb: number[];
  /** The band with the least margin: the one that sets the rating against the criterion. */
  governingHz: number;
}

export function roomNoisePath(doc: PlanDocument, metresPerPixel: number, room: PlanRoom): RoomNoisePath {
  const derived = derivePath(doc, metresPerPixel, room);
  const result = noisePath(derived.input);
  const criterionDb = ncCriterionCurveDb(room.criterionNc);
  const marginDb = result.listenerDb.map((levelDb, band) => criterionDb[band] - levelDb);
  const governing = marginDb.reduce((best, margin, band) => (margin < marginDb[best] ? band : best), 0);
  return { runId: derived.runId, result, fanSoundPowerDb: derived.input.soundPowerDb, elements: derived.input.elements, sources: derived.sources, criterionDb, marginDb, governingHz: OCTAVE_BANDS_HZ[governing] };
}

/** "Level above criterion at the listener in band B by X dB", one flag per band above the curve. */
export function pathLevelFlags(room: PlanRoom, path: RoomNoisePath): RiskFlag[] {
  return path.result.listenerDb.flatMap((levelDb, band) => {
    const excessDb = -path.marginDb[band];
    if (!(excessDb > 0)) return [];
    const hz = OCTAVE_BANDS_HZ[band];
    return [{
      id: `path-level:${hz}:${levelDb.toFixed(1)}`,
      kind: 'level-above-criterion' as const,
      subject: `band:${hz}`,
      severity: excessDb > HIGH_EXCESS_DB ? 'high' as const : excessDb > MEDIUM_EXCESS_DB ? 'medium' as const : 'low' as const,
      reason: `At the listener in ${room.name}, the ${hz} Hz band is ${levelDb.toFixed(1)} dB by the noise path from the fan: ${excessDb.toFixed(1)} dB above the NC-${room.criterionNc} curve (${path.criterionDb[band].toFixed(1)} dB)${hz === path.governingHz ? '; this band governs' : ''}.`,
      targetHz: hz,
      quantity: { levelDb, criterionDb: path.criterionDb[band] },
    }];
  });
}
