import type { Metadata } from 'next';
import Link from 'next/link';
import { ConfirmSignUpForm } from '@/components/auth/confirm-sign-up-form';

export const metadata: Metadata = { title: 'Confirm your address', referrer: 'no-referrer' };

// Opening the link changes nothing (mail scanners open links too): the button does.
export default async function ConfirmSignUpPage({ searchParams }: { searchParams: Promise<{ token?: string }> }) {
  const { token } = await searchParams;
  return (
    <>
      <h1 className="mb-1 text-lg font-semibold">Confirm your address</h1>
      {token ? (
        <ConfirmSignUpForm token={token} />
      ) : (
        <p className="text-sm">This page needs the link from the sign-up mail. <Link href="/sign-up" className="text-select-ink underline">Sign up</Link></p>
      )}
    </>
  );
}
