// POST /api/v1/analyze refuses the measured abuse cases of the bounded-work issue with a 400 that
// names the field and the limit (limits: lib/acoustic/input-limits.ts, product rules, no source).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { POST } from '@/app/api/v1/analyze/route';
import { cutoffHz, speedOfSound } from '@/lib/acoustic';
import { sequelize } from '@/lib/db';
import { createTestTeam, type TestTeam } from '../helpers/people';
import { call } from '../helpers/routes';

let team: TestTeam;
beforeAll(async () => { team = await createTestTeam('analyze-limits'); });
afterAll(async () => { await sequelize.close(); });

// Cut-off of 200 mm round duct at 20 °C: 1.84118 c / (pi d) (Kinsler & Frey, Fundamentals of Acoustics, ch. 9), about 1006 Hz.
const CUTOFF_HZ = cutoffHz({ shape: 'round', diameterM: 0.2 }, speedOfSound(20));

// One round segment, closed to flanged: the shape of the measured requests.
const closedToFlanged = (lengthM: number) => ({
  segments: [{ lengthM, section: { shape: 'round', diameterM: 0.2 } }],
  start: { kind: 'closed' },
  end: { kind: 'open', flange: 'flanged' },
});

async function analyze(body: unknown) {
  return call(POST, 'POST', '/api/v1/analyze', { cookie: await team.cookieFor('acoustician'), body });
}

describe('POST /api/v1/analyze limits', () => {
  it.each([
    ['lengthM 1000 on one segment', closedToFlanged(1000), 'segments[0].lengthM', 'segments[0].lengthM must be <= 500'],
    ['maxEchoes 10000 on a 3 m duct', { ...closedToFlanged(3), maxEchoes: 10000 }, 'maxEchoes', 'maxEchoes must be between 0 and 500'],
    ['maxHz far above the cut-off', { ...closedToFlanged(3), maxHz: 15000 }, 'maxHz', `maxHz must be <= ${(2 * CUTOFF_HZ).toFixed(1)} (2 × the run's plane-wave cut-off, ${CUTOFF_HZ.toFixed(1)} Hz)`],
    ['temperatureC -273.15', { ...closedToFlanged(3), temperatureC: -273.15 }, 'temperatureC', 'temperatureC must be between -40 and 60'],
  ])('refuses %s with a 400 naming the field and the limit', async (_case, body, field, message) => {
    const answer = await analyze(body);
    expect(answer.status).toBe(400);
    expect(answer.body).toMatchObject({ error: { code: 'bad_input', field, message: expect.stringContaining(message) } });
  });

  it('answers a run within the limits, and one between the cut-off and twice it with the plane-wave warning', async () => {
    const within = await analyze({ ...closedToFlanged(3), maxEchoes: 500 });
    expect(within.status).toBe(200);
    const warned = await analyze({ ...closedToFlanged(3), maxHz: 1500 });
    expect(warned.status).toBe(200);
    expect((warned.body as { warnings: string[] }).warnings.join(' ')).toContain('above the plane-wave cut-off');
  });
});
