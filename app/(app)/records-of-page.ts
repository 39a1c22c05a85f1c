// The records a page's URL names, looked up once per request (React `cache`) in the person's
// active team. The segment's layout calls them first, outside any loading boundary, so an
// unknown or malformed id answers 404: once a loading skeleton has streamed, Next can only
// send 200 with the not-found text. The page calls them again and gets the same answer free.
import { notFound } from 'next/navigation';
import { cache } from 'react';
import { requireActor } from '@/lib/auth/current';
import { AppError } from '@/lib/errors';
import { getPlan } from '@/lib/plans/data';
import { getProject } from '@/lib/projects/data';
import { getRevisionByNumber } from '@/lib/revisions/data';

async function signedInTeam() {
  const actor = await requireActor();
  if (!actor.team) notFound();
  return { actor, team: actor.team };
}

// A data function's not_found becomes the page's 404; anything else stays an error.
async function orNotFound<T>(lookup: Promise<T | null>): Promise<T> {
  const found = await lookup.catch((error: unknown) => {
    if (error instanceof AppError && error.code === 'not_found') return null;
    throw error;
  });
  if (found === null) notFound();
  return found;
}

export const projectOfPage = cache(async (projectId: string) => {
  const { actor, team } = await signedInTeam();
  return { actor, team, project: await orNotFound(getProject(team.teamId, projectId)) };
});

export const planOfPage = cache(async (planId: string) => {
  const { actor, team } = await signedInTeam();
  return { actor, team, plan: await orNotFound(getPlan(team.teamId, planId)) };
});

export const revisionOfPage = cache(async (planId: string, number: string) => {
  const { actor, team } = await signedInTeam();
  if (!/^\d{1,6}$/.test(number)) notFound();
  return { actor, team, revision: await orNotFound(getRevisionByNumber(team.teamId, planId, Number(number))) };
});
