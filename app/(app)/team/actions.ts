'use server';

import { revalidatePath } from 'next/cache';
import { text } from '@/lib/text';
import { runAction, type ActionResult } from '@/lib/actions';
import { auditActorOf } from '@/lib/audit/record';
import { authorize } from '@/lib/auth/current';
import { seatChangeSchema } from '@/lib/billing/schemas';
import { cancelSubscription, requestPaidSeats } from '@/lib/billing/seats';
import { createInvitation, resendInvitation, revokeInvitation } from '@/lib/team/invitations';
import { changeMemberRole, removeMember } from '@/lib/team/members';
import { setPracticeName } from '@/lib/team/practice';
import { invitationInputSchema, practiceNameSchema, roleChangeSchema } from '@/lib/team/schemas';
import { parseWith } from '@/lib/validation';

const idSchema = text().min(1).max(64);

export async function inviteAction(input: unknown): Promise<ActionResult<{ email: string }>> {
  return runAction('invite', async () => {
    const actor = await authorize('members.manage');
    const invitation = await createInvitation(actor.team.teamId, auditActorOf(actor), parseWith(invitationInputSchema, input));
    revalidatePath('/team');
    return { email: invitation.email };
  });
}

export async function resendInvitationAction(invitationId: unknown): Promise<ActionResult<null>> {
  return runAction('resendInvitation', async () => {
    const actor = await authorize('members.manage');
    await resendInvitation(actor.team.teamId, auditActorOf(actor), parseWith(idSchema, invitationId));
    revalidatePath('/team');
    return null;
  });
}

export async function revokeInvitationAction(invitationId: unknown): Promise<ActionResult<null>> {
  return runAction('revokeInvitation', async () => {
    const actor = await authorize('members.manage');
    await revokeInvitation(actor.team.teamId, auditActorOf(actor), parseWith(idSchema, invitationId));
    revalidatePath('/team');
    return null;
  });
}

export async function changeRoleAction(memberId: unknown, input: unknown): Promise<ActionResult<null>> {
  return runAction('changeRole', async () => {
    const actor = await authorize('members.manage');
    await changeMemberRole(actor.team.teamId, auditActorOf(actor), parseWith(idSchema, memberId), parseWith(roleChangeSchema, input).role);
    revalidatePath('/team');
    return null;
  });
}

export async function removeMemberAction(memberId: unknown): Promise<ActionResult<null>> {
  return runAction('removeMember', async () => {
    const actor = await authorize('members.manage');
    await removeMember(actor.team.teamId, auditActorOf(actor), parseWith(idSchema, memberId));
    revalidatePath('/team');
    return null;
  });
}

export async function requestSeatsAction(input: unknown): Promise<ActionResult<null>> {
  return runAction('requestSeats', async () => {
    const actor = await authorize('billing.manage');
    await requestPaidSeats(actor.team.teamId, auditActorOf(actor), parseWith(seatChangeSchema, input).paidSeats);
    revalidatePath('/team/billing');
    return null;
  });
}

export async function cancelSubscriptionAction(): Promise<ActionResult<null>> {
  return runAction('cancelSubscription', async () => {
    const actor = await authorize('billing.manage');
    await cancelSubscription(actor.team.teamId, auditActorOf(actor));
    revalidatePath('/team/billing');
    return null;
  });
}

export async function setPracticeNameAction(input: unknown): Promise<ActionResult<{ practiceName: string }>> {
  return runAction('setPracticeName', async () => {
    const actor = await authorize('members.manage');
    const practice = await setPracticeName(actor.team.teamId, auditActorOf(actor), parseWith(practiceNameSchema, input));
    revalidatePath('/team');
    return { practiceName: practice.practiceName };
  });
}
