import { sequelize } from './db';

export async function checkDatabase(): Promise<{ ok: boolean; latencyMs: number; message?: string }> {
  const started = performance.now();
  try {
    await sequelize.query('select 1');
    return { ok: true, latencyMs: Math.round(performance.now() - started) };
  } catch (error) {
    return { ok: false, latencyMs: Math.round(performance.now() - started), message: error instanceof Error ? error.message : 'unreachable' };
  }
}
