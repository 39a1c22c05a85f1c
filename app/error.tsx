'use client';

import { ErrorPanel } from '@/components/feedback/error-panel';

export default function RootError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return <main id="main" className="px-4 py-16"><ErrorPanel digest={error.digest} onRetry={reset} /></main>;
}
