import type { Metadata } from 'next';
import { redirect } from 'next/navigation';
import { SignUpForm } from '@/components/auth/sign-up-form';
import { currentActor } from '@/lib/auth/current';

export const metadata: Metadata = { title: 'Create an account' };

export default async function SignUpPage() {
  if (await currentActor()) redirect('/projects');
  return (
    <>
      <h1 className="mb-1 text-lg font-semibold">Create an account</h1>
      <p className="mb-4 text-sm text-graphite-500">This also creates your team.</p>
      <SignUpForm />
    </>
  );
}
