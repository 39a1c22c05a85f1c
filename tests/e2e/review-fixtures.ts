// A team with one member per role and a plan already submitted as revision 1, for the review
// and comment browser tests. Written straight into the test database.
import { expect } from '@playwright/test';
import { benchDocument } from '../../bench/schedule/plan';
import type { Role } from '@/lib/permissions';
import { createPlan, savePlanDocument } from '@/lib/plans/data';
import { DEMO_FAN_BLADES, DEMO_FAN_SPEEDS_RPM, DEMO_METRES_PER_PIXEL, demoRecitalPlan } from '@/lib/plans/demo/recital-plan';
import { submitRevision } from '@/lib/revisions/data';
import { Project } from '@/models';
import { createPerson, createTeam } from './fixtures';

// 'bench': straight supply runs (bench/schedule/plan.ts); 'recital': the demo's recital-room plan,
// whose fan tone sits on a resonance (rows at risk) and which serves a room (risk flags).
export async function teamWithRevision(label: string, drawing: 'bench' | 'recital' = 'bench') {
  const team = await createTeam(`${label} team`);
  const people = {} as Record<Role, { email: string; name: string; id: string }>;
  for (const role of ['acoustician', 'engineer', 'architect', 'viewer'] as const) {
    const { email, user } = await createPerson(`${label.toLowerCase()}-${role}`, [{ team, role }]);
    people[role] = { email, name: user.name, id: user.id };
  }
  const project = await Project.create({ teamId: team.id, name: `${label} recital hall`, site: '', createdById: people.acoustician.id });
  const plan = await createPlan(team.id, people.acoustician.id, project.id, `${label} level 2 supply`);
  const saved = drawing === 'bench'
    ? { metresPerPixel: 0.005, document: benchDocument(1, 3) }
    : { metresPerPixel: DEMO_METRES_PER_PIXEL, document: demoRecitalPlan({ blades: DEMO_FAN_BLADES, rpm: DEMO_FAN_SPEEDS_RPM.high }) };
  await savePlanDocument(team.id, people.acoustician.id, plan.id, { version: plan.version, ...saved });
  const revision = await submitRevision(team.id, { id: people.acoustician.id, name: people.acoustician.name }, plan.id, 'Ready for a look');
  return { team, people, projectId: project.id, planId: plan.id, revision, document: saved.document, metresPerPixel: saved.metresPerPixel };
}

interface InboxMail { to: { address: string }[]; subject: string; text: string }

// Waits for the newest mail to the address whose subject contains the words; returns it.
export async function mailTo(address: string, subjectHas: string): Promise<InboxMail> {
  let found: InboxMail | undefined;
  await expect.poll(async () => {
    const mails = (await (await fetch(`${process.env.MAIL_INBOX_URL}/api/email`)).json()) as InboxMail[];
    found = mails.filter((entry) => entry.to.some((to) => to.address === address) && entry.subject.includes(subjectHas)).pop();
    return found !== undefined;
  }, { message: `a mail to ${address} about ${subjectHas}` }).toBe(true);
  return found!;
}

// Waits for a mail to the address whose text links to the given path; returns path and query.
export async function linkInMailTo(address: string, pathStart: string): Promise<string> {
  let link = '';
  await expect.poll(async () => {
    const mails = (await (await fetch(`${process.env.MAIL_INBOX_URL}/api/email`)).json()) as InboxMail[];
    const mail = mails.filter((entry) => entry.to.some((to) => to.address === address)).pop();
    link = mail?.text.match(new RegExp(`https?://\\S+${pathStart.replace(/[.*+?^${}()|[\]\\/]/g, '\\$&')}\\S*`))?.[0] ?? '';
    return link;
  }, { message: `a mail to ${address} linking to ${pathStart}` }).not.toBe('');
  const url = new URL(link);
  return url.pathname + url.search + url.hash;
}
