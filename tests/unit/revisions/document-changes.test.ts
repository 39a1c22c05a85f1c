// The change summary between two revisions names every change to the plan document. The fan's
// blade-pass frequency is blades × rpm / 60 (any fan handbook; e.g. ASHRAE Handbook—HVAC
// Applications, "Noise and vibration control", from memory), so a change of blades or speed moves
// the tone the resonance table is checked against: the summary must say so. Every field of the
// document's zod schema is changed once below and must give a line.
import { describe, expect, it } from 'vitest';
import type { PlanDocument, PlanRun, PlanSegment } from '@/lib/plan/document';
import type { PlanRoom, PlanTreatment } from '@/lib/plan';
import { planLabels } from '@/lib/plan/labels';
import { planDocumentSchema } from '@/lib/plan/schema';
import { DEMO_METRES_PER_PIXEL, demoRecitalPlan } from '@/lib/plans/demo/recital-plan';
import { documentChanges } from '@/lib/revisions/document-changes';

const base = demoRecitalPlan({ blades: 10, rpm: 605 });
const labels = planLabels(base);
const treatment: PlanTreatment = {
  id: 't1', runId: 'recital-supply', roomId: null, flagId: 'resonance-near-tone:h1:100.8', flagKind: 'resonance-near-tone', flagSubject: 'tone:h1', flagReason: 'test',
  treatment: { kind: 'line-segment', segmentIndex: 0, thicknessM: 0.05, absorption: 0.7 }, description: 'Line A1 with 50 mm liner', before: {}, after: {}, clears: true,
  planChange: { kind: 'lining', segmentId: 'riser', lining: { thicknessM: 0.05, absorption: 0.7 } },
};
const withTreatment: PlanDocument = { ...base, treatments: [treatment] };

function changed(after: PlanDocument, metresPerPixel = DEMO_METRES_PER_PIXEL, before: PlanDocument = withTreatment) {
  return documentChanges({ document: before, metresPerPixel: DEMO_METRES_PER_PIXEL }, { document: after, metresPerPixel });
}

const editRun = (patch: Partial<PlanRun>): PlanDocument => ({ ...withTreatment, runs: [{ ...withTreatment.runs[0], ...patch }] });
const editSegment = (id: string, patch: Partial<PlanSegment>): PlanDocument => ({ ...withTreatment, segments: withTreatment.segments.map((segment) => (segment.id === id ? { ...segment, ...patch } : segment)) });
const editRoom = (patch: Partial<PlanRoom>): PlanDocument => ({ ...withTreatment, rooms: [{ ...withTreatment.rooms[0], ...patch }] });
const editTreatment = (patch: Partial<PlanTreatment>): PlanDocument => ({ ...withTreatment, treatments: [{ ...treatment, ...patch }] });

describe('documentChanges', () => {
  it('says a fan went from 10 to 11 blades and from 605 to 450 rpm', () => {
    const lines = changed(editRun({ fan: { ...withTreatment.runs[0].fan!, blades: 11, rpm: 450 } }));
    const run = `Run ${labels.runs['recital-supply']} (Rooftop air handler to recital room)`;
    expect(lines).toEqual([
      { area: 'fan', subject: run, what: 'Fan blades', before: '10', after: '11' },
      { area: 'fan', subject: run, what: 'Fan speed', before: '605 rpm', after: '450 rpm' },
    ]);
  });

  it('says nothing when nothing changed', () => {
    expect(changed(withTreatment)).toEqual([]);
  });

  it('names ends, segments, rooms and treatments by their labels and the values in words', () => {
    const lines = changed({
      ...editRoom({ criterionNc: 25 }),
      runs: [{ ...withTreatment.runs[0], terminations: { ...withTreatment.runs[0].terminations, 'recital-outlet': { kind: 'open', flange: 'unflanged' } } }],
      segments: withTreatment.segments.map((segment) => (segment.id === 'recital-drop' ? { ...segment, section: { shape: 'round', diameterM: 0.4 }, lengthOverrideM: 5 } : segment)),
      treatments: [],
    });
    expect(lines).toContainEqual({ area: 'end', subject: labels.nodes['recital-outlet'], what: 'Termination', before: 'open, flanged', after: 'open, unflanged' });
    expect(lines).toContainEqual({ area: 'segment', subject: labels.segments['recital-drop'], what: 'Section', before: 'round Ø 315 mm', after: 'round Ø 400 mm' });
    // recital-drop is drawn 90 px long: 1.80 m at 0.02 m a pixel
    expect(lines).toContainEqual({ area: 'segment', subject: labels.segments['recital-drop'], what: 'Length', before: '1.80 m (drawn)', after: '5.00 m (typed)' });
    expect(lines).toContainEqual({ area: 'room', subject: 'Recital room', what: 'Criterion', before: 'NC 20', after: 'NC 25' });
    expect(lines).toContainEqual({ area: 'treatment', subject: 'Line A1 with 50 mm liner', what: 'Removed', before: 'chosen', after: '—' });
  });

  it('reports a new scale and the drawn lengths it changes, not every point or room as moved', () => {
    const lines = changed(withTreatment, 0.025);
    expect(lines[0]).toEqual({ area: 'plan', subject: 'Plan', what: 'Scale', before: '1 px = 20 mm', after: '1 px = 25 mm' });
    // the riser is drawn 300 px long: 6.00 m at 20 mm a pixel, 7.50 m at 25 mm
    expect(lines).toContainEqual({ area: 'segment', subject: labels.segments.riser, what: 'Length', before: '6.00 m (drawn)', after: '7.50 m (drawn)' });
    expect(lines.filter((line) => line.what === 'Moved' || line.what === 'Place on the plan')).toEqual([]);
    expect(lines).toHaveLength(6); // the scale and the five drawn lengths
  });

  // One change per field of the schema's runs, segments, rooms, treatments and the document itself.
  const MUTATIONS: Record<string, Record<string, () => PlanDocument>> = {
    document: {
      schemaVersion: () => ({ ...withTreatment, schemaVersion: 2 as 1 }),
      nodes: () => ({ ...withTreatment, nodes: withTreatment.nodes.map((node) => (node.id === 'drop-head' ? { ...node, x: node.x + 50 } : node)) }),
      segments: () => ({ ...withTreatment, segments: withTreatment.segments.slice(0, 2) }),
      runs: () => ({ ...withTreatment, runs: [] }),
      rooms: () => ({ ...withTreatment, rooms: [] }),
      outlets: () => ({ ...withTreatment, outlets: [{ legacy: true }] }),
      listeners: () => ({ ...withTreatment, listeners: [{ legacy: true }] }),
      treatments: () => ({ ...withTreatment, treatments: [] }),
      gridOrigin: () => ({ ...withTreatment, gridOrigin: { x: 120, y: 40 } }),
    },
    segments: {
      id: () => ({ ...withTreatment, segments: withTreatment.segments.map((segment) => (segment.id === 'riser' ? { ...segment, id: 'riser-2' } : segment)) }),
      from: () => editSegment('recital-drop', { from: 'riser-foot' }),
      to: () => editSegment('recital-drop', { to: 'riser-foot' }),
      section: () => editSegment('riser', { section: { shape: 'rect', widthM: 0.6, heightM: 0.5 } }),
      lining: () => editSegment('riser', { lining: { thicknessM: 0.025, absorption: 0.6 } }),
      wall: () => editSegment('riser', { wall: { kind: 'rigid' } }),
      lengthOverrideM: () => editSegment('riser', { lengthOverrideM: 7 }),
      number: () => editSegment('riser', { number: 9 }),
      inserts: () => editSegment('riser', { inserts: [{ kind: 'silencer', label: 'S1', insertionLossDb: [5, 8, 14, 22, 28, 30, 26, 20] }] }),
    },
    runs: {
      id: () => editRun({ id: 'other-run' }),
      name: () => editRun({ name: 'Supply from the roof' }),
      letter: () => editRun({ letter: 'B' }),
      startNodeId: () => editRun({ startNodeId: 'riser-foot' }),
      endNodeId: () => editRun({ endNodeId: null }),
      temperatureC: () => editRun({ temperatureC: 18 }),
      walls: () => editRun({ walls: { kind: 'measured', attenuationDbPerM: [1, 0.8, 0.5, 0.3, 0.2, 0.2, 0.2, 0.2] } }),
      fan: () => editRun({ fan: null }),
      fanOfRunId: () => ({ ...withTreatment, runs: [...withTreatment.runs, { ...withTreatment.runs[0], id: 'second-run', name: 'Second supply', fanOfRunId: withTreatment.runs[0].id }] }),
      fanSoundPowerDb: () => editRun({ fanSoundPowerDb: [80, 80, 80, 80, 80, 80, 80, 80] }),
      terminations: () => editRun({ terminations: { ahu: { kind: 'anechoic' }, 'recital-outlet': { kind: 'open', flange: 'flanged' } } }),
    },
    rooms: {
      id: () => editRoom({ id: 'room-2' }),
      name: () => editRoom({ name: 'Recital hall' }),
      x: () => editRoom({ x: 400 }),
      y: () => editRoom({ y: 400 }),
      lengthM: () => editRoom({ lengthM: 15 }),
      widthM: () => editRoom({ widthM: 11 }),
      heightM: () => editRoom({ heightM: 7 }),
      surfaces: () => editRoom({ surfaces: { ...withTreatment.rooms[0].surfaces, ceiling: { finishId: null, absorption: [0.5, 0.5, 0.5, 0.5, 0.5, 0.5, 0.5, 0.5] } } }),
      criterionNc: () => editRoom({ criterionNc: 30 }),
      outlet: () => editRoom({ outlet: { ...withTreatment.rooms[0].outlet, zM: 5 } }),
      listener: () => editRoom({ listener: { ...withTreatment.rooms[0].listener, xM: 7 } }),
      outletSoundPowerDb: () => editRoom({ outletSoundPowerDb: null }),
      extraOutlets: () => editRoom({ extraOutlets: [] }),
      extraListeners: () => editRoom({ extraListeners: [] }),
      roomCorrection: () => editRoom({ roomCorrection: 'bare' }),
    },
    treatments: {},
  };

  interface Shaped { shape: Record<string, unknown> }
  interface Wrapped { def: { type: string; innerType?: unknown; in?: unknown }; element?: unknown }
  // The object schema inside an array field (through defaults, optionals and pipes).
  function elementFields(field: unknown): string[] {
    let schema = field as Wrapped;
    while (schema.def.type !== 'array') schema = (schema.def.innerType ?? schema.def.in) as Wrapped;
    return Object.keys((schema.element as Shaped).shape);
  }
  const documentShape = (planDocumentSchema as unknown as Shaped).shape;
  const fields: Record<string, string[]> = {
    document: Object.keys(documentShape),
    segments: elementFields(documentShape.segments),
    runs: elementFields(documentShape.runs),
    rooms: elementFields(documentShape.rooms),
    treatments: elementFields(documentShape.treatments),
  };

  for (const [part, names] of Object.entries(fields)) {
    it(`gives a line for a change of every field of ${part} in the schema (${names.length} fields)`, () => {
      for (const name of names) {
        const mutate = MUTATIONS[part][name]
          ?? (part === 'treatments' ? () => editTreatment({ [name]: `changed ${name}` } as Partial<PlanTreatment>) : undefined);
        expect(mutate, `add a change of ${part}.${name} to this test`).toBeDefined();
        expect(changed(mutate!()).length, `${part}.${name} changed but the summary says nothing`).toBeGreaterThan(0);
      }
    });
  }
});
