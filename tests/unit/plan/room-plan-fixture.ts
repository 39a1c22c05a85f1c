// A run from a fan to a recital room whose third resonance (about 115.8 Hz) sits on the fan's
// blade-pass tone: 8 blades at 868 rpm, 115.7 Hz (invented numbers). Shared by unit,
// integration and browser tests.
import { newRoom, type Fan, type PlanDocument } from '@/lib/plan';

export const ROOM_PLAN_METRES_PER_PIXEL = 0.02;
export const TONE_FAN: Fan = { blades: 8, rpm: 868 };

export function roomPlanDocument(fan: Fan | null = TONE_FAN): PlanDocument {
  return {
    schemaVersion: 1,
    nodes: [{ id: 'fan', x: 100, y: 200 }, { id: 'bend', x: 250, y: 200 }, { id: 'outlet', x: 250, y: 300 }],
    segments: [
      { id: 'main', from: 'fan', to: 'bend', section: { shape: 'rect', widthM: 0.5, heightM: 0.3 } },
      { id: 'drop', from: 'bend', to: 'outlet', section: { shape: 'round', diameterM: 0.315 } },
    ],
    runs: [{
      id: 'supply', name: 'Supply to recital room', startNodeId: 'fan', endNodeId: 'outlet', temperatureC: 18, fan,
      terminations: { fan: { kind: 'closed' }, outlet: { kind: 'open', flange: 'flanged' } },
    }],
    rooms: [{ ...newRoom('recital', { name: 'Recital room', x: 50, y: 250, lengthM: 12, widthM: 8, heightM: 5 }), outlet: { nodeId: 'outlet', xM: 4, yM: 1, zM: 4.7 } }],
    outlets: [],
    listeners: [],
    treatments: [],
  };
}
