import type { ReactNode } from 'react';
import { Wordmark } from '@/components/shell/wordmark';

export default function AuthLayout({ children }: { children: ReactNode }) {
  return (
    <main id="main" className="flex min-h-screen flex-col items-center justify-center px-4 py-12">
      <div className="mb-8"><Wordmark /></div>
      <div className="panel w-full max-w-sm p-6">{children}</div>
      <p className="mt-6 max-w-sm text-center text-xs text-graphite-500">
        Plane-wave duct acoustics, room modes and treatment schedules for HVAC acousticians and the teams around them.
      </p>
    </main>
  );
}
