import type { AuditLine } from '@/lib/audit/data';

export function AuditTable({ lines }: { lines: AuditLine[] }) {
  return (
    <div className="panel overflow-x-auto">
      <table className="w-full text-left text-sm" aria-label="Audit log">
        <thead className="border-b border-graphite-100 text-xs uppercase tracking-wider text-graphite-500">
          <tr><th className="px-4 py-2">When (UTC)</th><th className="px-4 py-2">Who</th><th className="px-4 py-2">What</th><th className="px-4 py-2">Subject</th></tr>
        </thead>
        <tbody className="divide-y divide-graphite-100">
          {lines.map((line) => (
            <tr key={line.id}>
              <td className="whitespace-nowrap px-4 py-2 font-mono text-xs">{line.at.slice(0, 19).replace('T', ' ')}</td>
              <td className="px-4 py-2">{line.actorName}</td>
              <td className="px-4 py-2">{line.actionLabel}</td>
              <td className="px-4 py-2 text-graphite-700">{line.subject}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
