import type { Metadata } from 'next';
import { ForgottenPasswordForm } from '@/components/account/forgotten-password-form';

export const metadata: Metadata = { title: 'Forgotten password' };

export default function ForgottenPasswordPage() {
  return (
    <>
      <h1 className="mb-4 text-lg font-semibold">Forgotten password</h1>
      <ForgottenPasswordForm />
    </>
  );
}
