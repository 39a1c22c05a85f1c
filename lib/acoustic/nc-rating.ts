// Noise criterion rating of an octave-band spectrum by tangency.
import { inputError, requireFinite } from './input-error';
import { NC_CURVES } from './nc-curves';

const BAND_COUNT = 8;

/** The (fractional) NC curve that passes through levelDb in one band: linear between tabulated curves, extrapolated beyond them. */
function bandRating(bandIndex: number, levelDb: number): number {
  let lower = 0;
  while (lower < NC_CURVES.length - 2 && levelDb > NC_CURVES[lower + 1].levelsDb[bandIndex]) lower++;
  const below = NC_CURVES[lower];
  const above = NC_CURVES[lower + 1];
  const fraction = (levelDb - below.levelsDb[bandIndex]) / (above.levelsDb[bandIndex] - below.levelsDb[bandIndex]);
  return below.rating + fraction * (above.rating - below.rating);
}

/**
 * NC rating of levels in the bands 63, 125, 250, 500, 1k, 2k, 4k, 8k Hz: the highest curve touched
 * by the spectrum (tangency, ANSI S12.2 (2008), Annex), interpolating linearly between the tabulated
 * curves, rounded to a whole number. Below NC-15 and above NC-70 the nearest two curves are extrapolated.
 */
export function ncRating(octaveDb: number[]): number {
  if (!Array.isArray(octaveDb) || octaveDb.length !== BAND_COUNT) throw inputError('octaveDb', `must have ${BAND_COUNT} bands`);
  let rating = -Infinity;
  octaveDb.forEach((levelDb, bandIndex) => {
    rating = Math.max(rating, bandRating(bandIndex, requireFinite(levelDb, `octaveDb[${bandIndex}]`)));
  });
  return Math.round(rating + 1e-9);
}
