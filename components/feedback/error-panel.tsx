'use client';

import Link from 'next/link';

export function ErrorPanel({ digest, onRetry }: { digest?: string; onRetry?: () => void }) {
  return (
    <section className="panel mx-auto max-w-lg p-8 text-center" aria-labelledby="error-title">
      <p className="text-xs font-semibold uppercase tracking-wider text-risk-ink">Error</p>
      <h1 id="error-title" className="mt-2 text-xl font-semibold">This page could not be shown</h1>
      <p className="mt-2 text-sm text-graphite-500">
        Something failed on our side. Nothing you saved was lost. Try again; if it keeps failing, quote the reference below.
      </p>
      {digest && <p className="num mt-3 font-mono text-xs text-graphite-500">Reference {digest}</p>}
      <div className="mt-6 flex justify-center gap-2">
        {onRetry && <button type="button" className="btn-primary" onClick={onRetry}>Try again</button>}
        <Link href="/projects" className="btn-quiet">Back to projects</Link>
      </div>
    </section>
  );
}
