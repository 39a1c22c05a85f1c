// The NC criterion curve for any NC value, by linear interpolation between the tabulated curves
// (ANSI S12.2 (2008), Table 1; the same interpolation as ncRating), extrapolated beyond NC-15..70.
import { requireFinite } from '../input-error';
import { NC_CURVES } from '../nc-curves';

/** Levels of the NC curve of that rating in the bands 63 Hz to 8 kHz, dB. */
export function ncCriterionCurveDb(rating: number): number[] {
  requireFinite(rating, 'criterionNc');
  let lower = 0;
  while (lower < NC_CURVES.length - 2 && rating > NC_CURVES[lower + 1].rating) lower++;
  const below = NC_CURVES[lower];
  const above = NC_CURVES[lower + 1];
  const fraction = (rating - below.rating) / (above.rating - below.rating);
  return below.levelsDb.map((levelDb, band) => levelDb + fraction * (above.levelsDb[band] - levelDb));
}
