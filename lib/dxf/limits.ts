// How much of a DXF drawing the plan takes: bounded so a file cannot cost the server or the browser
// without end. (Common practice, no source: a detailed floor plan holds some tens of thousands of entities.)

/** Entities drawn, counting each entity of an inserted block once per insertion. */
export const MAX_DXF_ENTITIES = 100_000;
/** Points after arcs, circles and ellipses are drawn as short straight pieces. */
export const MAX_DXF_POINTS = 2_000_000;
/** Blocks inside blocks inside blocks …: deeper insertions are left out. */
export const MAX_BLOCK_DEPTH = 8;
/** The drawing's longest side on the plan, px: the same bound as a stored image's (MAX_STORED_SIDE_PX). */
export const DXF_TARGET_SIDE_PX = 6000;
