import type { Metadata } from 'next';
import Link from 'next/link';
import { ResetPasswordForm } from '@/components/account/reset-password-form';

export const metadata: Metadata = { title: 'Choose a new password', referrer: 'no-referrer' };

export default async function ResetPasswordPage({ searchParams }: { searchParams: Promise<{ token?: string }> }) {
  const { token } = await searchParams;
  return (
    <>
      <h1 className="mb-4 text-lg font-semibold">Choose a new password</h1>
      {token ? (
        <ResetPasswordForm token={token} />
      ) : (
        <p className="text-sm">This page needs the link from the reset mail. <Link href="/forgotten-password" className="text-select-ink underline">Ask for a link</Link></p>
      )}
    </>
  );
}
