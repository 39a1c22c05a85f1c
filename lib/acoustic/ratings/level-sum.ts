// Adding levels in decibels: the sum of the energies they stand for.
import { inputError, requireFinite } from '../input-error';

/** 10 log10(Σ 10^(L/10)), dB. Refuses an empty list (the sum of no energies has no level). */
export function sumLevelsDb(levelsDb: number[]): number {
  if (!Array.isArray(levelsDb) || levelsDb.length === 0) throw inputError('levelsDb', 'must be a non-empty array');
  // Definition of the decibel (ISO 80000-8): levels of incoherent sources add as 10 log10 Σ 10^(L_i/10)
  const loudestDb = Math.max(...levelsDb.map((levelDb, index) => requireFinite(levelDb, `levelsDb[${index}]`)));
  // Factoring out the loudest level keeps 10^(L/10) within floating-point range for any finite input
  const energy = levelsDb.reduce((sum, levelDb) => sum + 10 ** ((levelDb - loudestDb) / 10), 0);
  return loudestDb + 10 * Math.log10(energy);
}
