// The query parameters that ask an analysis answer for pressure envelopes: what each asks for, and a
// bad one refused with a message naming it (product rules, no outside source).
import { describe, expect, it } from 'vitest';
import { analyzeEnvelopeRequest, planResultsRequest, wantsEnvelope } from '@/lib/analysis/envelope-request';
import { AppError } from '@/lib/errors';

const analyze = (query: string) => analyzeEnvelopeRequest(`http://localhost/api/v1/analyze${query}`);
const refusal = (run: () => unknown): AppError => {
  try { run(); } catch (error) { if (error instanceof AppError) return error; throw error; }
  throw new Error('was not refused');
};

describe('envelope requests', () => {
  it('none by default; include=envelopes for all; envelopes=<orders> for chosen ones (repeated, duplicated or split over parameters)', () => {
    expect(analyze('')).toEqual({ kind: 'none' });
    expect(analyze('?include=envelopes')).toEqual({ kind: 'all' });
    expect(analyze('?envelopes=10,11')).toEqual({ kind: 'orders', orders: [10, 11] });
    expect(analyze('?envelopes=3&envelopes=4,3')).toEqual({ kind: 'orders', orders: [3, 4] });
    expect(wantsEnvelope({ kind: 'orders', orders: [3, 4] }, 4)).toBe(true);
    expect(wantsEnvelope({ kind: 'orders', orders: [3, 4] }, 5)).toBe(false);
    expect(wantsEnvelope({ kind: 'all' }, 99)).toBe(true);
    expect(wantsEnvelope({ kind: 'none' }, 1)).toBe(false);
  });

  it('refuses a bad parameter with a 400 that names it', () => {
    const cases: [string, string, RegExp][] = [
      ['?include=envelope', 'include', /envelopes/],
      ['?include=', 'include', /include/],
      ['?envelopes=a,b', 'envelopes', /orders separated by commas/],
      ['?envelopes=0', 'envelopes', /count from 1/],
      ['?envelopes=3,', 'envelopes', /orders separated by commas/],
      ['?envelope=3', '', /unknown query parameter envelope/],
      ['?include=envelopes&envelopes=3', 'envelopes', /not both/],
    ];
    for (const [query, field, message] of cases) {
      const error = refusal(() => analyze(query));
      expect(error.code, query).toBe('bad_input');
      expect(error.message, query).toMatch(message);
      if (field) expect(error.field, query).toMatch(new RegExp(`^${field}`));
    }
  });

  it('the plan results take a runId too; the analyze route does not', () => {
    expect(planResultsRequest('http://localhost/x?runId=run-1&envelopes=2')).toEqual({ runId: 'run-1', envelopes: { kind: 'orders', orders: [2] } });
    expect(planResultsRequest('http://localhost/x')).toEqual({ runId: null, envelopes: { kind: 'none' } });
    expect(refusal(() => analyze('?runId=run-1')).message).toMatch(/unknown query parameter runId/);
    expect(refusal(() => planResultsRequest('http://localhost/x?runId=a%00b')).field).toBe('runId');
  });
});
