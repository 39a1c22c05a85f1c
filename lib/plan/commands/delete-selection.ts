// Delete the selected nodes and segments. A deleted node takes its segments with it; lone nodes
// and runs left without segments go; a piece cut off from its run's start becomes a run of its own.
import { defineCommand } from './define';
import { EMPTY_SELECTION } from '../editor-state';

export interface DeleteSelectionArgs {
  /** Default: the current selection. */
  readonly nodeIds?: readonly string[];
  readonly segmentIds?: readonly string[];
}

export const deleteSelection = defineCommand('delete-selection', 'Delete the selected points and segments.', (doc, state, args: DeleteSelectionArgs = {}) => {
  const nodeIds = new Set(args.nodeIds ?? state.selection.nodeIds);
  const segmentIds = new Set(args.segmentIds ?? state.selection.segmentIds);
  const nodes = doc.nodes.filter((node) => !nodeIds.has(node.id));
  const segments = doc.segments.filter((segment) => !segmentIds.has(segment.id) && !nodeIds.has(segment.from) && !nodeIds.has(segment.to));
  return { doc: { ...doc, nodes, segments }, state: { ...state, selection: EMPTY_SELECTION } };
});
