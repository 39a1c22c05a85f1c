// The words at a duct end (its name, its termination, a room outlet) never overlap one another, nor the
// duct and its glyph, whichever way the duct points. Boxes in screen pixels at scale 1, sized as the
// canvas draws them (product layout rule; no outside source).
import { describe, expect, it } from 'vitest';
import { endNamePlace, endWordPlace, END_NAME_FONT_PX } from '@/components/editor/canvas/end-word-place';

interface Box { x: number; y: number; width: number; height: number }
const overlaps = (a: Box, b: Box) => a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height;
const end = { x: 0, y: 0 };

/** The glyph reaches at most 13.5 px from the end (a flange is 2 × 12.6 px across, the anechoic wedge 13.5 px along). */
const GLYPH_RADIUS_PX = 13.5;
const clearsGlyph = (box: Box) => Math.hypot(Math.max(box.x, Math.min(0, box.x + box.width)), Math.max(box.y, Math.min(0, box.y + box.height))) >= GLYPH_RADIUS_PX;

/** The last 60 px of duct behind the end, as boxes 9.2 px wide (the widest duct line is 9 px). */
function duct(awayRad: number): Box[] {
  return [-10, -20, -30, -40, -50, -60].map((u) => ({ x: u * Math.cos(awayRad) - 4.6, y: u * Math.sin(awayRad) - 4.6, width: 9.2, height: 9.2 }));
}

describe('words at a duct end', () => {
  for (let degrees = 0; degrees < 360; degrees += 15) {
    it(`pointing ${degrees}°: name, termination word and outlet word stand apart and off the duct`, () => {
      const awayRad = (degrees * Math.PI) / 180;
      const nameAt = endNamePlace(end, awayRad, 'A12 end'.length, 1);
      const name: Box = { ...nameAt, width: 7 * 0.6 * END_NAME_FONT_PX, height: END_NAME_FONT_PX };
      const terminationAt = endWordPlace(end, awayRad, 'left', 'open, flanged'.length, 12, 0, 1);
      const termination: Box = { ...terminationAt, width: 13 * 0.56 * 12, height: 12 * 1.2 };
      const outletAt = endWordPlace(end, awayRad, 'right', 'outlet 2'.length, 11, 1.5, 1);
      const outlet: Box = { ...outletAt, width: 8 * 0.56 * 11 + 3, height: 11 * 1.2 + 3 };
      expect(overlaps(name, termination)).toBe(false);
      expect(overlaps(name, outlet)).toBe(false);
      expect(overlaps(termination, outlet)).toBe(false);
      for (const word of [name, termination, outlet]) {
        expect(clearsGlyph(word)).toBe(true);
        for (const box of duct(awayRad)) expect(overlaps(word, box)).toBe(false);
      }
    });
  }
});
