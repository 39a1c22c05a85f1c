// Readiness: an instance says it can serve only when its database and its file store both answer,
// and names the one that does not (load-balancer readiness checks: common practice, no source).
import { afterAll, describe, expect, it } from 'vitest';
import { GET as ready } from '@/app/api/v1/ready/route';
import { sequelize } from '@/lib/db';
import { call } from '../helpers/routes';

afterAll(async () => { await sequelize.close(); });

describe('GET /api/v1/ready', () => {
  it('answers 200 when the database and the file store both answer', async () => {
    const answer = await call(ready, 'GET', '/api/v1/ready');
    expect(answer.status).toBe(200);
    expect(answer.body).toMatchObject({ status: 'ready', database: { ok: true }, store: { ok: true } });
  });

  it('answers 503 naming the file store when its bucket cannot be reached', async () => {
    const bucket = process.env.S3_BUCKET;
    process.env.S3_BUCKET = 'antinode-no-such-bucket';
    try {
      const answer = await call(ready, 'GET', '/api/v1/ready');
      expect(answer.status).toBe(503);
      expect(answer.body).toMatchObject({ status: 'not ready', database: { ok: true }, store: { ok: false } });
    } finally {
      process.env.S3_BUCKET = bucket;
    }
  });
});
