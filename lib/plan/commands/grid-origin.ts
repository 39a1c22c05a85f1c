// Where the drawing grid starts: a chosen point (a column line, a wall corner on the drawing), so
// snapped points land on the drawing's own lines instead of a grid from the image's corner.
import type { Point } from '../geometry/point';
import { planCoordinateSchema } from '../schema-parts';
import { checked, defineCommand } from './define';

export interface SetGridOriginArgs {
  /** The new origin, plan pixels; null puts the grid back at the drawing's corner. */
  readonly origin: Point | null;
}

export const setGridOrigin = defineCommand('set-grid-origin', 'Start the drawing grid at a point', (doc, state, { origin }: SetGridOriginArgs) => {
  if (origin === null) {
    const { gridOrigin: _dropped, ...rest } = doc;
    return { doc: rest, state };
  }
  const x = checked(planCoordinateSchema('x'), origin.x, 'Grid origin');
  const y = checked(planCoordinateSchema('y'), origin.y, 'Grid origin');
  return { doc: { ...doc, gridOrigin: { x, y } }, state };
});
