// Every editor command by name, and a dispatcher.
import type { PlanDocument } from '../document';
import type { EditorState } from '../editor-state';
import { PlanError } from '../errors';
import type { IdGenerator } from '../ids';
import { addTee } from './add-tee';
import type { CommandName, CommandResult } from './define';
import { deleteSelection } from './delete-selection';
import { drawSegment } from './draw-segment';
import { moveNode } from './move-node';
import { chooseEnd, renumberRunCommand, setRunProperties, setTermination } from './run-properties';
import { setInserts, setLengthOverride, setLining, setSection, setWall } from './segment-properties';
import { splitSegment } from './split-segment';
import { addRoom, deleteRoom, moveRoom, updateRoom } from './rooms';
import { addTreatment, removeTreatment } from './treatments';
import { setGridOrigin } from './grid-origin';

export const COMMANDS = {
  'draw-segment': drawSegment,
  'move-node': moveNode,
  'delete-selection': deleteSelection,
  'split-segment': splitSegment,
  'add-tee': addTee,
  'set-section': setSection,
  'set-lining': setLining,
  'set-wall': setWall,
  'set-termination': setTermination,
  'set-run-properties': setRunProperties,
  'choose-end': chooseEnd,
  'renumber-run': renumberRunCommand,
  'set-length-override': setLengthOverride,
  'set-inserts': setInserts,
  'add-room': addRoom,
  'update-room': updateRoom,
  'move-room': moveRoom,
  'delete-room': deleteRoom,
  'add-treatment': addTreatment,
  'remove-treatment': removeTreatment,
  'set-grid-origin': setGridOrigin,
} as const satisfies { [Name in CommandName]: { name: Name } };

export type CommandArgs<Name extends CommandName> = Parameters<(typeof COMMANDS)[Name]['perform']>[2];

export function performCommand<Name extends CommandName>(name: Name, doc: PlanDocument, state: EditorState, args: CommandArgs<Name>, newId?: IdGenerator): CommandResult {
  const command = COMMANDS[name] as { perform(doc: PlanDocument, state: EditorState, args: CommandArgs<Name>, newId?: IdGenerator): CommandResult };
  return command.perform(doc, state, args, newId);
}

export type TryResult = ({ ok: true } & CommandResult) | { ok: false; error: PlanError };

/** performCommand that returns a refusal instead of throwing it; other errors still throw. */
export function tryCommand<Name extends CommandName>(name: Name, doc: PlanDocument, state: EditorState, args: CommandArgs<Name>, newId?: IdGenerator): TryResult {
  try {
    return { ok: true, ...performCommand(name, doc, state, args, newId) };
  } catch (error) {
    if (error instanceof PlanError) return { ok: false, error };
    throw error;
  }
}

export type { CommandName, CommandResult, Command } from './define';
export type { NodeRef, DrawSegmentArgs } from './draw-segment';
export type { SplitSegmentArgs } from './split-segment';
export type { AddTeeArgs } from './add-tee';
export type { MoveNodeArgs } from './move-node';
export type { DeleteSelectionArgs } from './delete-selection';
export type { SetSectionArgs, SetLiningArgs, SetLengthOverrideArgs, SetInsertsArgs } from './segment-properties';
export type { SetTerminationArgs, SetRunPropertiesArgs, ChooseEndArgs, RenumberRunArgs } from './run-properties';
export type { AddRoomArgs, UpdateRoomArgs, MoveRoomArgs, DeleteRoomArgs } from './rooms';
export type { AddTreatmentArgs, RemoveTreatmentArgs } from './treatments';
export type { SetGridOriginArgs } from './grid-origin';
export { applyPlanChange } from './treatments';
export { KEY_BINDINGS, matchKeyBinding } from './key-bindings';
export type { EditorAction, KeyBinding, KeyPress } from './key-bindings';
