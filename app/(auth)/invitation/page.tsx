import type { Metadata } from 'next';
import Link from 'next/link';
import { AcceptInvitationForm, type AcceptMode } from '@/components/team/accept-invitation-form';
import { currentActor } from '@/lib/auth/current';
import { AppError } from '@/lib/errors';
import { ROLE_LABELS } from '@/lib/permissions';
import { previewInvitation, type InvitationPreview } from '@/lib/team/accept';

export const metadata: Metadata = { title: 'Accept invitation', referrer: 'no-referrer' };

async function preview(token: string): Promise<InvitationPreview | AppError> {
  try {
    return await previewInvitation(token);
  } catch (error) {
    if (error instanceof AppError) return error;
    throw error;
  }
}

export default async function AcceptInvitationPage({ searchParams }: { searchParams: Promise<{ token?: string }> }) {
  const { token } = await searchParams;
  const invitation = token ? await preview(token) : new AppError('bad_input', 'This page needs the link from the invitation mail.');
  if (!token || invitation instanceof AppError) {
    return (
      <section aria-labelledby="invitation-title">
        <h1 id="invitation-title" className="mb-2 text-lg font-semibold">Invitation not usable</h1>
        <p role="alert" className="text-sm">{invitation instanceof AppError ? invitation.message : ''}</p>
        <p className="mt-4 text-sm"><Link href="/sign-in" className="text-select-ink underline">Go to sign in</Link></p>
      </section>
    );
  }
  const actor = await currentActor();
  const signedInElsewhere = actor && actor.user.email !== invitation.email;
  const mode: AcceptMode = actor && !signedInElsewhere ? 'signed-in' : invitation.accountExists ? 'existing' : 'new';
  return (
    <section aria-labelledby="invitation-title" className="space-y-4">
      <div>
        <h1 id="invitation-title" className="text-lg font-semibold">Join {invitation.teamName}</h1>
        <p className="text-sm text-graphite-500">
          As {ROLE_LABELS[invitation.role].toLowerCase()}. The link works until {invitation.expiresAt.slice(0, 10)}.
        </p>
      </div>
      {signedInElsewhere ? (
        <p role="alert" className="text-sm">
          You are signed in as {actor.user.email}, but this invitation is for {invitation.email}. Sign out from the account menu, then open the link again.
        </p>
      ) : (
        <AcceptInvitationForm token={token} mode={mode} email={invitation.email} teamName={invitation.teamName} />
      )}
    </section>
  );
}
