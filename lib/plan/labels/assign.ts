// Stable names for a plan's pieces: each run keeps a letter (A, B, … Z, AA, …) and each segment a
// number within its run. Both are kept through edits; a new segment takes the next free number of
// its run, a split's second half likewise, and numbers change only by the renumber command.
import type { PlanDocument, PlanRun, PlanSegment } from '../document';
import { buildAdjacency, componentOf, type Adjacency } from '../graph';

/** A, B, … Z, AA, AB, …: spreadsheet-style letters for the 1-based index. */
export function runLetterFor(index: number): string {
  let letters = '';
  for (let rest = index; rest > 0; rest = Math.floor((rest - 1) / 26)) {
    letters = String.fromCharCode(65 + ((rest - 1) % 26)) + letters;
  }
  return letters;
}

function lettersFor(runs: readonly PlanRun[]): Map<string, string> {
  const letters = new Map<string, string>();
  const taken = new Set<string>();
  for (const run of runs) {
    if (run.letter && !taken.has(run.letter)) {
      letters.set(run.id, run.letter);
      taken.add(run.letter);
    }
  }
  let next = 1;
  for (const run of runs) {
    if (letters.has(run.id)) continue;
    while (taken.has(runLetterFor(next))) next += 1;
    const letter = runLetterFor(next);
    letters.set(run.id, letter);
    taken.add(letter);
  }
  return letters;
}

/** Segment numbers of one run: kept where unique, else the next free number, in document order. */
function numbersFor(segments: readonly PlanSegment[]): Map<string, number> {
  const numbers = new Map<string, number>();
  const taken = new Set<number>();
  for (const segment of segments) {
    const number = segment.number;
    if (number !== undefined && Number.isInteger(number) && number > 0 && !taken.has(number)) {
      numbers.set(segment.id, number);
      taken.add(number);
    }
  }
  let highest = Math.max(0, ...taken);
  for (const segment of segments) {
    if (numbers.has(segment.id)) continue;
    highest += 1;
    numbers.set(segment.id, highest);
  }
  return numbers;
}

function segmentsOfRun(doc: PlanDocument, adjacency: Adjacency, run: PlanRun): PlanSegment[] {
  if (!adjacency.has(run.startNodeId)) return [];
  const { segmentIds } = componentOf(adjacency, run.startNodeId);
  return doc.segments.filter((segment) => segmentIds.has(segment.id));
}

/** The document with every run lettered and every segment of a run numbered; the same document when nothing changes. */
export function assignLabels(doc: PlanDocument): PlanDocument {
  const letters = lettersFor(doc.runs);
  const adjacency = buildAdjacency(doc);
  const numbers = new Map<string, number>();
  for (const run of doc.runs) numbersFor(segmentsOfRun(doc, adjacency, run)).forEach((number, id) => numbers.set(id, number));
  const runsChanged = doc.runs.some((run) => run.letter !== letters.get(run.id));
  const segmentsChanged = doc.segments.some((segment) => numbers.has(segment.id) && segment.number !== numbers.get(segment.id));
  if (!runsChanged && !segmentsChanged) return doc;
  return {
    ...doc,
    runs: runsChanged ? doc.runs.map((run) => (run.letter === letters.get(run.id) ? run : { ...run, letter: letters.get(run.id) })) : doc.runs,
    segments: segmentsChanged
      ? doc.segments.map((segment) => {
          const number = numbers.get(segment.id);
          return number === undefined || number === segment.number ? segment : { ...segment, number };
        })
      : doc.segments,
  };
}
