// The demo plan of the invented Marrowgate Arts Centre: a supply run from the 2-speed rooftop air
// handler down to the recital room, which it feeds through two ceiling outlets (a tee at the first
// drop), heard at two seats; its fan at high speed puts its blade-pass tone on one of the run's
// resonances, so the demo opens with a flag. Every name and number is invented.
import { newRoom, type Fan, type PlanDocument } from '@/lib/plan';

export const DEMO_PLAN_NAME = 'Level 1 – recital room supply';
export const DEMO_METRES_PER_PIXEL = 0.02;
/** The air handler's two speeds; the run carries the high one (the tone that lands on a resonance). */
export const DEMO_FAN_SPEEDS_RPM = { low: 450, high: 605 } as const;
export const DEMO_FAN_BLADES = 10;
/** Supply fan sound power into the duct at high speed, 63 Hz to 8 kHz, dB re 1 pW (invented). */
export const DEMO_FAN_SOUND_POWER_DB = [84, 82, 79, 75, 71, 67, 62, 56];

export function demoRecitalPlan(fan: Fan): PlanDocument {
  return {
    schemaVersion: 1,
    nodes: [
      { id: 'ahu', x: 120, y: 80 },
      { id: 'riser-foot', x: 120, y: 380 },
      { id: 'drop-head', x: 520, y: 380 },
      { id: 'recital-outlet', x: 520, y: 470 },
      { id: 'drop-head-2', x: 970, y: 380 },
      { id: 'recital-outlet-2', x: 970, y: 470 },
    ],
    segments: [
      // round spiral ductwork: stiff walls that lose little, so the run rings (sheet-metal walls, the default)
      { id: 'riser', from: 'ahu', to: 'riser-foot', section: { shape: 'round', diameterM: 0.56 } },
      { id: 'corridor-main', from: 'riser-foot', to: 'drop-head', section: { shape: 'round', diameterM: 0.45 } },
      { id: 'recital-drop', from: 'drop-head', to: 'recital-outlet', section: { shape: 'round', diameterM: 0.315 } },
      { id: 'corridor-on', from: 'drop-head', to: 'drop-head-2', section: { shape: 'round', diameterM: 0.355 } },
      { id: 'recital-drop-2', from: 'drop-head-2', to: 'recital-outlet-2', section: { shape: 'round', diameterM: 0.315 } },
    ],
    runs: [{
      id: 'recital-supply', name: 'Rooftop air handler to recital room', startNodeId: 'ahu', endNodeId: 'recital-outlet', temperatureC: 16,
      // its two speeds are the ends of the fan's range: the noise path is worked at the higher
      fan: { ...fan, minRpm: DEMO_FAN_SPEEDS_RPM.low, maxRpm: DEMO_FAN_SPEEDS_RPM.high },
      // the air handler's supply fan at high speed, as its (invented) maker's sheet gives it
      fanSoundPowerDb: DEMO_FAN_SOUND_POWER_DB,
      terminations: { ahu: { kind: 'closed' }, 'recital-outlet': { kind: 'open', flange: 'flanged' }, 'recital-outlet-2': { kind: 'open', flange: 'flanged' } },
    }],
    rooms: [{
      ...newRoom('recital-room', { name: 'Recital room', x: 380, y: 420, lengthM: 14, widthM: 10, heightM: 6 }),
      criterionNc: 20,
      outlet: { nodeId: 'recital-outlet', xM: 2.8, yM: 1, zM: 5.6 },
      listener: { xM: 8.5, yM: 6.2, zM: 1.2 },
      outletSoundPowerDb: [60, 55, 48, 42, 36, 30, 25, 20],
      // the second ceiling outlet, fed through the tee at the first drop, and a second seat near the back
      extraOutlets: [{ id: 'recital-second-outlet', nodeId: 'recital-outlet-2', xM: 11.8, yM: 1, zM: 5.6 }],
      extraListeners: [{ id: 'recital-back-seat', name: 'L2', xM: 12.5, yM: 8.8, zM: 1.2 }],
    }],
    outlets: [],
    listeners: [],
    treatments: [],
  };
}

/**
 * The demo plan as first seeded, before its second outlet: the run to the first outlet alone, no tee.
 * Checks of the run's own resonances, room-mode flags and retuning keep using this geometry.
 */
export function demoRecitalPlanFirstOutletOnly(fan: Fan): PlanDocument {
  const doc = demoRecitalPlan(fan);
  const second = new Set(['drop-head-2', 'recital-outlet-2']);
  return {
    ...doc,
    nodes: doc.nodes.filter((node) => !second.has(node.id)),
    segments: doc.segments.filter((segment) => !second.has(segment.to)),
    runs: doc.runs.map((run) => ({ ...run, terminations: Object.fromEntries(Object.entries(run.terminations).filter(([nodeId]) => !second.has(nodeId))) })),
    rooms: doc.rooms.map(({ extraOutlets: _second, ...room }) => room),
  };
}
