import Link from 'next/link';
import { WaitingMarker } from '@/components/revisions/waiting-marker';
import type { ProjectSummary } from '@/lib/projects/data';

/** Per project: how many of its plans have a revision waiting, and whether the reader is the one asked. */
export type ProjectWaiting = Record<string, { plans: number; forYou: boolean }>;

export function ProjectList({ projects, waiting = {} }: { projects: ProjectSummary[]; waiting?: ProjectWaiting }) {
  return (
    <ul className="panel divide-y divide-graphite-100" aria-label="Projects">
      {projects.map((project) => {
        const marker = waiting[project.id];
        return (
          <li key={project.id}>
            <Link href={`/projects/${project.id}`} className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1 px-4 py-3 hover:bg-paper-sunk">
              <div className="min-w-0">
                <p className="font-medium">{project.name}</p>
                {project.site && <p className="text-sm text-graphite-500">{project.site}</p>}
              </div>
              <div className="flex flex-wrap items-center gap-3">
                {marker && (
                  <WaitingMarker text={`${marker.plans === 1 ? '1 plan' : `${marker.plans} plans`} waiting for ${marker.forYou ? 'your review' : 'review'}`} />
                )}
                <p className="num text-xs text-graphite-500">Updated {new Date(project.updatedAt).toISOString().slice(0, 10)}</p>
              </div>
            </Link>
          </li>
        );
      })}
    </ul>
  );
}
