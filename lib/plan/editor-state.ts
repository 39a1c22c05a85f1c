// What the editor holds beside the document: the selection and the run being worked on.

export interface Selection {
  readonly nodeIds: readonly string[];
  readonly segmentIds: readonly string[];
}

export interface EditorState {
  readonly selection: Selection;
  readonly activeRunId: string | null;
}

export const EMPTY_SELECTION: Selection = { nodeIds: [], segmentIds: [] };

export function initialEditorState(): EditorState {
  return { selection: EMPTY_SELECTION, activeRunId: null };
}
