// Reading published tables between their entries: straight-line interpolation against the logarithm
// of the axis (size, frequency), held at the end values outside the tabulated range.

/** Where x falls on an ascending axis: the entry below it and the fraction of the way to the next (0 and 1 at the ends). */
function logAxisPosition(axis: readonly number[], x: number): { lower: number; fraction: number } {
  if (x <= axis[0]) return { lower: 0, fraction: 0 };
  const last = axis.length - 1;
  if (x >= axis[last]) return { lower: Math.max(last - 1, 0), fraction: last === 0 ? 0 : 1 };
  let lower = 0;
  while (x > axis[lower + 1]) lower++;
  return { lower, fraction: Math.log(x / axis[lower]) / Math.log(axis[lower + 1] / axis[lower]) };
}

/** values[i] belongs to axis[i] (ascending, > 0): the value at x, interpolated in log x, clamped to the ends. */
export function interpolateLogAxis(axis: readonly number[], values: readonly number[], x: number): number {
  const { lower, fraction } = logAxisPosition(axis, x);
  if (fraction === 0) return values[lower];
  return values[lower] + fraction * (values[lower + 1] - values[lower]);
}

/** rows[r][c] belongs to rowAxis[r] and columnAxis[c]: bilinear in log row and log column, clamped to the table's edges. */
export function interpolateLogTable(
  rowAxis: readonly number[],
  columnAxis: readonly number[],
  rows: ReadonlyArray<readonly number[]>,
  rowX: number,
  columnX: number,
): number {
  const { lower, fraction } = logAxisPosition(rowAxis, rowX);
  const below = interpolateLogAxis(columnAxis, rows[lower], columnX);
  if (fraction === 0) return below;
  const above = interpolateLogAxis(columnAxis, rows[lower + 1], columnX);
  return below + fraction * (above - below);
}
