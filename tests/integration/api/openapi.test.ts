// The API description (lib/api-description, served at /api/v1/openapi.json) against the routes
// themselves: every route file's every method is described and nothing else is, each with the
// access the route declares; every example parses with the zod schema the route uses; and the
// examples of the reference page, called for real, give what published physics says.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { POST as analyze } from '@/app/api/v1/analyze/route';
import { GET as openapiJson } from '@/app/api/v1/openapi.json/route';
import { PUT as saveDocument } from '@/app/api/v1/plans/[planId]/document/route';
import { GET as results } from '@/app/api/v1/plans/[planId]/results/route';
import { GET as risks } from '@/app/api/v1/plans/[planId]/risks/route';
import { validateRun } from '@/lib/acoustic';
import { queryObject } from '@/lib/analysis/envelope-request';
import { API_OPERATIONS, apiDocument } from '@/lib/api-description';
import { errorBodySchema, REFUSALS } from '@/lib/api-description/error-body';
import { ONE_RUN_DOCUMENT, QUARTER_WAVE_RUN } from '@/lib/api-description/examples';
import { sequelize } from '@/lib/db';
import { ERROR_STATUS } from '@/lib/errors';
import { createPlan } from '@/lib/plans/data';
import { createProject } from '@/lib/projects/data';
import { parseExactly } from '@/lib/validation';
import { createTestTeam, type TestTeam } from '../helpers/people';
import { call, listRouteFiles, loadHandlers } from '../helpers/routes';

const document = apiDocument('http://localhost:3000');
const operationKey = (method: string, path: string) => `${method.toUpperCase()} ${path}`;

let team: TestTeam;
beforeAll(async () => { team = await createTestTeam('openapi'); });
afterAll(async () => { await sequelize.close(); });

describe('every route is described, and only routes', () => {
  it('walks app/api/v1: each route file\'s methods are in the document with the access the route declares', async () => {
    const routes = listRouteFiles();
    expect(routes.length).toBeGreaterThanOrEqual(47);
    const found = new Set<string>();
    for (const route of routes) {
      // Next's [planId] is OpenAPI's {planId}.
      const path = route.urlPath.replace(/\[+\.*(\w+)\]+/g, '{$1}');
      for (const [method, handler] of Object.entries(await loadHandlers(route))) {
        const key = operationKey(method, path);
        found.add(key);
        const described = document.paths[path]?.[method.toLowerCase()];
        expect(described, `${key} (${route.file}) needs its entry in lib/api-description`).toBeDefined();
        expect(described?.['x-permission'], `${key}: the permission described`).toBe(handler.access);
        const operation = API_OPERATIONS.find((one) => one.method === method && one.path === path);
        expect(operation?.sessionOnly ?? false, `${key}: session only`).toBe(described?.security !== undefined && JSON.stringify(described.security) === '[{"sessionCookie":[]}]');
      }
    }
    const described = Object.entries(document.paths).flatMap(([path, item]) => Object.keys(item).map((method) => operationKey(method, path)));
    expect(described.filter((key) => !found.has(key)), 'described, but no such route').toEqual([]);
    expect(described).toHaveLength(found.size);
  });

  it('serves the document at /api/v1/openapi.json, public and cacheable, with both ways to sign in and the one error shape', async () => {
    const answer = await call(openapiJson, 'GET', '/api/v1/openapi.json');
    expect(answer.status).toBe(200);
    expect(answer.headers.get('cache-control')).toBe('public, max-age=3600');
    const served = answer.body as typeof document;
    expect(served.openapi).toBe('3.1.0');
    expect(Object.keys(served.paths)).toEqual(Object.keys(document.paths));
    expect(served.components.securitySchemes.bearerToken).toMatchObject({ type: 'http', scheme: 'bearer' });
    expect(served.components.securitySchemes.sessionCookie).toMatchObject({ type: 'apiKey', in: 'cookie', name: 'antinode_session' });
    expect(served.components.schemas.ErrorBody).toMatchObject({ type: 'object', required: ['error'] });
    // Every $ref points at something in the document.
    for (const [, ref] of JSON.stringify(served).matchAll(/"\$ref":"#\/([^"]+)"/g)) {
      const target = ref.split('/').reduce<unknown>((node, part) => (node as Record<string, unknown> | undefined)?.[part], served);
      expect(target, `#/${ref}`).toBeDefined();
    }
  });
});

describe('every example parses with its route\'s schema', () => {
  for (const operation of API_OPERATIONS) {
    const key = operationKey(operation.method, operation.path);
    it(key, () => {
      const described = document.paths[operation.path][operation.method.toLowerCase()] as Record<string, any>;
      if (operation.body.kind === 'json') {
        const parsed = operation.body.schema.safeParse(operation.body.example);
        expect(parsed.success, `${key} body example: ${parsed.error?.message}`).toBe(true);
        // …and has no key the route would refuse as unknown.
        expect(() => parseExactly(operation.body.kind === 'json' ? operation.body.schema : errorBodySchema, operation.body.kind === 'json' ? operation.body.example : null)).not.toThrow();
        expect(described.requestBody.content['application/json'].examples.example.value).toEqual(operation.body.example);
      }
      if (operation.query?.example) {
        if ('schema' in operation.query) {
          const parsed = operation.query.schema.safeParse(queryObject(new URLSearchParams(operation.query.example)));
          expect(parsed.success, `${key} query example: ${parsed.error?.message}`).toBe(true);
        } else {
          const names = operation.query.parameters.map((parameter) => parameter.name);
          expect(Object.keys(operation.query.example).every((name) => names.includes(name))).toBe(true);
        }
      }
      for (const name of Object.keys(operation.pathExample ?? {})) expect(operation.path).toContain(`{${name}}`);
      for (const response of Object.values(operation.responses)) {
        if (response.schema && response.example !== undefined) expect(response.schema.safeParse(response.example).success, `${key} answer example`).toBe(true);
      }
      // Each refusal's example is the one error shape, with the code of its status.
      for (const [status, refusal] of Object.entries(described.responses as Record<string, any>)) {
        if (Number(status) < 400) continue;
        const example = refusal.$ref ? REFUSALS[Number(status)].example : refusal.content['application/json'].example;
        expect(errorBodySchema.safeParse(example).success, `${key} ${status} example`).toBe(true);
        expect(ERROR_STATUS[example.error.code as keyof typeof ERROR_STATUS], `${key} ${status} code`).toBe(Number(status));
      }
    });
  }

  it('the analysis example is a run the engine accepts as it is', () => {
    expect(() => validateRun(structuredClone(QUARTER_WAVE_RUN))).not.toThrow();
  });
});

describe('the reference page\'s example calls, made for real', () => {
  it('analysing the example run: the first resonance is the quarter-wave one, f1 = c / 4(L + 0.6133 a)', async () => {
    const operation = API_OPERATIONS.find((one) => one.path === '/api/v1/analyze')!;
    const query = new URLSearchParams(operation.query?.example).toString();
    const answer = await call(analyze, 'POST', `/api/v1/analyze?${query}`, { cookie: await team.cookieFor('engineer'), body: QUARTER_WAVE_RUN });
    expect(answer.status).toBe(200);
    const analysis = answer.body as { speedOfSoundMps: number; resonances: { order: number; frequencyHz: number; pressureEnvelope?: unknown[] }[] };
    // c = 331.3 √(1 + T/273.15) m/s, 343.2 m/s at 20 °C (Kinsler, Frey, Coppens & Sanders, Fundamentals of Acoustics, ch. 5; from memory).
    const speedOfSoundMps = 331.3 * Math.sqrt(1 + 20 / 273.15);
    expect(Math.abs(analysis.speedOfSoundMps - speedOfSoundMps) / speedOfSoundMps).toBeLessThan(0.002);
    // Levine & Schwinger (1948), "On the radiation of sound from an unflanged circular pipe", Phys. Rev. 73 (figure from memory): end
    // correction 0.6133 a at low ka (here ka ≈ 0.05); closed at x = 0, so f1 = c / 4(L + 0.6133 a) with a = 0.1 m.
    const lengthM = QUARTER_WAVE_RUN.segments[0].lengthM;
    const radiusM = QUARTER_WAVE_RUN.segments[0].section.diameterM / 2;
    const expectedHz = speedOfSoundMps / (4 * (lengthM + 0.6133 * radiusM)); // 27.99 Hz
    const first = analysis.resonances[0];
    expect(first.order).toBe(1);
    expect(Math.abs(first.frequencyHz - expectedHz) / expectedHz).toBeLessThan(0.003);
    // and the odd harmonics above it (a closed–open tube has only odd ones), f3 ≈ 3 f1 to within the end correction's change with ka
    expect(Math.abs(analysis.resonances[1].frequencyHz / first.frequencyHz - 3)).toBeLessThan(0.03);
    // envelopes=1 in the example query: the first resonance's envelope (8 samples a half wavelength, so
    // about 4 along this quarter wave, plus the ends), and no other.
    expect(first.pressureEnvelope?.length).toBeGreaterThanOrEqual(4);
    expect(analysis.resonances.slice(1).every((resonance) => resonance.pressureEnvelope === undefined)).toBe(true);
  });

  it('the document example saves, and the plan\'s results and noise path are read back as described', async () => {
    const acoustician = team.members.acoustician;
    const project = await createProject(team.team.id, acoustician.id, { name: 'Described project', site: '' });
    const plan = await createPlan(team.team.id, acoustician.id, project.id, 'Described plan');
    const saveOperation = API_OPERATIONS.find((one) => one.method === 'PUT' && one.path === '/api/v1/plans/{planId}/document')!;
    const example = saveOperation.body.kind === 'json' ? (saveOperation.body.example as { metresPerPixel: number; document: unknown }) : null;
    expect(example?.document).toEqual(ONE_RUN_DOCUMENT);
    const params = { planId: plan.id };
    const saved = await call(saveDocument, 'PUT', `/api/v1/plans/${plan.id}/document`, { cookie: await team.cookieFor('acoustician'), params, body: { ...example, version: plan.version } });
    expect(saved.status).toBe(200);

    const cookie = await team.cookieFor('viewer');
    const read = await call(results, 'GET', `/api/v1/plans/${plan.id}/results?runId=run-1&envelopes=1,2`, { cookie, params });
    expect(read.status).toBe(200);
    const resultFields = Object.keys(API_OPERATIONS.find((one) => one.path === '/api/v1/plans/{planId}/results')!.responses[200]!.fields!);
    expect(Object.keys(read.body as object).sort()).toEqual(resultFields.sort());
    const run = (read.body as { runs: { runId: string; problem: string | null; analysis: { lengthM: number } | null }[] }).runs[0];
    expect(run).toMatchObject({ runId: 'run-1', problem: null });
    // 300 px at 0.01 m a pixel (the example's scale): 3 m of duct.
    expect(run.analysis?.lengthM).toBeCloseTo(3, 4);

    const noise = await call(risks, 'GET', `/api/v1/plans/${plan.id}/risks`, { cookie, params });
    expect(noise.status).toBe(200);
    const riskFields = Object.keys(API_OPERATIONS.find((one) => one.path === '/api/v1/plans/{planId}/risks')!.responses[200]!.fields!);
    expect(Object.keys(noise.body as object)).toEqual(expect.arrayContaining(riskFields));
  });
});
