import type { ReactNode } from 'react';
import { revisionOfPage } from '@/app/(app)/records-of-page';

// An unknown revision answers 404 here, before the page's loading skeleton streams.
export default async function RevisionLayout({ children, params }: { children: ReactNode; params: Promise<{ planId: string; number: string }> }) {
  const { planId, number } = await params;
  await revisionOfPage(planId, number);
  return children;
}
