import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { POST } from '@/app/api/v1/analyze/route';
import { sequelize } from '@/lib/db';
import { createTestTeam, type TestTeam } from '../helpers/people';
import { call } from '../helpers/routes';

let team: TestTeam;
beforeAll(async () => { team = await createTestTeam('analyze'); });
afterAll(async () => { await sequelize.close(); });

const closedClosed = {
  temperatureC: 20,
  segments: [{ lengthM: 2, section: { shape: 'round', diameterM: 0.2 } }],
  start: { kind: 'closed' },
  end: { kind: 'closed' },
  maxHz: 300,
};

describe('POST /api/v1/analyze', () => {
  it('returns the run analysis; closed–closed resonances sit at n c / 2L', async () => {
    const answer = await call(POST, 'POST', '/api/v1/analyze', { cookie: await team.cookieFor('engineer'), body: closedClosed });
    expect(answer.status).toBe(200);
    const analysis = answer.body as { speedOfSoundMps: number; resonances: { frequencyHz: number }[] };
    // Kinsler, Frey et al., Fundamentals of Acoustics, ch. 10: f_n = n c / 2L for a pipe closed at both ends.
    // Within 0.5 %: the engine's visco-thermal wall losses lower each resonance by about 0.2 % here.
    const expected = [1, 2, 3].map((n) => (n * analysis.speedOfSoundMps) / (2 * 2));
    analysis.resonances.slice(0, 3).forEach((resonance, index) => {
      expect(Math.abs(resonance.frequencyHz - expected[index]) / expected[index]).toBeLessThan(0.005);
    });
    expect(analysis.resonances).toHaveLength(3);
  });

  it('turns the engine’s RangeError into a 400 naming the field', async () => {
    const bad = { ...closedClosed, segments: [closedClosed.segments[0], { lengthM: 1, section: { shape: 'round', diameterM: 0.2 } }, { lengthM: -1, section: { shape: 'round', diameterM: 0.2 } }] };
    const answer = await call(POST, 'POST', '/api/v1/analyze', { cookie: await team.cookieFor('acoustician'), body: bad });
    expect(answer.status).toBe(400);
    expect(answer.body).toMatchObject({ error: { code: 'bad_input', message: expect.stringContaining('segments[2].lengthM must be > 0') } });
  });

  it('refuses a body that is not a run, a run with too many segments, and a body over the size limit', async () => {
    const cookie = await team.cookieFor('engineer');
    expect((await call(POST, 'POST', '/api/v1/analyze', { cookie, body: [1, 2] })).status).toBe(400);
    const many = { ...closedClosed, segments: Array.from({ length: 2001 }, () => ({ lengthM: 0.1, section: { shape: 'round', diameterM: 0.2 } })) };
    const tooMany = await call(POST, 'POST', '/api/v1/analyze', { cookie, body: many });
    expect(tooMany.status).toBe(400);
    expect(tooMany.body).toMatchObject({ error: { field: 'segments' } });
    const huge = { ...closedClosed, note: 'x'.repeat(600 * 1024) };
    expect((await call(POST, 'POST', '/api/v1/analyze', { cookie, body: huge })).status).toBe(413);
  });

  it('needs a session', async () => {
    expect((await call(POST, 'POST', '/api/v1/analyze', { body: closedClosed })).status).toBe(401);
  });

  it('needs analysis.run: viewers and architects are refused, as the permission map says', async () => {
    for (const role of ['viewer', 'architect'] as const) {
      const answer = await call(POST, 'POST', '/api/v1/analyze', { cookie: await team.cookieFor(role), body: closedClosed });
      expect(answer.status, role).toBe(403);
      expect(answer.body).toMatchObject({ error: { code: 'forbidden' } });
    }
  });
});
