// Envelopes in an answer only as asked: the rest are neither computed nor carried, and one answer's
// samples are bounded (product rules, no outside source; the envelopes themselves are checked against
// the standing-wave formula in tests/unit/acoustic/resonances/pressure-envelope.test.ts).
import { describe, expect, it } from 'vitest';
import { analyzeRun, type Resonance, type RunAnalysis } from '@/lib/acoustic';
import { MAX_ENVELOPE_SAMPLES_PER_ANSWER, withEnvelopesAsked, withoutEnvelope } from '@/lib/analysis/select-envelopes';
import { AppError } from '@/lib/errors';

const closed = { kind: 'closed' as const };
const run = () => analyzeRun({ segments: [{ lengthM: 3, section: { shape: 'round', diameterM: 0.2 } }], start: closed, end: { kind: 'open', flange: 'unflanged' }, maxHz: 400 });

/** A resonance whose envelope may not be read. */
function untouchable(resonance: Resonance): Resonance {
  const copy = withoutEnvelope(resonance);
  Object.defineProperty(copy, 'pressureEnvelope', { enumerable: true, get: () => { throw new Error(`envelope of order ${resonance.order} was read`); } });
  return copy;
}

describe('withEnvelopesAsked', () => {
  it('by default carries no envelope and reads none', () => {
    const analysis = run();
    const lean = withEnvelopesAsked({ ...analysis, resonances: analysis.resonances.map(untouchable) }, { kind: 'none' });
    expect(lean.resonances).toHaveLength(analysis.resonances.length);
    for (const resonance of lean.resonances) expect(Object.keys(resonance)).not.toContain('pressureEnvelope');
    expect(lean.resonances[0]).toEqual(withoutEnvelope(analysis.resonances[0]));
    expect(JSON.parse(JSON.stringify(lean))).toEqual(lean);
  });

  it('carries exactly the chosen orders, reading no other', () => {
    const analysis = run();
    const [, second, third] = analysis.resonances;
    const resonances = analysis.resonances.map((resonance) => (resonance.order === 2 || resonance.order === 3 ? resonance : untouchable(resonance)));
    const chosen = withEnvelopesAsked({ ...analysis, resonances }, { kind: 'orders', orders: [2, 3, 999] });
    expect(chosen.resonances.filter((resonance) => resonance.pressureEnvelope).map((resonance) => resonance.order)).toEqual([2, 3]);
    expect(chosen.resonances[1].pressureEnvelope).toEqual(second.pressureEnvelope);
    expect(chosen.resonances[2].pressureEnvelope).toEqual(third.pressureEnvelope);
  });

  it('carries every envelope on include=envelopes', () => {
    const analysis = run();
    const all = withEnvelopesAsked(analysis, { kind: 'all' });
    all.resonances.forEach((resonance, index) => expect(resonance.pressureEnvelope).toEqual(analysis.resonances[index].pressureEnvelope));
  });

  it(`refuses envelopes of more than ${MAX_ENVELOPE_SAMPLES_PER_ANSWER} samples in one answer with a 422 saying to ask for fewer`, () => {
    const big = Array.from({ length: MAX_ENVELOPE_SAMPLES_PER_ANSWER / 2 + 1 }, (_, index) => ({ positionM: index, relative: 1 }));
    const resonance = (order: number): Resonance => ({ order, frequencyHz: order, q: null, bandwidthHz: null, antinodesM: [], nodesM: [], dampingHz: 0, broadband: false, pressureEnvelope: big });
    const analysis = { ...run(), resonances: [resonance(1), resonance(2)] } satisfies RunAnalysis;
    expect(withEnvelopesAsked(analysis, { kind: 'orders', orders: [2] }).resonances[1].pressureEnvelope).toHaveLength(big.length);
    let refused: unknown;
    try { withEnvelopesAsked(analysis, { kind: 'all' }); } catch (error) { refused = error; }
    expect(refused).toBeInstanceOf(AppError);
    expect((refused as AppError).status).toBe(422);
    expect((refused as AppError).message).toMatch(/envelopes=3,4,10/);
  });
});
