import { actionsOfArea, AUDIT_ACTIONS, AUDIT_AREAS, type AuditArea } from '@/lib/audit/actions';
import type { AuditPerson } from '@/lib/audit/data';

// A plain GET form: the page reads and checks the same fields with auditFilterSchema. The kind is
// a whole area ("Reviews: everything") or one kind of line within it.
export function AuditFilterForm({ values, people, error, exportHref }: {
  values: { kind?: string; person?: string; from?: string; to?: string }; people: AuditPerson[]; error: { field?: string; message: string } | null; exportHref: string;
}) {
  const select = 'mt-1 block w-full rounded border border-graphite-200 bg-paper-raised px-2 py-2 text-sm';
  return (
    <form method="get" className="panel grid gap-3 p-4 md:grid-cols-[minmax(12rem,16rem)_minmax(10rem,14rem)_10rem_10rem_max-content_max-content] md:items-end" aria-label="Filter the audit log">
      <div>
        <label htmlFor="kind" className="field-label">Kind of event</label>
        <select id="kind" name="kind" defaultValue={values.kind ?? ''} className={select} aria-invalid={error?.field === 'kind' || undefined}>
          <option value="">Everything</option>
          {(Object.entries(AUDIT_AREAS) as [AuditArea, string][]).map(([area, label]) => (
            <optgroup key={area} label={label}>
              <option value={area}>{label}: everything</option>
              {actionsOfArea(area).map((action) => <option key={action} value={action}>{AUDIT_ACTIONS[action].label}</option>)}
            </optgroup>
          ))}
        </select>
      </div>
      <div>
        <label htmlFor="person" className="field-label">Person</label>
        <select id="person" name="person" defaultValue={values.person ?? ''} className={select} aria-invalid={error?.field === 'person' || undefined}>
          <option value="">Anyone</option>
          {people.map((person) => <option key={person.value} value={person.value}>{person.name}</option>)}
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
      {error && <p role="alert" className="field-error md:col-span-6">{error.message}</p>}
    </form>
  );
}
