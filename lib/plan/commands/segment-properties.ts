// Section, lining and length override of the given (or selected) segments.
import { z } from 'zod';
import type { Lining, PathInsert, PlanDocument, PlanSegment, Section, Wall } from '../document';
import { pathInsertSchema } from '../noise/insert-schema';
import type { EditorState } from '../editor-state';
import { lengthOverrideMSchema, liningSchema, sectionSchema, wallSchema } from '../schema';
import { checked, defineCommand, targetSegmentIds } from './define';

function updateSegments(doc: PlanDocument, state: EditorState, segmentIds: readonly string[] | undefined, change: (segment: PlanSegment) => PlanSegment) {
  const ids = targetSegmentIds(doc, state, segmentIds);
  return { doc: { ...doc, segments: doc.segments.map((segment) => (ids.has(segment.id) ? change(segment) : segment)) }, state };
}

export interface SetSectionArgs {
  readonly segmentIds?: readonly string[];
  readonly section: Section;
}

export const setSection = defineCommand('set-section', 'Set the section (round Ø or w × h) of the selected segments.', (doc, state, args: SetSectionArgs) => {
  const section = checked(sectionSchema, args.section, 'Section');
  return updateSegments(doc, state, args.segmentIds, (segment) => ({ ...segment, section: { ...section } }));
});

export interface SetLiningArgs {
  readonly segmentIds?: readonly string[];
  /** null removes the lining. */
  readonly lining: Lining | null;
}

export const setLining = defineCommand('set-lining', 'Line the selected segments, or remove their lining.', (doc, state, args: SetLiningArgs) => {
  const lining = args.lining === null ? null : checked(liningSchema, args.lining, 'Lining');
  return updateSegments(doc, state, args.segmentIds, (segment) => ({ ...segment, lining: lining && { ...lining } }));
});

export interface SetWallArgs {
  readonly segmentIds?: readonly string[];
  /** null: the run's walls. */
  readonly wall: Wall | null;
}

export const setWall = defineCommand('set-wall', 'Give the selected segments walls of their own (rigid, sheet metal or measured), or the run\'s walls again.', (doc, state, args: SetWallArgs) => {
  const wall = args.wall === null ? null : checked(wallSchema, args.wall, 'Walls');
  return updateSegments(doc, state, args.segmentIds, (segment) => {
    const { wall: _old, ...rest } = segment;
    void _old;
    return wall === null ? rest : { ...rest, wall };
  });
});

export interface SetLengthOverrideArgs {
  readonly segmentIds?: readonly string[];
  /** null goes back to the drawn length. */
  readonly lengthM: number | null;
}

export const setLengthOverride = defineCommand('set-length-override', 'Give the selected segments a length of their own, or go back to the drawn length.', (doc, state, args: SetLengthOverrideArgs) => {
  const lengthM = args.lengthM === null ? null : checked(lengthOverrideMSchema, args.lengthM, 'Length');
  return updateSegments(doc, state, args.segmentIds, (segment) => ({ ...segment, lengthOverrideM: lengthM }));
});

export interface SetInsertsArgs {
  readonly segmentIds?: readonly string[];
  /** Silencers and other losses after the segment, in order; [] removes them. */
  readonly inserts: readonly PathInsert[];
}

export const setInserts = defineCommand('set-inserts', 'Put silencers or other losses into the noise path after the selected segment, or take them out.', (doc, state, args: SetInsertsArgs) => {
  const inserts = checked(z.array(pathInsertSchema).max(8, 'at most 8 on one segment'), args.inserts, 'Silencer or loss');
  return updateSegments(doc, state, args.segmentIds, (segment) => {
    const { inserts: _old, ...rest } = segment;
    void _old;
    return inserts.length > 0 ? { ...rest, inserts } : rest;
  });
});
