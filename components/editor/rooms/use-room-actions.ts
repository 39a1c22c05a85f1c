'use client';

// The editor's room and treatment edits, each one lib/plan command (one undo step).
import { useCallback, useRef, type Dispatch } from 'react';
import type { PlanRoom } from '@/lib/plan';
import type { PlacedFlag } from '@/lib/plans/risks';
import type { TreatmentOption } from '@/lib/plans/treatment-options';
import { runCommand, type EditorAction, type EditorModel } from '../editor-model';

/** A room added from the drawer starts here on the plan with this size, m (product defaults). */
const DRAWER_ROOM = { x: 40, y: 40, lengthM: 6, widthM: 4, heightM: 3 };

export function useRoomActions(model: EditorModel, dispatch: Dispatch<EditorAction>, openRoom: (roomId: string | null) => void) {
  const modelRef = useRef(model);
  modelRef.current = model;

  const updateRoom = useCallback((roomId: string, changes: Partial<Omit<PlanRoom, 'id'>>) => {
    runCommand(modelRef.current, dispatch, 'update-room', { roomId, changes, metresPerPixel: modelRef.current.metresPerPixel });
  }, [dispatch]);

  const deleteRoom = useCallback((roomId: string) => {
    if (runCommand(modelRef.current, dispatch, 'delete-room', { roomId })) openRoom(null);
  }, [dispatch, openRoom]);

  const addRoom = useCallback(() => {
    const rooms = modelRef.current.history.present.rooms;
    const result = runCommand(modelRef.current, dispatch, 'add-room', { name: `Room ${rooms.length + 1}`, ...DRAWER_ROOM });
    const added = result?.doc.rooms.at(-1);
    if (added) openRoom(added.id);
  }, [dispatch, openRoom]);

  const chooseTreatment = useCallback((flag: PlacedFlag, option: TreatmentOption) => {
    runCommand(modelRef.current, dispatch, 'add-treatment', {
      treatment: {
        runId: flag.runId, roomId: flag.roomId, flagId: flag.id, flagKind: flag.kind, flagSubject: flag.subject, flagReason: flag.reason,
        treatment: option.treatment, description: option.description, before: option.before, after: option.after, clears: option.clears, planChange: option.planChange,
      },
    });
  }, [dispatch]);

  const removeTreatment = useCallback((treatmentId: string, keepDrawing = false) => {
    runCommand(modelRef.current, dispatch, 'remove-treatment', { treatmentId, keepDrawing });
  }, [dispatch]);

  return { updateRoom, deleteRoom, addRoom, chooseTreatment, removeTreatment };
}
