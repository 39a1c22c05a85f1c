// The schedule's plan figure, worked out by hand from the fixture's coordinates (common practice, no source).
import { describe, expect, it } from 'vitest';
import { planLabels } from '@/lib/plan/labels';
import { planFigure } from '@/lib/schedules/content';
import { boxEdges, boxesOverlap, lineHitsBox } from '@/lib/schedules/label-place';
import { DEMO_METRES_PER_PIXEL } from '@/lib/plans/demo/recital-plan';
import { demoTreatedPlan } from '../../helpers/demo-schedule';
import { ROOM_PLAN_METRES_PER_PIXEL, roomPlanDocument } from '../plan/room-plan-fixture';

describe('plan figure', () => {
  const revision = { document: roomPlanDocument(), metresPerPixel: ROOM_PLAN_METRES_PER_PIXEL, background: null, extras: {} };

  it('outlines every room at the plan scale: 12 m × 8 m at 20 mm per pixel is 600 × 400 px', () => {
    expect(planFigure(revision, null).rooms).toEqual([{ x: 50, y: 250, widthPx: 600, heightPx: 400, name: 'Recital room' }]);
  });

  it('a blank sheet takes in the rooms as well as the runs, with a 60 px margin', () => {
    const figure = planFigure(revision, null);
    // drawn area x 50…650, y 200…650; the sheet starts at the plan origin or before
    expect({ x: figure.originX, y: figure.originY, w: figure.widthPx, h: figure.heightPx }).toEqual({ x: -60, y: -60, w: 650 + 120, h: 650 + 120 });
    expect(figure.lines).toHaveLength(2);
    // the run by name and letter, each segment by its label and size in mm, the outlet by its end, the room, the first listener
    expect(figure.labels.map((label) => label.text)).toEqual(['Supply to recital room (A)', 'A1 500×300', 'A2 Ø315', 'Recital room', 'outlet A2 end', 'L1']);
  });

  it('a drawing fixes the sheet to its own size', () => {
    const withDrawing = { ...revision, background: { id: 'x', contentType: 'image/png', widthPx: 2000, heightPx: 1500 } };
    const figure = planFigure(withDrawing, { data: Buffer.from([]), format: 'png' });
    expect({ x: figure.originX, y: figure.originY, w: figure.widthPx, h: figure.heightPx }).toEqual({ x: 0, y: 0, w: 2000, h: 1500 });
    expect(figure.rooms).toHaveLength(1);
  });

  it('places every word of the demo plan clear of every duct line and room wall, and of every other word', () => {
    const figure = planFigure({ document: demoTreatedPlan(), metresPerPixel: DEMO_METRES_PER_PIXEL, background: null, extras: {} }, null);
    const walls = figure.rooms.flatMap((room) => boxEdges(room));
    for (const label of figure.labels) {
      for (const line of [...figure.lines, ...walls]) expect(lineHitsBox(line, label), `${label.text} against a line`).toBe(false);
      for (const other of figure.labels) if (other !== label) expect(boxesOverlap(label, other), `${label.text} against ${other.text}`).toBe(false);
    }
    // the chosen lining is tagged on the segment it lines
    const document = demoTreatedPlan();
    const lined = (document.treatments ?? [])[0]?.planChange;
    const segmentId = lined?.kind === 'lining' ? lined.segmentId : '';
    const labels = planLabels(document);
    expect(figure.treatments).toEqual([expect.objectContaining({ tag: 'T1', where: labels.segments[segmentId], drawn: true })]);
    expect(figure.lines.filter((line) => line.treated).map((line) => line.segmentId)).toEqual([segmentId]);
  });
});
