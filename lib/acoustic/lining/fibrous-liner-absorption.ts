// Sound absorption coefficients of glass-fibre duct liner by thickness, per octave band.
import { inputError, requireAbove } from '../input-error';
import { interpolateLogAxis } from '../tables/log-axis-table';

/**
 * Random-incidence absorption of glass-fibre duct liner about 24 to 32 kg/m³, laid on the sheet metal
 * (reverberation-room tests to ASTM C423, mounting type A), 125 Hz to 4 kHz: values typical of the
 * published test data for 25 mm and 50 mm liner, written from memory (not checked against a stored
 * table). Test results above 1 are written as 1. The test method stops at 125 Hz and 4 kHz: 8 kHz takes
 * the 4 kHz value; below 125 Hz the absorption falls in proportion to frequency (a porous layer much
 * thinner than a quarter wavelength; common practice, no source), so 63 Hz takes about half the 125 Hz
 * value rather than all of it, which would credit the liner with several dB it does not give there.
 */
export const LINER_BANDS_HZ: readonly number[] = [125, 250, 500, 1000, 2000, 4000];
export const LINER_THICKNESSES_M: readonly number[] = [0.025, 0.05];
export const LINER_ABSORPTION: ReadonlyArray<readonly number[]> = [
  [0.08, 0.3, 0.64, 0.88, 0.96, 0.98], // 25 mm
  [0.25, 0.76, 1, 1, 1, 1], //            50 mm
];

/**
 * Absorption coefficient of fibrous liner of thickness thicknessM in each band. Between 25 and 50 mm the
 * two rows are mixed in proportion to the thickness (straight line in thickness). Above 50 mm the 50 mm
 * row holds (an underestimate: thicker liner absorbs more at low frequency). Below 25 mm the 25 mm row is
 * scaled by thickness / 25 mm: a porous layer much thinner than a quarter wavelength absorbs roughly in
 * proportion to its thickness (common practice, no source); at high frequency this understates a thin
 * liner, so the predicted attenuation errs low, the safe side.
 */
export function fibrousLinerAbsorption(thicknessM: number, bandsHz: readonly number[], path = 'thicknessM'): number[] {
  requireAbove(thicknessM, 0, path);
  if (!Array.isArray(bandsHz)) throw inputError('bandsHz', 'must be an array');
  const [thinM, thickM] = LINER_THICKNESSES_M;
  return bandsHz.map((hz, index) => {
    requireAbove(hz, 0, `bandsHz[${index}]`);
    const belowTests = Math.min(1, hz / LINER_BANDS_HZ[0]);
    const thin = interpolateLogAxis(LINER_BANDS_HZ, LINER_ABSORPTION[0], hz);
    if (thicknessM <= thinM) return belowTests * thin * (thicknessM / thinM);
    const thick = interpolateLogAxis(LINER_BANDS_HZ, LINER_ABSORPTION[1], hz);
    if (thicknessM >= thickM) return belowTests * thick;
    return belowTests * (thin + ((thicknessM - thinM) / (thickM - thinM)) * (thick - thin));
  });
}
