// The mouth of a side branch: where a branch leaves the wall of its host duct, the air in and near the
// opening moves as a mass in series with the branch, so the branch acts as if lengthened by an inner
// length correction t_i. It tunes every side branch (a quarter-wave resonator's length is cut by it).

/** Branch-to-host radius ratios above this are taken at this value (the fit's range ends at equal bores). */
const MAX_RADIUS_RATIO = 1;

/**
 * Inner length correction t_i of a side branch of radius b on a host duct of radius a, m.
 * Dubos, Kergomard, Khettabi, Dalmont, Keefe & Nederveen (1999), Acta Acustica 85, 153, polynomial
 * fit to their modal computation (coefficients from memory): t_i = b (0.82 - 0.193 d - 1.09 d^2 + 1.27 d^3 - 0.71 d^4), d = b / a.
 * As d -> 0 it tends to 0.82 b, the flanged end correction (Norris & Sheng 1989: 0.8216 b).
 */
export function branchMouthCorrectionM(branchRadiusM: number, hostRadiusM: number): number {
  const ratio = Math.min(MAX_RADIUS_RATIO, branchRadiusM / hostRadiusM);
  return branchRadiusM * (0.82 + ratio * (-0.193 + ratio * (-1.09 + ratio * (1.27 - 0.71 * ratio))));
}
