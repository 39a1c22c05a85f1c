// Doubling growth for the Float64Array buffers of the resonance search and the envelope sampler.

/** A copy of values with twice the capacity. */
export function doubled(values: Float64Array): Float64Array<ArrayBuffer> {
  const grown = new Float64Array(2 * Math.max(1, values.length));
  grown.set(values);
  return grown;
}
