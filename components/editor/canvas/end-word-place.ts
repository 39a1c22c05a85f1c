// Where the words at a duct end go on the canvas (plan pixels of the box's top-left corner), so that
// none of them overlaps another or the duct: the end's name beyond the end along the duct
// (plan-canvas.tsx), the termination's word on the duct's left-hand side, a little behind the end, and
// a room outlet's word on its right-hand side, a little forward. Each box grows away from the end, so it
// never covers the duct or the glyph. Without a direction (an outlet away from its end): right of and above.

/** Offset of a word's nearest corner from the end, screen px: along the duct and across it. */
const ALONG_PX = 4;
const ACROSS_PX = 18;
/** Ducts drawn up to this half width, screen px, need no extra room across (the offset above allows for it). */
const MAX_THIN_HALF_WIDTH_PX = 4.5;
/** Plex Sans is about this wide per character, in ems (an estimate for placing the box). */
const EM_PER_CHARACTER = 0.56;

export type EndWordSide = 'left' | 'right';

/** A word's box width and height on screen, px, as placed here. */
export function endWordSizePx(characters: number, fontPx: number, paddingPx: number): { widthPx: number; heightPx: number } {
  return { widthPx: characters * EM_PER_CHARACTER * fontPx + 2 * paddingPx, heightPx: fontPx * 1.2 + 2 * paddingPx };
}

/** ductHalfWidthPx: half the duct's drawn width on screen, so a wide duct drawn to scale keeps its words off it. */
export function endWordPlace(
  anchor: { x: number; y: number }, awayRad: number | null, side: EndWordSide, characters: number, fontPx: number, paddingPx: number, scale: number, ductHalfWidthPx = 0,
): { x: number; y: number } {
  const marker = 5 / scale;
  if (awayRad === null) return { x: anchor.x + marker * 1.4, y: anchor.y - marker * 3 };
  const { widthPx, heightPx } = endWordSizePx(characters, fontPx, paddingPx);
  const acrossPx = ACROSS_PX + Math.max(0, ductHalfWidthPx - MAX_THIN_HALF_WIDTH_PX);
  // local (u along the duct, v across it, +v to the left when looking out of the end) rotated onto the plan
  const u = side === 'right' ? ALONG_PX : -ALONG_PX;
  const v = side === 'right' ? -acrossPx : acrossPx;
  const dx = u * Math.cos(awayRad) - v * Math.sin(awayRad);
  const dy = u * Math.sin(awayRad) + v * Math.cos(awayRad);
  const x = dx >= 0 ? dx : dx - widthPx;
  const y = dy >= 0 ? dy : dy - heightPx;
  return { x: anchor.x + x / scale, y: anchor.y + y / scale };
}

/** The end's name ("A3 end") is centred at least this far beyond the end, along the duct, screen px. */
export const END_NAME_AWAY_PX = 32;
/** The end's glyphs reach this far from the end point, screen px (a flange is 12.6 px across, anechoic 13.5 px along). */
const GLYPH_REACH_PX = 14;
/** IBM Plex Mono at 12 px: about 7.2 px a character (0.6 em); the box is about 12 px high. */
export const END_NAME_FONT_PX = 12;
const MONO_CHARACTER_PX = 7.2;

/** Top-left corner of the end's name, plan pixels: centred beyond the end, far enough that its box clears the glyph. */
export function endNamePlace(anchor: { x: number; y: number }, awayRad: number, characters: number, scale: number, ductHalfWidthPx = 0): { x: number; y: number } {
  // a glyph drawn for a wide duct reaches 1.5 × (half width + 3 px) along it (termination-glyph.tsx)
  const reachPx = Math.max(GLYPH_REACH_PX, 1.5 * (ductHalfWidthPx + 3));
  const halfWidthPx = (characters * MONO_CHARACTER_PX) / 2;
  const halfHeightPx = END_NAME_FONT_PX / 2;
  // the box's half extent along the duct's direction
  const extentPx = halfWidthPx * Math.abs(Math.cos(awayRad)) + halfHeightPx * Math.abs(Math.sin(awayRad));
  const awayPx = Math.max(END_NAME_AWAY_PX, reachPx + extentPx) / scale;
  return {
    x: anchor.x + Math.cos(awayRad) * awayPx - halfWidthPx / scale,
    y: anchor.y + Math.sin(awayRad) * awayPx - halfHeightPx / scale,
  };
}
