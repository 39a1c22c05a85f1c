// The loss of one element of a noise path, per octave band, with its input checked by field path.
import { DEFAULT_TEMPERATURE_C, DUCT_FLANKING_CAP_DB, MIN_SECTION_DIMENSION_M, OCTAVE_BANDS_HZ } from '../constants';
import { endReflectionLoss } from '../end-reflection-loss';
import { inputError, requireAbove, requireAtLeast } from '../input-error';
import { linedDuctAttenuationDb } from '../lining/lined-duct-attenuation';
import { validateSection } from '../validate-run';
import { validateWall, wallAttenuationDbPerM } from '../walls/wall-attenuation';
import type { Wall } from '../walls/wall-types';
import { branchPowerSplitDb } from './branch-power-split';
import { elbowAttenuationDb } from './elbow-attenuation';
import type { PathElement } from './noise-path-types';
import { plenumAttenuationDb } from './plenum-attenuation';

const BANDS_HZ: number[] = [...OCTAVE_BANDS_HZ];
const SHEET_METAL: Wall = { kind: 'sheet-metal' };

export interface ElementLoss {
  lossDb: number[];
  /** What was limited on the way, in words. */
  warnings: string[];
}

/** Entered per-band losses: 8 finite values, none below 0 dB (a gain is not a loss). */
function enteredBands(values: unknown, path: string): number[] {
  if (!Array.isArray(values) || values.length !== BANDS_HZ.length) throw inputError(path, `must have ${BANDS_HZ.length} octave-band values`);
  return values.map((value, band) => requireAtLeast(value, 0, `${path}[${band}]`));
}

function bandList(hzList: number[]): string {
  return hzList.map((hz) => `${hz} Hz`).join(', ');
}

function ductLoss(element: Extract<PathElement, { kind: 'duct' }>, path: string, temperatureC: number): ElementLoss {
  validateSection(element.section, `${path}.section`);
  const lengthM = requireAbove(element.lengthM, 0, `${path}.lengthM`);
  const wall = element.wall === undefined ? SHEET_METAL : validateWall(element.wall, `${path}.wall`);
  const wallDbPerM = wallAttenuationDbPerM(wall, element.section, BANDS_HZ, temperatureC);
  const liningDb = element.lining === undefined ? BANDS_HZ.map(() => 0) : linedDuctAttenuationDb(element.section, element.lining, lengthM, BANDS_HZ, path);
  // Walls and liner together are limited by the same flanking as the liner alone (DUCT_FLANKING_CAP_DB; common practice, no source)
  const lossDb = wallDbPerM.map((dbPerM, band) => Math.min(dbPerM * lengthM + liningDb[band], DUCT_FLANKING_CAP_DB));
  const capped = BANDS_HZ.filter((_, band) => lossDb[band] >= DUCT_FLANKING_CAP_DB);
  const warnings = capped.length
    ? [`${path}: the duct's attenuation is limited to ${DUCT_FLANKING_CAP_DB} dB by flanking at ${bandList(capped)}`]
    : [];
  return { lossDb, warnings };
}

function plenumLoss(element: Extract<PathElement, { kind: 'plenum' }>, path: string): ElementLoss {
  const wellsDb = plenumAttenuationDb(element, path);
  if (wellsDb >= 0) return { lossDb: BANDS_HZ.map(() => wellsDb), warnings: [] };
  return {
    lossDb: BANDS_HZ.map(() => 0),
    warnings: [`${path}: Wells' formula gives ${wellsDb.toFixed(1)} dB (outlet large for so small or hard a plenum); 0 dB is credited`],
  };
}

/** The element's loss in the bands 63 Hz to 8 kHz, dB, never below 0. */
export function elementLoss(element: PathElement, path: string, temperatureC = DEFAULT_TEMPERATURE_C): ElementLoss {
  if (typeof element !== 'object' || element === null) throw inputError(path, 'must be an object');
  switch (element.kind) {
    case 'duct':
      return ductLoss(element, path, temperatureC);
    case 'elbow':
      return { lossDb: elbowAttenuationDb(element, BANDS_HZ, path), warnings: [] };
    case 'split': {
      const splitDb = branchPowerSplitDb(element.branchAreaM2, element.totalAreaM2, path);
      return { lossDb: BANDS_HZ.map(() => splitDb), warnings: [] };
    }
    case 'plenum':
      return plenumLoss(element, path);
    case 'silencer':
      return { lossDb: enteredBands(element.insertionLossDb, `${path}.insertionLossDb`), warnings: [] };
    case 'outlet': {
      requireAtLeast(element.diameterM, MIN_SECTION_DIMENSION_M, `${path}.diameterM`);
      if (element.mounting !== 'flush' && element.mounting !== 'free') throw inputError(`${path}.mounting`, "must be 'flush' or 'free'");
      return { lossDb: endReflectionLoss(element.diameterM, element.mounting, BANDS_HZ, temperatureC), warnings: [] };
    }
    case 'loss':
      if (typeof element.label !== 'string') throw inputError(`${path}.label`, 'must be a string');
      return { lossDb: enteredBands(element.lossDb, `${path}.lossDb`), warnings: [] };
    default:
      throw inputError(`${path}.kind`, "must be 'duct', 'elbow', 'split', 'plenum', 'silencer', 'outlet' or 'loss'");
  }
}
