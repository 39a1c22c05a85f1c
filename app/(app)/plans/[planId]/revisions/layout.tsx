import type { ReactNode } from 'react';
import { planOfPage } from '@/app/(app)/records-of-page';

// An unknown plan answers 404 here, before any revisions page's loading skeleton streams.
export default async function PlanRevisionsLayout({ children, params }: { children: ReactNode; params: Promise<{ planId: string }> }) {
  await planOfPage((await params).planId);
  return children;
}
