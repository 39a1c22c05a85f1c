// Where an outlet's word goes on the canvas (plan pixels of its top-left corner). At its duct end the
// end's name sits beyond the end along the duct and the termination's word on the duct's left-hand
// side (termination-glyph.tsx), so the outlet's word goes to the right-hand side, a little forward,
// with the box grown away from the outlet so it never covers the square. Elsewhere: right of and above it.

/** Offset of the word's nearest corner from the outlet, screen px: forward along the duct and to its right-hand side. */
const FORWARD_PX = 4;
const SIDE_PX = 18;
/** Plex Sans is about this wide per character, in ems (an estimate for placing the box). */
const EM_PER_CHARACTER = 0.56;

export function outletWordPlace(outlet: { x: number; y: number }, awayRad: number | null, characters: number, fontPx: number, paddingPx: number, scale: number): { x: number; y: number } {
  const marker = 5 / scale;
  if (awayRad === null) return { x: outlet.x + marker * 1.4, y: outlet.y - marker * 3 };
  const widthPx = characters * EM_PER_CHARACTER * fontPx + 2 * paddingPx;
  const heightPx = fontPx * 1.2 + 2 * paddingPx;
  // local (u along the duct, v across it; the glyph's word is at +v) rotated onto the plan
  const u = FORWARD_PX;
  const v = -SIDE_PX;
  const dx = u * Math.cos(awayRad) - v * Math.sin(awayRad);
  const dy = u * Math.sin(awayRad) + v * Math.cos(awayRad);
  const x = dx >= 0 ? dx : dx - widthPx;
  const y = dy >= 0 ? dy : dy - heightPx;
  return { x: outlet.x + x / scale, y: outlet.y + y / scale };
}
