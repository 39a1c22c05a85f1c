import { describe, expect, it } from 'vitest';
import { performCommand, tryCommand } from '@/lib/plan';
import { drawChain } from '../fixtures';

describe('property commands', () => {
  it('set-section, set-lining and set-length-override change the selected segments and refuse bad values', () => {
    const chain = drawChain([{ x: 0, y: 0 }, { x: 100, y: 0 }, { x: 200, y: 0 }]);
    const [first, second] = chain.doc.segments.map((segment) => segment.id);
    const state = { ...chain.state, selection: { nodeIds: [], segmentIds: [second] } };
    let result = performCommand('set-section', chain.doc, state, { section: { shape: 'rect', widthM: 0.5, heightM: 0.3 } });
    expect(result.doc.segments.map((segment) => segment.section.shape)).toEqual(['round', 'rect']);
    result = performCommand('set-lining', result.doc, result.state, { segmentIds: [first, second], lining: { thicknessM: 0.025, absorption: 0.5 } });
    result = performCommand('set-lining', result.doc, result.state, { segmentIds: [first], lining: null });
    expect(result.doc.segments.map((segment) => segment.lining)).toEqual([null, { thicknessM: 0.025, absorption: 0.5 }]);
    result = performCommand('set-length-override', result.doc, result.state, { lengthM: 4.2 });
    result = performCommand('set-length-override', result.doc, result.state, { lengthM: null });
    expect(result.doc.segments[1].lengthOverrideM).toBeNull();
    const small = tryCommand('set-section', chain.doc, state, { section: { shape: 'round', diameterM: 0.004 } });
    expect(small.ok ? 'accepted' : small.error.message).toBe('Section (diameterM): must be at least 0.01 m (10 mm)');
    const absorbent = tryCommand('set-lining', chain.doc, state, { lining: { thicknessM: 0.025, absorption: 1.2 } });
    expect(absorbent.ok ? 'accepted' : absorbent.error.message).toBe('Lining (absorption): must be between 0 and 1');
    const nothing = tryCommand('set-length-override', chain.doc, { ...state, selection: { nodeIds: [], segmentIds: [] } }, { lengthM: 2 });
    expect(nothing.ok ? 'accepted' : nothing.error.message).toBe('Select a segment first.');
  });

  it('set-termination sets an end and refuses a point that joins segments', () => {
    const chain = drawChain([{ x: 0, y: 0 }, { x: 100, y: 0 }, { x: 200, y: 0 }]);
    const { doc } = performCommand('set-termination', chain.doc, chain.state, { nodeId: chain.nodeIds[2], termination: { kind: 'open', flange: 'flanged' } });
    expect(doc.runs[0].terminations[chain.nodeIds[2]]).toEqual({ kind: 'open', flange: 'flanged' });
    const middle = tryCommand('set-termination', chain.doc, chain.state, { nodeId: chain.nodeIds[1], termination: { kind: 'anechoic' } });
    expect(middle.ok ? 'accepted' : middle.error.message).toBe('Only an end of the run takes a termination; this point joins segments.');
  });

  it('set-run-properties renames, sets temperature and fan, refusing out-of-range values', () => {
    const chain = drawChain([{ x: 0, y: 0 }, { x: 100, y: 0 }]);
    const { doc } = performCommand('set-run-properties', chain.doc, chain.state, { name: 'Supply to recital room', temperatureC: 14, fan: { blades: 12, rpm: 1450 } });
    expect(doc.runs[0]).toMatchObject({ name: 'Supply to recital room', temperatureC: 14, fan: { blades: 12, rpm: 1450 } });
    const hot = tryCommand('set-run-properties', chain.doc, chain.state, { temperatureC: 75 });
    expect(hot.ok ? 'accepted' : hot.error.message).toBe('Air temperature: must be at most 60 °C');
    const unnamed = tryCommand('set-run-properties', chain.doc, chain.state, { name: '  ' });
    expect(unnamed.ok ? 'accepted' : unnamed.error.message).toBe('Name: give the run a name');
  });

  it('choose-end picks a leaf and refuses the start or a middle point; null goes back to the farthest end', () => {
    const chain = drawChain([{ x: 0, y: 0 }, { x: 100, y: 0 }, { x: 200, y: 0 }]);
    const chosen = performCommand('choose-end', chain.doc, chain.state, { nodeId: chain.nodeIds[2] });
    expect(chosen.doc.runs[0].endNodeId).toBe(chain.nodeIds[2]);
    expect(performCommand('choose-end', chosen.doc, chosen.state, { nodeId: null }).doc.runs[0].endNodeId).toBeNull();
    for (const nodeId of [chain.nodeIds[0], chain.nodeIds[1]]) {
      const refused = tryCommand('choose-end', chain.doc, chain.state, { nodeId });
      expect(refused.ok ? 'accepted' : refused.error.message).toBe('Choose an end of the run other than its start.');
    }
  });
});
