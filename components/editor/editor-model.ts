// The editor's state outside React: the document history, selection, scale and save state,
// changed only through `editorReducer`. Commands come from lib/plan and stay pure. A plan the
// person may not change refuses every edit here, whichever tool, key or panel asked for it.
import {
  canRedo, canUndo, createHistory, initialEditorState, normalizeState, placeOutletsAtEnds, push, redo, tryCommand, undo,
  type CommandArgs, type CommandName, type EditorState, type History, type PlanDocument,
} from '@/lib/plan';

export type SaveStatus = 'saved' | 'unsaved' | 'saving' | 'conflict' | 'error';

export interface EditorModel {
  editable: boolean;               // false for roles that may only read the plan: every edit is refused
  history: History<PlanDocument>;
  /** The scale at each step of `history`, moved in step with it: a new scale is undone like any edit. */
  scales: History<ScaleStep>;
  state: EditorState;
  metresPerPixel: number;
  version: number;                 // the server version the edits are based on
  savedDocument: PlanDocument;     // what the server holds at `version`
  savedMetresPerPixel: number;
  saveStatus: SaveStatus;
  notice: string | null;           // the last refusal or save problem, in words
}

/** One step's scale (an object, so that a step keeping the same scale is still a step). */
export interface ScaleStep { readonly metresPerPixel: number }

export type EditorAction =
  | { type: 'apply'; document: PlanDocument; state: EditorState }
  | { type: 'undo' }
  | { type: 'redo' }
  | { type: 'set-state'; state: EditorState }
  /** A new scale, one undo step; the grid starts at gridOrigin (the scale line's first point) when given. */
  | { type: 'set-scale'; metresPerPixel: number; gridOrigin?: { x: number; y: number } }
  | { type: 'save-started' }
  | { type: 'save-succeeded'; version: number; document: PlanDocument; metresPerPixel: number }
  | { type: 'save-conflict'; message: string }
  | { type: 'save-failed'; message: string }
  | { type: 'rebase'; version: number }
  | { type: 'reload'; version: number; document: PlanDocument; metresPerPixel: number }
  | { type: 'notice'; message: string | null };

export const READ_ONLY_NOTICE = 'Your role can read this plan but not change it.';

/** The actions that change the plan (its document or its scale). */
const EDITS: ReadonlySet<EditorAction['type']> = new Set(['apply', 'undo', 'redo', 'set-scale']);

/** Why the model refuses an edit, or null when it takes edits: the one check behind every tool, key and panel. */
export function editRefusal(model: Pick<EditorModel, 'editable'>): string | null {
  return model.editable ? null : READ_ONLY_NOTICE;
}

// Runs a command on the model's document; the result is applied (one undo step) or the
// refusal shown. Returns the new document and state, or null when refused.
export function runCommand<Name extends CommandName>(model: EditorModel, dispatch: (action: EditorAction) => void, name: Name, args: CommandArgs<Name>): { doc: PlanDocument; state: EditorState } | null {
  const refusal = editRefusal(model);
  if (refusal) { dispatch({ type: 'notice', message: refusal }); return null; }
  const result = tryCommand(name, model.history.present, model.state, args);
  if (!result.ok) { dispatch({ type: 'notice', message: result.error.message }); return null; }
  dispatch({ type: 'apply', document: result.doc, state: result.state });
  return { doc: result.doc, state: result.state };
}

export function initialModel(document: PlanDocument, version: number, metresPerPixel: number, editable: boolean): EditorModel {
  const state = { ...initialEditorState(), activeRunId: document.runs[0]?.id ?? null };
  return { editable, history: createHistory(document), scales: createHistory<ScaleStep>({ metresPerPixel }), state, metresPerPixel, version, savedDocument: document, savedMetresPerPixel: metresPerPixel, saveStatus: 'saved', notice: null };
}

/**
 * A new scale keeps drawn points where they are; each linked outlet is placed again at its duct end,
 * and the grid may start at a new origin. One undo step, even when the document itself is unchanged.
 */
function withScale(model: EditorModel, metresPerPixel: number, gridOrigin: { x: number; y: number } | undefined): EditorModel {
  const placed = placeOutletsAtEnds(model.history.present, metresPerPixel);
  const document = gridOrigin ? { ...placed, gridOrigin: { x: gridOrigin.x, y: gridOrigin.y } } : placed === model.history.present ? { ...placed } : placed;
  return { ...model, metresPerPixel, history: push(model.history, document), scales: push(model.scales, { metresPerPixel }) };
}

/** A document edit at the current scale: the scale history takes a step only when the document does. */
function withDocument(model: EditorModel, document: PlanDocument): Pick<EditorModel, 'history' | 'scales'> {
  const history = push(model.history, document);
  return { history, scales: history === model.history ? model.scales : push(model.scales, { metresPerPixel: model.metresPerPixel }) };
}

export function isDirty(model: EditorModel): boolean {
  return model.history.present !== model.savedDocument || model.metresPerPixel !== model.savedMetresPerPixel;
}

function afterEdit(model: EditorModel, history: History<PlanDocument>, state: EditorState, scales: History<ScaleStep> = model.scales): EditorModel {
  const next = { ...model, history, scales, metresPerPixel: scales.present.metresPerPixel, state, notice: null };
  return { ...next, saveStatus: model.saveStatus === 'conflict' ? 'conflict' : isDirty(next) ? 'unsaved' : 'saved' };
}

export function editorReducer(model: EditorModel, action: EditorAction): EditorModel {
  const refusal = EDITS.has(action.type) ? editRefusal(model) : null;
  if (refusal) return { ...model, notice: refusal };
  switch (action.type) {
    case 'apply': {
      const { history, scales } = withDocument(model, action.document);
      return afterEdit(model, history, action.state, scales);
    }
    case 'undo':
    case 'redo': {
      if (action.type === 'undo' ? !canUndo(model.history) : !canRedo(model.history)) return model;
      const history = action.type === 'undo' ? undo(model.history) : redo(model.history);
      const scales = action.type === 'undo' ? undo(model.scales) : redo(model.scales);
      return afterEdit(model, history, normalizeState(history.present, model.state), scales);
    }
    case 'set-state':
      return { ...model, state: action.state };
    case 'set-scale': {
      const scaled = withScale(model, action.metresPerPixel, action.gridOrigin);
      return afterEdit(scaled, scaled.history, normalizeState(scaled.history.present, model.state), scaled.scales);
    }
    case 'save-started':
      return { ...model, saveStatus: 'saving' };
    case 'save-succeeded': {
      const next = { ...model, version: action.version, savedDocument: action.document, savedMetresPerPixel: action.metresPerPixel };
      return { ...next, saveStatus: isDirty(next) ? 'unsaved' : 'saved', notice: null };
    }
    case 'save-conflict':
      return { ...model, saveStatus: 'conflict', notice: action.message };
    case 'save-failed':
      return { ...model, saveStatus: 'error', notice: action.message };
    case 'rebase':
      // Overwrite: keep my document, aim the next save at the server's newest version.
      return { ...model, version: action.version, savedDocument: { ...model.savedDocument }, saveStatus: 'unsaved', notice: null };
    case 'reload': {
      const fresh = initialModel(action.document, action.version, action.metresPerPixel, model.editable);
      return { ...fresh, state: normalizeState(action.document, model.state) };
    }
    case 'notice':
      return { ...model, notice: action.message };
  }
}
