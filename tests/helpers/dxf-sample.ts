// Invented DXF plans written by the tests themselves: ASCII DXF as the AutoCAD DXF Reference lays it
// out (group code line, value line; HEADER with $INSUNITS, TABLES with the LAYER table, BLOCKS,
// ENTITIES). Geometry is given in metres and written in the file's own units.

export type SampleUnits = 'm' | 'mm' | 'ft' | 'none';
type Xy = readonly [number, number];

export type SampleEntity =
  | { kind: 'line'; layer: string; from: Xy; to: Xy }
  | { kind: 'polyline'; layer: string; points: readonly Xy[]; closed?: boolean; bulges?: readonly number[] }
  | { kind: 'arc'; layer: string; center: Xy; radiusM: number; startDeg: number; endDeg: number }
  | { kind: 'circle'; layer: string; center: Xy; radiusM: number }
  | { kind: 'text'; layer: string; at: Xy; text: string }
  | { kind: 'insert'; layer: string; block: string; at: Xy; rotationDeg?: number; scale?: number };

export interface SampleBlock { name: string; entities: SampleEntity[] }
export interface SampleLayer { name: string; off?: boolean }
export interface SampleDxf { units: SampleUnits; layers?: SampleLayer[]; blocks?: SampleBlock[]; entities: SampleEntity[] }

// $INSUNITS codes (AutoCAD DXF Reference, HEADER section): 0 unitless, 2 feet, 4 millimetres, 6 metres.
const INSUNITS: Record<SampleUnits, number> = { none: 0, ft: 2, mm: 4, m: 6 };
const UNITS_PER_METRE: Record<SampleUnits, number> = { none: 1, ft: 1 / 0.3048, mm: 1000, m: 1 };

function pairs(groups: (readonly [number, string | number])[]): string {
  return groups.map(([code, value]) => `${code}\n${value}`).join('\n');
}

function entityGroups(entity: SampleEntity, units: SampleUnits): (readonly [number, string | number])[] {
  const k = UNITS_PER_METRE[units];
  const x = (value: number) => +(value * k).toFixed(6);
  switch (entity.kind) {
    case 'line':
      return [[0, 'LINE'], [8, entity.layer], [10, x(entity.from[0])], [20, x(entity.from[1])], [30, 0], [11, x(entity.to[0])], [21, x(entity.to[1])], [31, 0]];
    case 'polyline':
      return [[0, 'LWPOLYLINE'], [8, entity.layer], [90, entity.points.length], [70, entity.closed ? 1 : 0],
        ...entity.points.flatMap((point, index) => {
          const vertex: (readonly [number, number])[] = [[10, x(point[0])], [20, x(point[1])]];
          const bulge = entity.bulges?.[index];
          return bulge ? [...vertex, [42, bulge] as const] : vertex;
        })];
    case 'arc':
      return [[0, 'ARC'], [8, entity.layer], [10, x(entity.center[0])], [20, x(entity.center[1])], [30, 0], [40, x(entity.radiusM)], [50, entity.startDeg], [51, entity.endDeg]];
    case 'circle':
      return [[0, 'CIRCLE'], [8, entity.layer], [10, x(entity.center[0])], [20, x(entity.center[1])], [30, 0], [40, x(entity.radiusM)]];
    case 'text':
      return [[0, 'TEXT'], [8, entity.layer], [10, x(entity.at[0])], [20, x(entity.at[1])], [30, 0], [40, x(0.25)], [1, entity.text]];
    case 'insert':
      return [[0, 'INSERT'], [8, entity.layer], [2, entity.block], [10, x(entity.at[0])], [20, x(entity.at[1])], [30, 0],
        [41, entity.scale ?? 1], [42, entity.scale ?? 1], [50, entity.rotationDeg ?? 0]];
  }
}

/** The DXF file's text. */
export function sampleDxf(sample: SampleDxf): string {
  const layers = sample.layers ?? [];
  const sections = [
    pairs([[0, 'SECTION'], [2, 'HEADER'], [9, '$ACADVER'], [1, 'AC1015'], [9, '$INSUNITS'], [70, INSUNITS[sample.units]], [0, 'ENDSEC']]),
    pairs([[0, 'SECTION'], [2, 'TABLES'], [0, 'TABLE'], [2, 'LAYER'], [70, layers.length],
      // a layer that is off has a negative colour number (group 62)
      ...layers.flatMap((layer) => [[0, 'LAYER'], [2, layer.name], [70, 0], [62, layer.off ? -7 : 7], [6, 'CONTINUOUS']] as const),
      [0, 'ENDTAB'], [0, 'ENDSEC']]),
    pairs([[0, 'SECTION'], [2, 'BLOCKS'],
      ...(sample.blocks ?? []).flatMap((block) => [[0, 'BLOCK'], [8, '0'], [2, block.name], [70, 0], [10, 0], [20, 0], [30, 0], [3, block.name],
        ...block.entities.flatMap((entity) => entityGroups(entity, sample.units)), [0, 'ENDBLK']] as (readonly [number, string | number])[]),
      [0, 'ENDSEC']]),
    pairs([[0, 'SECTION'], [2, 'ENTITIES'], ...sample.entities.flatMap((entity) => entityGroups(entity, sample.units)), [0, 'ENDSEC']]),
    pairs([[0, 'EOF']]),
  ];
  return `${sections.join('\n')}\n`;
}

/** An invented floor, 24 m × 12 m: outer walls, a row of three meeting rooms, door swings and a column grid (off in the file). */
export function sampleFloorPlan(units: SampleUnits): string {
  const walls: SampleEntity[] = [
    { kind: 'polyline', layer: 'Walls', points: [[0, 0], [24, 0], [24, 12], [0, 12]], closed: true },
    { kind: 'line', layer: 'Walls', from: [0, 7], to: [24, 7] },
    ...[8, 16].map((x): SampleEntity => ({ kind: 'line', layer: 'Walls', from: [x, 7], to: [x, 12] })),
  ];
  const doors: SampleEntity[] = [3, 11, 19].flatMap((x): SampleEntity[] => [
    { kind: 'line', layer: 'Doors', from: [x, 7], to: [x, 7.9] },
    { kind: 'arc', layer: 'Doors', center: [x, 7], radiusM: 0.9, startDeg: 0, endDeg: 90 },
  ]);
  const grid: SampleEntity[] = [0, 6, 12, 18, 24].map((x) => ({ kind: 'line', layer: 'Column grid', from: [x, -1], to: [x, 13] }));
  return sampleDxf({
    units,
    layers: [{ name: 'Walls' }, { name: 'Doors' }, { name: 'Column grid', off: true }],
    entities: [...walls, ...doors, ...grid, { kind: 'text', layer: 'Walls', at: [1, 1], text: 'Level 2 (invented)' }],
  });
}

/** A large invented plan: `count` entities (lines, with one arc in ten) in a grid of small rooms on ten layers. */
export function manyEntitiesDxf(count: number, units: SampleUnits = 'mm'): string {
  const side = Math.ceil(Math.sqrt(count / 4));
  const entities: SampleEntity[] = [];
  for (let index = 0; entities.length < count; index += 1) {
    const column = index % side;
    const row = Math.floor(index / side);
    const x = column * 3;
    const y = row * 3;
    const layer = `Level ${row % 10}`;
    entities.push({ kind: 'line', layer, from: [x, y], to: [x + 2.8, y] });
    if (entities.length < count) entities.push({ kind: 'line', layer, from: [x + 2.8, y], to: [x + 2.8, y + 2.8] });
    if (entities.length < count) entities.push(index % 10 === 0 ? { kind: 'arc', layer, center: [x, y], radiusM: 0.9, startDeg: 0, endDeg: 90 } : { kind: 'line', layer, from: [x + 2.8, y + 2.8], to: [x, y + 2.8] });
    if (entities.length < count) entities.push({ kind: 'line', layer, from: [x, y + 2.8], to: [x, y] });
  }
  return sampleDxf({ units, layers: Array.from({ length: 10 }, (_, level) => ({ name: `Level ${level}` })), entities });
}
