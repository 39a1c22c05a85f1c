import type { FieldRow } from '@/lib/api-description/field-rows';

/** The fields of a body, or the parameters of a query, as a table: name, type, limits, meaning. */
export function FieldTable({ caption, rows }: { caption: string; rows: FieldRow[] }) {
  if (rows.length === 0) return null;
  return (
    <table className="w-full table-fixed text-left text-sm">
      <caption className="pb-1 text-left text-xs font-medium uppercase tracking-wide text-graphite-500">{caption}</caption>
      <thead className="text-xs text-graphite-500">
        <tr><th className="w-1/4 py-1 pr-2 font-medium">Field</th><th className="w-1/4 pr-2 font-medium">Type</th><th className="w-1/6 pr-2 font-medium">Limits</th><th className="font-medium">Meaning</th></tr>
      </thead>
      <tbody>
        {rows.map((row) => (
          <tr key={row.name} className="border-t border-graphite-100 align-top">
            <td className="break-words py-1 pr-2 font-mono text-xs">{row.name}{row.required ? '' : <span className="font-sans text-graphite-500"> (optional)</span>}</td>
            <td className="break-words py-1 pr-2 text-xs">{row.type}</td>
            <td className="break-words py-1 pr-2 text-xs">{row.limits}</td>
            <td className="py-1 text-xs text-graphite-700">{row.description}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
