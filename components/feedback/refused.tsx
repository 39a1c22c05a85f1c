import Link from 'next/link';

// Shown when the signed-in person's role may not use a page. The server refuses the
// matching action too; this only explains it.
export function Refused({ what, role }: { what: string; role: string }) {
  return (
    <section className="panel mx-auto max-w-lg p-8 text-center" aria-labelledby="refused-title">
      <p className="text-xs font-semibold uppercase tracking-wider text-risk-ink">Not allowed</p>
      <h1 id="refused-title" className="mt-2 text-xl font-semibold">Your role cannot {what}</h1>
      <p className="mt-2 text-sm text-graphite-500">
        You are a {role.toLowerCase()} in this team. Ask a team admin to change your role if you need this.
      </p>
      <Link href="/projects" className="btn-quiet mt-6">Back to projects</Link>
    </section>
  );
}
