import { describe, expect, it } from 'vitest';
import { normaliseDxf } from '@/lib/dxf/normalise';
import { DxfError } from '@/lib/dxf/errors';
import { MAX_DXF_ENTITIES } from '@/lib/dxf/limits';
import { sampleDxf, sampleFloorPlan, type SampleEntity } from '../../helpers/dxf-sample';

// Plan pixels are rounded to 0.01 px when stored and the extents to whole pixels.
const PIXEL_ROUNDING = 0.01;
const trueWidthM = (drawing: { widthPx: number; metresPerPixel: number | null }) => drawing.widthPx * drawing.metresPerPixel!;

function refusal(run: () => unknown): DxfError {
  try {
    run();
  } catch (error) {
    if (error instanceof DxfError) return error;
    throw error;
  }
  throw new Error('expected a refusal');
}

describe('normaliseDxf: true size from $INSUNITS', () => {
  // $INSUNITS 6 = metres, 4 = millimetres, 2 = feet, 0 = unitless (AutoCAD DXF Reference, HEADER section).
  it('lands the same invented 24 m × 12 m floor, written in metres and in millimetres, at the same true size', () => {
    const inMetres = normaliseDxf(sampleFloorPlan('m'), 'floor-m.dxf');
    const inMillimetres = normaliseDxf(sampleFloorPlan('mm'), 'floor-mm.dxf');
    expect(inMetres.unitsName).toBe('metres');
    expect(inMillimetres.unitsName).toBe('millimetres');
    expect(inMillimetres.metresPerPixel).toBe(inMetres.metresPerPixel);
    expect(inMillimetres.widthPx).toBe(inMetres.widthPx);
    expect(inMillimetres.heightPx).toBe(inMetres.heightPx);
    expect(inMillimetres.layers).toEqual(inMetres.layers);
    // The column grid runs from x = 0 to 24 m and y = −1 to 13 m: 24 m × 14 m, to within one pixel.
    expect(Math.abs(trueWidthM(inMetres) - 24)).toBeLessThanOrEqual(inMetres.metresPerPixel!);
    expect(Math.abs(inMetres.heightPx * inMetres.metresPerPixel! - 14)).toBeLessThanOrEqual(inMetres.metresPerPixel!);
  });

  it('places a wall 24 m long at 24 m on the plan whatever the units (metres, millimetres, feet: 1 ft = 0.3048 m exactly)', () => {
    const wall: SampleEntity[] = [{ kind: 'line', layer: 'Walls', from: [0, 0], to: [24, 0] }, { kind: 'line', layer: 'Walls', from: [0, 0], to: [0, 6] }];
    for (const units of ['m', 'mm', 'ft'] as const) {
      const drawing = normaliseDxf(sampleDxf({ units, entities: wall }), `wall-${units}.dxf`);
      const [path] = drawing.layers[0]!.paths;
      const lengthM = Math.hypot(path![2]! - path![0]!, path![3]! - path![1]!) * drawing.metresPerPixel!;
      expect(Math.abs(lengthM - 24), units).toBeLessThanOrEqual(PIXEL_ROUNDING * drawing.metresPerPixel! * 2);
    }
  });

  it('leaves the scale to be set by two points when the file states no units ($INSUNITS 0)', () => {
    const drawing = normaliseDxf(sampleFloorPlan('none'), 'floor.dxf');
    expect(drawing.metresPerPixel).toBeNull();
    expect(drawing.unitsName).toBeNull();
    expect(drawing.widthPx).toBeGreaterThan(0);
  });

  it('puts the drawing’s top-left at (0, 0) with y down (DXF y runs up)', () => {
    const drawing = normaliseDxf(sampleDxf({ units: 'm', entities: [{ kind: 'line', layer: 'A', from: [10, 20], to: [14, 23] }] }), 'a.dxf');
    const [path] = drawing.layers[0]!.paths;
    // (10, 20) is the bottom-left corner of the 4 m × 3 m extents; (14, 23) the top-right.
    expect(path![0]).toBe(0);
    expect(path![1]).toBeCloseTo(drawing.heightPx, 0);
    expect(path![2]).toBeCloseTo(drawing.widthPx, 0);
    expect(path![3]).toBe(0);
  });
});

describe('normaliseDxf: layers and shapes', () => {
  it('lists every layer that has something drawn, sorted, and marks the ones off in the file', () => {
    const drawing = normaliseDxf(sampleFloorPlan('mm'), 'floor.dxf');
    expect(drawing.layers.map((layer) => [layer.name, layer.offInFile])).toEqual([['Column grid', true], ['Doors', false], ['Walls', false]]);
    // Walls: the outline and four partition lines; the text is not drawn. Doors: a leaf and a swing each.
    expect(drawing.layers.find((layer) => layer.name === 'Walls')!.paths).toHaveLength(4);
    expect(drawing.layers.find((layer) => layer.name === 'Doors')!.paths).toHaveLength(6);
    expect(drawing.entityCount).toBe(4 + 6 + 5);
  });

  it('draws an arc on its circle, from its start angle to its end angle counter-clockwise', () => {
    const drawing = normaliseDxf(sampleDxf({ units: 'm', entities: [
      { kind: 'arc', layer: 'A', center: [5, 5], radiusM: 2, startDeg: 0, endDeg: 90 },
      { kind: 'line', layer: 'B', from: [0, 0], to: [10, 10] },
    ] }), 'arc.dxf');
    const mpp = drawing.metresPerPixel!;
    const arc = drawing.layers.find((layer) => layer.name === 'A')!.paths[0]!;
    // In plan pixels the centre (5 m, 5 m) is at (5, 10 − 5) m from the top-left.
    const centre = { x: 5 / mpp, y: 5 / mpp };
    for (let index = 0; index < arc.length; index += 2) {
      // every point on a circle of radius r about its centre (definition of the circle)
      expect(Math.hypot(arc[index]! - centre.x, arc[index + 1]! - centre.y) * mpp).toBeCloseTo(2, 3);
    }
    // starts at angle 0 (east), ends at 90° (north, i.e. up on the plan)
    expect([arc[0]! * mpp, arc[1]! * mpp]).toEqual([expect.closeTo(7, 3), expect.closeTo(5, 3)]);
    expect([arc.at(-2)! * mpp, arc.at(-1)! * mpp]).toEqual([expect.closeTo(5, 3), expect.closeTo(3, 3)]);
  });

  it('turns a polyline bulge of 1 into a half circle (bulge = tan(θ/4), AutoCAD DXF Reference, LWPOLYLINE group 42)', () => {
    const drawing = normaliseDxf(sampleDxf({ units: 'm', entities: [
      { kind: 'polyline', layer: 'A', points: [[0, 0], [4, 0]], bulges: [1] },
      { kind: 'line', layer: 'B', from: [0, -3], to: [4, 3] },
    ] }), 'bulge.dxf');
    const mpp = drawing.metresPerPixel!;
    const path = drawing.layers.find((layer) => layer.name === 'A')!.paths[0]!;
    const top = 3 / mpp; // y = 0 m is 3 m below the top edge
    let furthestM = 0;
    for (let index = 0; index < path.length; index += 2) {
      const radiusM = Math.hypot(path[index]! * mpp - 2, path[index + 1]! * mpp - top * mpp);
      expect(radiusM).toBeCloseTo(2, 2);
      furthestM = Math.max(furthestM, Math.abs(path[index + 1]! - top) * mpp);
    }
    // a positive bulge turns counter-clockwise from (0,0) to (4,0): the arc dips below the chord to y = −2 m
    expect(furthestM).toBeCloseTo(2, 2);
    expect(Math.max(...path.filter((_, index) => index % 2 === 1))).toBeGreaterThan(top);
  });

  it('draws a block where its INSERT puts it: moved, turned and scaled, on the INSERT’s layer for content on layer 0', () => {
    const drawing = normaliseDxf(sampleDxf({
      units: 'm',
      blocks: [{ name: 'Grille', entities: [{ kind: 'line', layer: '0', from: [0, 0], to: [1, 0] }] }],
      entities: [
        { kind: 'insert', layer: 'Outlets', block: 'Grille', at: [10, 0], rotationDeg: 90, scale: 2 },
        { kind: 'line', layer: 'Walls', from: [0, 0], to: [20, 0] },
      ],
    }), 'insert.dxf');
    const mpp = drawing.metresPerPixel!;
    const outlet = drawing.layers.find((layer) => layer.name === 'Outlets')!.paths[0]!;
    // (0,0)–(1,0) scaled ×2 and turned 90° counter-clockwise about the base point, then moved to (10, 0): (10,0)–(10,2)
    const topM = drawing.heightPx * mpp;
    expect(outlet.map((value) => value * mpp)).toEqual([expect.closeTo(10, 2), expect.closeTo(topM, 2), expect.closeTo(10, 2), expect.closeTo(topM - 2, 2)]);
  });
});

describe('normaliseDxf: refusals', () => {
  it('refuses a DXF with only words in it, naming what it found', () => {
    const error = refusal(() => normaliseDxf(sampleDxf({ units: 'mm', entities: [{ kind: 'text', layer: 'Notes', at: [0, 0], text: 'nothing else' }] }), 'words.dxf'));
    expect(error.reason).toBe('nothing_drawable');
    expect(error.message).toContain('“words.dxf” has no lines, polylines, arcs or circles');
    expect(error.message).toContain('TEXT');
  });

  it(`refuses more than ${MAX_DXF_ENTITIES} entities, counting each insertion of a block`, () => {
    const block = { name: 'Hundred', entities: Array.from({ length: 100 }, (_, index): SampleEntity => ({ kind: 'line', layer: '0', from: [index, 0], to: [index, 1] })) };
    const inserts = Array.from({ length: MAX_DXF_ENTITIES / 100 + 1 }, (_, index): SampleEntity => ({ kind: 'insert', layer: 'A', block: 'Hundred', at: [0, index * 2] }));
    const error = refusal(() => normaliseDxf(sampleDxf({ units: 'mm', blocks: [block], entities: inserts }), 'huge.dxf'));
    expect(error.reason).toBe('too_many_entities');
    expect(error.message).toContain('more than 100,000');
  });

  it('refuses text cut off before its end as damaged', () => {
    const cut = sampleFloorPlan('mm').split('\n').slice(0, 40).join('\n');
    expect(refusal(() => normaliseDxf(cut, 'cut.dxf')).reason).toMatch(/damaged|nothing_drawable/);
  });
});
