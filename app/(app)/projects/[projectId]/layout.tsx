import type { ReactNode } from 'react';
import { projectOfPage } from '@/app/(app)/records-of-page';

// An unknown project answers 404 here, before the page's loading skeleton streams.
export default async function ProjectLayout({ children, params }: { children: ReactNode; params: Promise<{ projectId: string }> }) {
  await projectOfPage((await params).projectId);
  return children;
}
