import type { InputHTMLAttributes } from 'react';

interface TextFieldProps extends InputHTMLAttributes<HTMLInputElement> {
  label: string;
  error?: string;
  hint?: string;
}

export function TextField({ label, error, hint, id, ...input }: TextFieldProps) {
  const fieldId = id ?? input.name;
  const describedBy = error ? `${fieldId}-error` : hint ? `${fieldId}-hint` : undefined;
  return (
    <div>
      <label htmlFor={fieldId} className="field-label">{label}</label>
      <input id={fieldId} className="field-input" aria-invalid={error ? true : undefined} aria-describedby={describedBy} {...input} />
      {hint && !error && <p id={`${fieldId}-hint`} className="mt-1 text-xs text-graphite-500">{hint}</p>}
      {error && <p id={`${fieldId}-error`} className="field-error" role="alert">{error}</p>}
    </div>
  );
}
