// The octave-band noise path from a fan to a listener: the fan's sound power, less each element's loss
// in turn, into the room by Schultz's correction (or one the caller gives, such as the room equation of a
// bare room), rated as NC, NR and dB(A).
import { DEFAULT_TEMPERATURE_C, OCTAVE_BANDS_HZ, ZERO_CELSIUS_K } from '../constants';
import { inputError, requireAbove, requireFinite } from '../input-error';
import { ncRating } from '../nc-rating';
import { NC_CURVES } from '../nc-curves';
import { aWeightedLevelDb } from '../ratings/a-weighting';
import { nrRating } from '../ratings/nr-rating';
import { schultzRoomCorrectionDb } from '../room/schultz-room-correction';
import { elementLoss } from './element-loss';
import type { NoisePathInput, NoisePathResult, NoisePathStep } from './noise-path-types';

const LOWEST_NC = NC_CURVES[0].rating;
const HIGHEST_NC = NC_CURVES[NC_CURVES.length - 1].rating;

function ncWarning(nc: number): string[] {
  if (nc < LOWEST_NC) {
    return [`NC ${nc} lies below NC-${LOWEST_NC}, the lowest published curve: extrapolated from the NC-${LOWEST_NC} and NC-${NC_CURVES[1].rating} curves, a rough figure only`];
  }
  if (nc > HIGHEST_NC) {
    return [`NC ${nc} lies above NC-${HIGHEST_NC}, the highest published curve: extrapolated from the NC-${NC_CURVES[NC_CURVES.length - 2].rating} and NC-${HIGHEST_NC} curves, a rough figure only`];
  }
  return [];
}

/** Sound power after every element and the level at the listener; throws a RangeError naming a bad field. */
export function noisePath(input: NoisePathInput): NoisePathResult {
  if (typeof input !== 'object' || input === null) throw inputError('input', 'must be an object');
  const bandsHz = [...OCTAVE_BANDS_HZ];
  if (!Array.isArray(input.soundPowerDb) || input.soundPowerDb.length !== bandsHz.length) {
    throw inputError('soundPowerDb', `must have ${bandsHz.length} octave-band levels`);
  }
  let powerDb = input.soundPowerDb.map((levelDb, band) => requireFinite(levelDb, `soundPowerDb[${band}]`));
  if (!Array.isArray(input.elements)) throw inputError('elements', 'must be an array');
  if (typeof input.room !== 'object' || input.room === null) throw inputError('room', 'must be an object');
  const temperatureC = input.temperatureC === undefined ? DEFAULT_TEMPERATURE_C : requireAbove(input.temperatureC, -ZERO_CELSIUS_K, 'temperatureC');

  const warnings: string[] = [];
  const steps: NoisePathStep[] = input.elements.map((element, index) => {
    const loss = elementLoss(element, `elements[${index}]`, temperatureC);
    warnings.push(...loss.warnings);
    powerDb = powerDb.map((levelDb, band) => levelDb - loss.lossDb[band]);
    const step: NoisePathStep = { kind: element.kind, lossDb: loss.lossDb, powerDb };
    if (element.kind === 'loss') step.label = element.label;
    return step;
  });

  const given = input.room.correctionDb;
  if (given !== undefined && (!Array.isArray(given) || given.length !== bandsHz.length)) throw inputError('room.correctionDb', `must have ${bandsHz.length} octave-band values`);
  const roomCorrectionDb = given
    ? given.map((correctionDb, band) => requireFinite(correctionDb, `room.correctionDb[${band}]`))
    : bandsHz.map((hz) => schultzRoomCorrectionDb(input.room.volumeM3, input.room.distanceM, hz, 'room'));
  const listenerDb = powerDb.map((levelDb, band) => levelDb + roomCorrectionDb[band]);
  const nc = ncRating(listenerDb);
  warnings.push(...ncWarning(nc));
  return { bandsHz, steps, listenerDb, nc, nr: nrRating(listenerDb), dba: aWeightedLevelDb(listenerDb), roomCorrectionDb, roomCorrection: given ? 'given' : 'schultz', warnings };
}
