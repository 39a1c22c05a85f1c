// Where a comment pin is, in plan units and by the nearest labelled element. Expected values are
// worked by hand from the demo plan's coordinates (0.02 m a pixel) and 1 in = 25.4 mm exactly
// (the international inch, 1959).
import { describe, expect, it } from 'vitest';
import { describePinPlace } from '@/lib/comments/pin-place';
import { planLabels } from '@/lib/plan/labels';
import { DEMO_METRES_PER_PIXEL, demoRecitalPlan } from '@/lib/plans/demo/recital-plan';

const document = demoRecitalPlan({ blades: 10, rpm: 605 });
const labels = planLabels(document);
const si = { document, metresPerPixel: DEMO_METRES_PER_PIXEL, unitSystem: 'si' as const };

describe('describePinPlace', () => {
  it('names the end, tee or joint within half a metre, with the distance from it', () => {
    // riser-foot is at (120, 380); 10 px below it is 0.20 m away
    expect(describePinPlace({ x: 120, y: 390 }, si).near).toBe(`0.20 m from ${labels.nodes['riser-foot']}`);
    expect(describePinPlace({ x: 520, y: 470 }, si).near).toBe(`at ${labels.nodes['recital-outlet']}`);
  });

  it('places a pin beside a segment by how far along it it is from the segment’s first end', () => {
    // corridor-main runs from (120, 380) to (520, 380): 30 px (0.6 m) off its middle is 200 px = 4.00 m along
    expect(describePinPlace({ x: 320, y: 410 }, si).near).toBe(`4.00 m along ${labels.segments['corridor-main']} from ${labels.nodes['riser-foot']}`);
  });

  it('falls back to the room, and always gives the place from the plan’s top-left corner', () => {
    const place = describePinPlace({ x: 900, y: 800 }, si);
    expect(place).toEqual({ near: 'in Recital room', position: '18.00 m from the plan\'s left, 16.00 m from its top' });
    expect(describePinPlace({ x: 2000, y: 50 }, si).near).toBeNull();
  });

  it('speaks feet and inches to the nearest quarter inch for an imperial reader', () => {
    // 18 m = 708.66 in = 59 ft 0 3/4 in; 16 m = 629.92 in = 52 ft 6 in (nearest 1/4 in)
    expect(describePinPlace({ x: 900, y: 800 }, { ...si, unitSystem: 'imperial' }).position).toBe('59 ft 0 3/4 in from the plan\'s left, 52 ft 6 in from its top');
  });
});
