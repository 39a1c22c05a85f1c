// One outlet's path to one listener as the engine computes it (the room's first outlet to its first
// listener), and the level flags the room's noise raises: one per listener and band above the criterion.
import { ncCriterionCurveDb, noisePath, OCTAVE_BANDS_HZ, type NoisePathResult, type PathElement, type RiskFlag } from '@/lib/acoustic';
import type { PlanDocument } from '@/lib/plan/document';
import { FIRST_LISTENER_ID } from '@/lib/plan/rooms/room-places';
import type { PlanRoom } from '@/lib/plan/rooms/room-types';
import { derivePath, type PathElementSource } from './derive-path';
import type { RoomNoise } from './room-noise';

/** Above the criterion by more than this is high, more than MEDIUM_EXCESS_DB medium (product rule, as for outlet levels). */
const HIGH_EXCESS_DB = 5;
const MEDIUM_EXCESS_DB = 2;

export interface RoomNoisePath {
  runId: string;
  result: NoisePathResult;
  /** The sound power the path starts from, per band, dB re 1 pW (the fan's, at the top of its speed range). */
  fanSoundPowerDb: number[];
  /** The elements as read off the drawing, one per step. */
  elements: PathElement[];
  sources: PathElementSource[];
  criterionDb: number[];
  marginDb: number[];
  /** The band with the least margin: the one that sets the rating against the criterion. */
  governingHz: number;
}

/** The first outlet's path to the first listener, with Schultz's room correction. */
export function roomNoisePath(doc: PlanDocument, metresPerPixel: number, room: PlanRoom): RoomNoisePath {
  const derived = derivePath(doc, metresPerPixel, room);
  const result = noisePath(derived.input);
  const criterionDb = ncCriterionCurveDb(room.criterionNc);
  const marginDb = result.listenerDb.map((levelDb, band) => criterionDb[band] - levelDb);
  const governing = marginDb.reduce((best, margin, band) => (margin < marginDb[best] ? band : best), 0);
  return { runId: derived.runId, result, fanSoundPowerDb: derived.input.soundPowerDb, elements: derived.input.elements, sources: derived.sources, criterionDb, marginDb, governingHz: OCTAVE_BANDS_HZ[governing] };
}

/** The flag subject of a band at a listener: "band:500" at the first listener (as before there were more), "band:500@<id>" at the others. */
export function levelSubject(hz: number, listenerId: string): string {
  return listenerId === FIRST_LISTENER_ID ? `band:${hz}` : `band:${hz}@${listenerId}`;
}

/** The listener a level flag's subject names. */
export function listenerOfSubject(subject: string): string {
  const at = subject.indexOf('@');
  return at < 0 ? FIRST_LISTENER_ID : subject.slice(at + 1);
}

const hzWords = (hz: number) => (hz >= 1000 ? `${hz / 1000} kHz` : `${hz} Hz`);

/** "Level above criterion at listener L in band B by X dB", one flag per listener and band above the curve. */
export function pathLevelFlags(room: PlanRoom, noise: RoomNoise): RiskFlag[] {
  const sources = noise.outlets.length === 1 ? 'by the noise path from the fan' : `from its ${noise.outlets.length} outlets`;
  return noise.listeners.flatMap((listener) => listener.levelDb.flatMap((levelDb, band) => {
    const excessDb = -listener.marginDb[band];
    if (!(excessDb > 0)) return [];
    const hz = OCTAVE_BANDS_HZ[band];
    const first = listener.listenerId === FIRST_LISTENER_ID;
    return [{
      id: `path-level:${hz}:${levelDb.toFixed(1)}${first ? '' : `@${listener.listenerId}`}`,
      kind: 'level-above-criterion' as const,
      subject: levelSubject(hz, listener.listenerId),
      severity: excessDb > HIGH_EXCESS_DB ? 'high' as const : excessDb > MEDIUM_EXCESS_DB ? 'medium' as const : 'low' as const,
      reason: `At listener ${listener.name} in ${room.name}, the ${hzWords(hz)} band is ${levelDb.toFixed(1)} dB ${sources}: ${excessDb.toFixed(1)} dB above the NC-${room.criterionNc} curve (${noise.criterionDb[band].toFixed(1)} dB)${hz === listener.governingHz ? '; this band governs' : ''}${noise.bandsBelowSchroederHz.includes(hz) ? '; below the Schroeder frequency, so the level at a seat may differ by several dB' : ''}.`,
      targetHz: hz,
      quantity: { levelDb, criterionDb: noise.criterionDb[band] },
    }];
  }));
}
