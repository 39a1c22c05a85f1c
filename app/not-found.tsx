import Link from 'next/link';
import { Wordmark } from '@/components/shell/wordmark';

export default function NotFound() {
  return (
    <main id="main" className="flex min-h-screen flex-col items-center justify-center px-4">
      <div className="mb-8"><Wordmark /></div>
      <section className="panel max-w-md p-8 text-center" aria-labelledby="not-found-title">
        <p className="num font-mono text-xs text-graphite-500">404</p>
        <h1 id="not-found-title" className="mt-2 text-xl font-semibold">Nothing here</h1>
        <p className="mt-2 text-sm text-graphite-500">
          The page does not exist, or it belongs to a team you are not in.
        </p>
        <Link href="/projects" className="btn-primary mt-6">Go to projects</Link>
      </section>
    </main>
  );
}
