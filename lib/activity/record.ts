// Writes one line of a plan's activity. Called inside the transaction of the change it records.
import type { Transaction } from 'sequelize';
import { PlanActivity } from '@/models';
import type { ActivityKind } from './kinds';

export interface ActivityActor { id: string; name: string }

export async function recordActivity(
  // actor id null: a person whose account is gone by the time a queued job records their action.
  entry: { teamId: string; planId: string; actor: ActivityActor | { id: null; name: string }; kind: ActivityKind; summary: string; link?: string | null },
  transaction?: Transaction,
): Promise<void> {
  await PlanActivity.create(
    {
      teamId: entry.teamId, planId: entry.planId, actorId: entry.actor.id, actorName: entry.actor.name,
      kind: entry.kind, summary: entry.summary.slice(0, 500), link: entry.link ?? null,
    },
    { transaction },
  );
}
