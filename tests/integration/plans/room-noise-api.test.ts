// The demo recital room through the API: two outlets fed from one fan (through a tee), two listeners.
// The level at each listener must equal the energy sum of the two paths worked out here element by
// element with the engine's published-formula functions: sheet-metal duct attenuation and elbows
// (ASHRAE tables), the branch split 10 log(A_total / A_branch) (ASHRAE Handbook, HVAC Applications,
// noise chapter), the end reflection loss (ASHRAE RP-1314 form), Schultz's room correction (Schultz 1985),
// and the energy sum 10 log10 Σ 10^(L/10) of incoherent sources (definition of the decibel, ISO 80000-8).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  elbowAttenuationDb, endReflectionLoss, equivalentRadiusM, OCTAVE_BANDS_HZ, schultzRoomCorrectionDb, sectionArea, unlinedDuctAttenuationDbPerM, type Section,
} from '@/lib/acoustic';
import { GET as getRisks } from '@/app/api/v1/plans/[planId]/risks/route';
import { PUT as saveDocument } from '@/app/api/v1/plans/[planId]/document/route';
import { sequelize } from '@/lib/db';
import { createPlan } from '@/lib/plans/data';
import { DEMO_FAN_BLADES, DEMO_FAN_SOUND_POWER_DB, DEMO_FAN_SPEEDS_RPM, DEMO_METRES_PER_PIXEL, demoRecitalPlan } from '@/lib/plans/demo/recital-plan';
import type { PlanRisks } from '@/lib/plans/risks';
import { createProject } from '@/lib/projects/data';
import { createTestTeam, type TestTeam } from '../helpers/people';
import { call } from '../helpers/routes';

const bands = [...OCTAVE_BANDS_HZ];
const document = demoRecitalPlan({ blades: DEMO_FAN_BLADES, rpm: DEMO_FAN_SPEEDS_RPM.high });
let team: TestTeam;
let planId: string;

beforeAll(async () => {
  team = await createTestTeam('room-noise');
  const project = await createProject(team.team.id, team.members.acoustician.id, { name: 'Marrowgate', site: '' });
  planId = (await createPlan(team.team.id, team.members.acoustician.id, project.id, 'Recital supply')).id;
  const saved = await call(saveDocument, 'PUT', `/api/v1/plans/${planId}/document`, {
    cookie: await team.cookieFor('acoustician'), params: { planId }, body: { version: 1, metresPerPixel: DEMO_METRES_PER_PIXEL, document },
  });
  expect(saved.status).toBe(200);
});
afterAll(async () => { await sequelize.close(); });

const sectionOf = (id: string): Section => document.segments.find((segment) => segment.id === id)!.section;
const duct = (id: string, lengthM: number) => unlinedDuctAttenuationDbPerM(sectionOf(id), bands).map((perM) => perM * lengthM);
const split = (branch: string, other: string) => bands.map(() => 10 * Math.log10((sectionArea(sectionOf(branch)) + sectionArea(sectionOf(other))) / sectionArea(sectionOf(branch))));
const outletLoss = (id: string) => endReflectionLoss(2 * equivalentRadiusM(sectionOf(id)), 'flush', bands, 16);
const total = (losses: number[][]) => bands.map((_, band) => losses.reduce((sum, loss) => sum + loss[band], 0));

describe('two outlets into one room, from one fan', () => {
  it('the level at each listener is the energy sum of the two paths, computed element by element', async () => {
    const answer = await call(getRisks, 'GET', `/api/v1/plans/${planId}/risks`, { cookie: await team.cookieFor('viewer'), params: { planId } });
    expect(answer.status).toBe(200);
    const room = (answer.body as PlanRisks).rooms[0];
    expect(room.noiseProblem).toBeNull();
    // riser 6 m, corridor 8 m (to the tee), first drop 1.8 m; onward corridor 9 m, elbow, second drop 1.8 m (px × 0.02 m)
    const common = [duct('riser', 6), elbowAttenuationDb({ section: sectionOf('riser') }, bands), duct('corridor-main', 8)];
    const toFirst = total([...common, split('recital-drop', 'corridor-on'), duct('recital-drop', 1.8), outletLoss('recital-drop')]);
    const toSecond = total([...common, split('corridor-on', 'recital-drop'), duct('corridor-on', 9), elbowAttenuationDb({ section: sectionOf('corridor-on') }, bands), duct('recital-drop-2', 1.8), outletLoss('recital-drop-2')]);
    const plan = document.rooms[0];
    const outlets = [plan.outlet, plan.extraOutlets![0]];
    const listeners = [plan.listener, plan.extraListeners![0]];
    const volumeM3 = 14 * 10 * 6;
    listeners.forEach((listener, index) => {
      const result = room.noise!.listeners[index];
      bands.forEach((hz, band) => {
        const levels = [toFirst, toSecond].map((losses, outlet) => {
          const distanceM = Math.hypot(outlets[outlet].xM - listener.xM, outlets[outlet].yM - listener.yM, outlets[outlet].zM - listener.zM);
          return DEMO_FAN_SOUND_POWER_DB[band] - losses[band] + schultzRoomCorrectionDb(volumeM3, distanceM, hz);
        });
        const byHand = 10 * Math.log10(10 ** (levels[0] / 10) + 10 ** (levels[1] / 10));
        expect(Math.abs(result.levelDb[band] - byHand), `${result.name} at ${hz} Hz: ${result.levelDb[band]} against ${byHand}`).toBeLessThan(0.05);
      });
    });
    // and the flags name the listener
    const flags = (answer.body as PlanRisks).flags.filter((flag) => flag.subject.endsWith('@recital-back-seat'));
    expect(flags.length).toBeGreaterThan(0);
    expect(flags[0].reason).toMatch(/^At listener L2 in Recital room/);
  });
});
