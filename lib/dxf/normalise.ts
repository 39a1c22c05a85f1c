// A DXF file's text → the plan's DxfDrawing: parsed with dxf-parser, every drawable entity of model
// space (blocks inserted where their INSERTs put them) flattened to straight-line paths per layer,
// then placed in plan pixels at the scale the file's $INSUNITS states.
import DxfParser, { type IBlock, type IDxf, type IEntity, type IInsertEntity } from 'dxf-parser';
import { MAX_METRES_PER_PIXEL, MIN_METRES_PER_PIXEL } from '@/lib/plan/schema-parts';
import { DXF_DRAWING_FORMAT, type DxfDrawing, type DxfLayer } from './drawing';
import { entityPaths } from './entity-paths';
import { DxfError } from './errors';
import type { Point } from './flatten';
import { MAX_BLOCK_DEPTH, MAX_DXF_ENTITIES, MAX_DXF_POINTS } from './limits';
import { pixelSizeFor } from './pixel-size';
import { dxfUnits } from './units';

/** Scale, turn and move: where an inserted block's points land (AutoCAD DXF Reference, INSERT groups 10, 41, 42, 50). */
interface Placement { scaleX: number; scaleY: number; cos: number; sin: number; moveX: number; moveY: number; baseX: number; baseY: number; outer: Placement | null }

function place(point: Point, placement: Placement | null): Point {
  let current = point;
  for (let at = placement; at; at = at.outer) {
    const x = (current.x - at.baseX) * at.scaleX;
    const y = (current.y - at.baseY) * at.scaleY;
    current = { x: at.moveX + x * at.cos - y * at.sin, y: at.moveY + x * at.sin + y * at.cos };
  }
  return current;
}

function placementOf(insert: IInsertEntity, block: IBlock, outer: Placement | null): Placement {
  const rotationRad = ((insert.rotation ?? 0) * Math.PI) / 180;
  return {
    scaleX: insert.xScale ?? 1, scaleY: insert.yScale ?? 1, cos: Math.cos(rotationRad), sin: Math.sin(rotationRad),
    moveX: insert.position?.x ?? 0, moveY: insert.position?.y ?? 0, baseX: block.position?.x ?? 0, baseY: block.position?.y ?? 0, outer,
  };
}

interface Collected { byLayer: Map<string, Point[][]>; entityCount: number; pointCount: number; skippedTypes: Set<string> }

function collect(entities: readonly IEntity[], blocks: Record<string, IBlock>, placement: Placement | null, insertLayer: string | null, depth: number, into: Collected): void {
  for (const entity of entities) {
    if (entity.inPaperSpace) continue;
    // An entity on layer 0 inside a block takes the layer of the INSERT that places it (DXF convention for block content).
    const layer = entity.layer && !(insertLayer && entity.layer === '0') ? entity.layer : insertLayer ?? entity.layer ?? '0';
    if (entity.type === 'INSERT') {
      const insert = entity as IInsertEntity;
      const block = blocks[insert.name];
      if (block?.entities && depth < MAX_BLOCK_DEPTH) collect(block.entities, blocks, placementOf(insert, block, placement), layer, depth + 1, into);
      continue;
    }
    const paths = entityPaths(entity);
    if (paths === null) { into.skippedTypes.add(entity.type); continue; }
    into.entityCount += 1;
    if (into.entityCount > MAX_DXF_ENTITIES) {
      throw new DxfError('too_many_entities', `The drawing has more than ${MAX_DXF_ENTITIES.toLocaleString('en-GB')} lines, arcs and other entities (counting each inserted block's). Save only the floor or the layers you need as DXF and upload that.`);
    }
    const list = into.byLayer.get(layer) ?? [];
    for (const path of paths) {
      if (path.length < 2) continue;
      into.pointCount += path.length;
      if (into.pointCount > MAX_DXF_POINTS) {
        throw new DxfError('too_many_points', `The drawing's curves make more than ${MAX_DXF_POINTS.toLocaleString('en-GB')} points. Save only the floor or the layers you need as DXF and upload that.`);
      }
      list.push(placement ? path.map((point) => place(point, placement)) : path);
    }
    into.byLayer.set(layer, list);
  }
}

function parse(text: string, fileName: string): IDxf {
  let parsed: IDxf | null = null;
  try {
    parsed = new DxfParser().parseSync(text);
  } catch (error) {
    const detail = error instanceof Error ? error.message.split('\n')[0] : String(error);
    throw new DxfError('damaged', `“${fileName}” could not be read as DXF (${detail}). Save it again as DXF (ASCII) from your CAD program.`);
  }
  if (!parsed || !Array.isArray(parsed.entities)) {
    throw new DxfError('damaged', `“${fileName}” has no ENTITIES section, so there is nothing to draw. Save it again as DXF (ASCII) from your CAD program.`);
  }
  return parsed;
}

interface Bounds { minX: number; minY: number; maxX: number; maxY: number }

function boundsOf(byLayer: Map<string, Point[][]>): Bounds {
  const bounds = { minX: Infinity, minY: Infinity, maxX: -Infinity, maxY: -Infinity };
  for (const paths of byLayer.values()) {
    for (const path of paths) {
      for (const point of path) {
        if (point.x < bounds.minX) bounds.minX = point.x;
        if (point.x > bounds.maxX) bounds.maxX = point.x;
        if (point.y < bounds.minY) bounds.minY = point.y;
        if (point.y > bounds.maxY) bounds.maxY = point.y;
      }
    }
  }
  return bounds;
}

const round2 = (value: number) => Math.round(value * 100) / 100;

/** The file's text as the plan's drawing; refused with a DxfError saying why. */
export function normaliseDxf(text: string, fileName: string): DxfDrawing {
  const parsed = parse(text, fileName);
  const collected: Collected = { byLayer: new Map(), entityCount: 0, pointCount: 0, skippedTypes: new Set() };
  collect(parsed.entities, parsed.blocks ?? {}, null, null, 0, collected);
  const bounds = boundsOf(collected.byLayer);
  const spanX = bounds.maxX - bounds.minX;
  const spanY = bounds.maxY - bounds.minY;
  const longest = Math.max(spanX, spanY);
  if (!(longest > 0) || !Number.isFinite(longest)) {
    const skipped = [...collected.skippedTypes].sort().join(', ');
    throw new DxfError('nothing_drawable', `“${fileName}” has no lines, polylines, arcs or circles in model space to draw${skipped ? ` (only ${skipped})` : ''}. Check that the plan is in model space and save it again as DXF.`);
  }
  const units = dxfUnits(parsed.header?.$INSUNITS);
  // Stated units: one pixel is a round length in metres, within the plan's scale limits; unitless: a round number of drawing units.
  const metresPerPixel = units ? Math.min(MAX_METRES_PER_PIXEL, Math.max(MIN_METRES_PER_PIXEL, pixelSizeFor(longest * units.metresPerUnit))) : null;
  const unitsPerPixel = units ? metresPerPixel! / units.metresPerUnit : pixelSizeFor(longest);
  const toPx = (path: Point[]) => path.flatMap((point) => [round2((point.x - bounds.minX) / unitsPerPixel), round2((bounds.maxY - point.y) / unitsPerPixel)]);
  const layerTable = parsed.tables?.layer?.layers ?? {};
  const layers: DxfLayer[] = [...collected.byLayer.entries()]
    .filter(([, paths]) => paths.length > 0)
    .sort(([a], [b]) => a.localeCompare(b, 'en'))
    .map(([name, paths]) => {
      const inTable = layerTable[name];
      return { name, offInFile: inTable ? inTable.visible === false || inTable.frozen === true : false, paths: paths.map(toPx) };
    });
  return {
    format: DXF_DRAWING_FORMAT,
    widthPx: Math.max(1, Math.ceil(spanX / unitsPerPixel)),
    heightPx: Math.max(1, Math.ceil(spanY / unitsPerPixel)),
    metresPerPixel, unitsName: units?.name ?? null, entityCount: collected.entityCount, layers,
  };
}
