import { forwardRef, type SelectHTMLAttributes } from 'react';
import { ROLE_LABELS, ROLES } from '@/lib/permissions';

interface RoleSelectProps extends SelectHTMLAttributes<HTMLSelectElement> { label: string; error?: string; hideLabel?: boolean }

export const RoleSelect = forwardRef<HTMLSelectElement, RoleSelectProps>(function RoleSelect({ label, error, hideLabel, id, ...select }, ref) {
  const fieldId = id ?? select.name;
  return (
    <div>
      <label htmlFor={fieldId} className={hideLabel ? 'sr-only' : 'field-label'}>{label}</label>
      <select
        id={fieldId}
        ref={ref}
        className={`${hideLabel ? '' : 'mt-1 '}block w-full rounded border border-graphite-200 bg-paper-raised px-2 py-2 text-sm`}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${fieldId}-error` : undefined}
        {...select}
      >
        {ROLES.map((role) => <option key={role} value={role}>{ROLE_LABELS[role]}</option>)}
      </select>
      {error && <p id={`${fieldId}-error`} className="field-error" role="alert">{error}</p>}
    </div>
  );
});
