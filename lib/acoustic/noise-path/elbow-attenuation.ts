// Insertion loss of a duct elbow per octave band, from the published tables by frequency times width.
import { INCH_M } from '../constants';
import { fieldPath, inputError, requireAbove } from '../input-error';
import type { Section } from '../types';
import { validateSection } from '../validate-run';
import { RADIUSED_ELBOW_ROWS, SQUARE_ELBOW_ROWS, VANED_ELBOW_ROWS, type ElbowRow } from './elbow-tables';

export interface ElbowInput {
  section: Section;
  /** Turning vanes in a square elbow (default false). */
  vanes?: boolean;
  /** Lined with fibrous liner through the bend (default false). */
  lined?: boolean;
  /** A radiused bend rather than a square (mitred) one; default true for round sections, false for rectangular. */
  radius?: boolean;
}

function optionalBoolean(value: unknown, path: string): boolean | undefined {
  if (value !== undefined && typeof value !== 'boolean') throw inputError(path, 'must be a boolean');
  return value;
}

/**
 * dB in each band of bandsHz. The width in the plane of the bend is the diameter of a round section and
 * widthM of a rectangular one (so draw a rectangular elbow with widthM in the plane of its turn). The
 * tables are steps in f·w and are used as steps. Turning vanes belong to square elbows only.
 */
export function elbowAttenuationDb(elbow: ElbowInput, bandsHz: readonly number[], path = ''): number[] {
  const field = (name: string) => fieldPath(path, name);
  if (typeof elbow !== 'object' || elbow === null) throw inputError(path || 'elbow', 'must be an object');
  validateSection(elbow.section, field('section'));
  const vanes = optionalBoolean(elbow.vanes, field('vanes')) ?? false;
  const lined = optionalBoolean(elbow.lined, field('lined')) ?? false;
  const radius = optionalBoolean(elbow.radius, field('radius')) ?? elbow.section.shape === 'round';
  if (radius && vanes) throw inputError(field('vanes'), 'applies to square elbows only (radius is true)');
  const rows: readonly ElbowRow[] = radius ? RADIUSED_ELBOW_ROWS : vanes ? VANED_ELBOW_ROWS : SQUARE_ELBOW_ROWS;
  const widthIn = (elbow.section.shape === 'round' ? elbow.section.diameterM : elbow.section.widthM) / INCH_M;
  return bandsHz.map((hz, index) => {
    const fwKhzIn = (requireAbove(hz, 0, `bandsHz[${index}]`) / 1000) * widthIn;
    // ASHRAE Handbook, HVAC Applications, noise chapter: elbow insertion loss by f·w, f in kHz, w in inches (from memory)
    let lossDb = 0;
    for (const row of rows) if (fwKhzIn >= row.fromFwKhzIn) lossDb = lined ? row.linedDb : row.unlinedDb;
    return lossDb;
  });
}
