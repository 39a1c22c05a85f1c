import { AUDIT_AREAS } from '@/lib/audit/actions';

// A plain GET form: the page reads and checks the same fields with auditFilterSchema.
export function AuditFilterForm({ values, error, exportHref }: {
  values: { area?: string; from?: string; to?: string }; error: { field?: string; message: string } | null; exportHref: string;
}) {
  return (
    <form method="get" className="panel grid gap-3 p-4 sm:grid-cols-[14rem_10rem_10rem_max-content_max-content] sm:items-end" aria-label="Filter the audit log">
      <div>
        <label htmlFor="area" className="field-label">Area</label>
        <select id="area" name="area" defaultValue={values.area ?? ''} className="mt-1 block w-full rounded border border-graphite-200 bg-paper-raised px-2 py-2 text-sm">
          <option value="">Everything</option>
          {Object.entries(AUDIT_AREAS).map(([value, label]) => <option key={value} value={value}>{label}</option>)}
        </select>
      </div>
      <div>
        <label htmlFor="from" className="field-label">From</label>
        <input id="from" name="from" type="date" defaultValue={values.from ?? ''} className="field-input" aria-invalid={error?.field === 'from' || undefined} />
      </div>
      <div>
        <label htmlFor="to" className="field-label">To</label>
        <input id="to" name="to" type="date" defaultValue={values.to ?? ''} className="field-input" aria-invalid={error?.field === 'to' || undefined} />
      </div>
      <button type="submit" className="btn-quiet h-[38px]">Filter</button>
      <a href={exportHref} className="btn-primary h-[38px]" download>Export CSV</a>
      {error && <p role="alert" className="field-error sm:col-span-5">{error.message}</p>}
    </form>
  );
}
