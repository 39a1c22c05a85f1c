// The standing-wave pressure envelope |p(x)| / |p|max of a resonance along the run, drawn from
// the computed pressure nodes and antinodes: between a node and the next antinode |p|
// follows a quarter cosine (plane standing wave, Kinsler & Frey, Fundamentals of Acoustics,
// ch. 10); beyond the outermost extremum the quarter wavelength c / 4f sets the spacing.
export interface Extremum { positionM: number; isAntinode: boolean }

export function extremaOf(antinodesM: number[], nodesM: number[]): Extremum[] {
  return [
    ...antinodesM.map((positionM) => ({ positionM, isAntinode: true })),
    ...nodesM.map((positionM) => ({ positionM, isAntinode: false })),
  ].sort((a, b) => a.positionM - b.positionM);
}

function quarterShape(distanceFromExtremumM: number, spanM: number, fromAntinode: boolean): number {
  const phase = (Math.PI / 2) * Math.min(1, Math.abs(distanceFromExtremumM) / spanM);
  return fromAntinode ? Math.abs(Math.cos(phase)) : Math.abs(Math.sin(phase));
}

export function envelopeAt(positionM: number, extrema: Extremum[], quarterWavelengthM: number): number {
  if (extrema.length === 0) return 1;
  let index = extrema.findIndex((extremum) => extremum.positionM >= positionM);
  if (index === -1) index = extrema.length;
  const before = extrema[index - 1];
  const after = extrema[index];
  if (before && after && before.isAntinode !== after.isAntinode) {
    const spanM = after.positionM - before.positionM;
    return quarterShape(positionM - before.positionM, spanM > 0 ? spanM : quarterWavelengthM, before.isAntinode);
  }
  const nearest = before && (!after || positionM - before.positionM <= after.positionM - positionM) ? before : after;
  const distanceM = positionM - nearest.positionM;
  const cycles = Math.abs(distanceM) / quarterWavelengthM;
  const phase = (Math.PI / 2) * cycles;
  return nearest.isAntinode ? Math.abs(Math.cos(phase)) : Math.abs(Math.sin(phase));
}
