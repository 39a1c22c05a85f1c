import Link from 'next/link';
import type { ProjectSummary } from '@/lib/projects/data';

export function ProjectList({ projects }: { projects: ProjectSummary[] }) {
  return (
    <ul className="panel divide-y divide-graphite-100" aria-label="Projects">
      {projects.map((project) => (
        <li key={project.id}>
          <Link href={`/projects/${project.id}`} className="flex items-baseline justify-between gap-4 px-4 py-3 hover:bg-paper-sunk">
          <div>
            <p className="font-medium">{project.name}</p>
            {project.site && <p className="text-sm text-graphite-500">{project.site}</p>}
          </div>
          <p className="num text-xs text-graphite-500">
            Updated {new Date(project.updatedAt).toISOString().slice(0, 10)}
          </p>
          </Link>
        </li>
      ))}
    </ul>
  );
}
