// The scale bar printed under the plan: a round length (1, 2 or 5 × 10^n m) near a fifth of the
// width shown, split into four equal divisions.

const STEPS = [1, 2, 5];

export interface ScaleBar {
  lengthM: number;
  divisions: number;
  label: string;
}

/** The largest round length not over a fifth of the width shown (at least one step below it). */
export function scaleBarFor(widthShownM: number): ScaleBar {
  const target = widthShownM / 5;
  const decade = 10 ** Math.floor(Math.log10(target));
  let lengthM = decade;
  for (const step of STEPS) if (step * decade <= target) lengthM = step * decade;
  const label = lengthM >= 1 ? `${Number(lengthM.toPrecision(3))} m` : `${Number((lengthM * 1000).toPrecision(3))} mm`;
  return { lengthM, divisions: 4, label };
}
