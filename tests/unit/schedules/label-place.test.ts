// Placing the figure's words clear of lines: boxes and segments worked by hand (common practice, no source).
import { describe, expect, it } from 'vitest';
import { boxesOverlap, lineHitsBox, placeBox, type Obstacles } from '@/lib/schedules/label-place';

const box = { x: 10, y: 10, widthPx: 20, heightPx: 10 };

describe('label placement', () => {
  it('a line crossing a box, ending inside it or lying along its edge hits it; one passing by does not', () => {
    expect(lineHitsBox({ x1: 0, y1: 15, x2: 100, y2: 15 }, box)).toBe(true);
    expect(lineHitsBox({ x1: 15, y1: 12, x2: 15, y2: 100 }, box)).toBe(true);
    expect(lineHitsBox({ x1: 0, y1: 10, x2: 100, y2: 10 }, box)).toBe(true);
    expect(lineHitsBox({ x1: 0, y1: 25, x2: 100, y2: 25 }, box)).toBe(false);
    // a diagonal that passes the corner (30, 10) on the outside: y = x − 25 is at y = 5 when x = 30
    expect(lineHitsBox({ x1: 25, y1: 0, x2: 60, y2: 35 }, box)).toBe(false);
  });

  it('boxes that share only an edge do not overlap', () => {
    expect(boxesOverlap(box, { x: 30, y: 10, widthPx: 5, heightPx: 5 })).toBe(false);
    expect(boxesOverlap(box, { x: 29, y: 10, widthPx: 5, heightPx: 5 })).toBe(true);
  });

  it('takes the first candidate clear of every line and placed box, and keeps it as an obstacle', () => {
    const obstacles: Obstacles = { lines: [{ x1: 0, y1: 15, x2: 100, y2: 15 }], boxes: [], bounds: { x: 0, y: 0, widthPx: 100, heightPx: 100 } };
    const struck = { x: 10, y: 10, widthPx: 20, heightPx: 10 };
    const below = { x: 10, y: 20, widthPx: 20, heightPx: 10 };
    expect(placeBox([struck, below], obstacles)).toEqual(below);
    // the same place is now taken: a second word goes further down
    const further = { x: 10, y: 40, widthPx: 20, heightPx: 10 };
    expect(placeBox([below, further], obstacles)).toEqual(further);
  });

  it('when every candidate touches something, takes the one that touches least, never one off the sheet', () => {
    const obstacles: Obstacles = { lines: [{ x1: 0, y1: 15, x2: 100, y2: 15 }, { x1: 15, y1: 0, x2: 15, y2: 100 }], boxes: [], bounds: { x: 0, y: 0, widthPx: 100, heightPx: 100 } };
    const offSheet = { x: -50, y: 50, widthPx: 20, heightPx: 10 };
    const twoLines = { x: 10, y: 10, widthPx: 20, heightPx: 10 };
    const oneLine = { x: 50, y: 10, widthPx: 20, heightPx: 10 };
    expect(placeBox([offSheet, twoLines, oneLine], obstacles)).toEqual(oneLine);
  });
});
