import type { Severity } from '@/lib/acoustic';

const LABEL: Record<Severity, string> = { high: 'High', medium: 'Medium', low: 'Low' };

// Severity as a word and a shape (triangle, diamond, circle), never colour alone.
export function SeverityBadge({ severity }: { severity: Severity }) {
  return (
    <span className="inline-flex items-center gap-1 text-xs font-medium" data-severity={severity}>
      <svg width="12" height="12" viewBox="0 0 12 12" aria-hidden="true">
        {severity === 'high' && <polygon points="6,1 11,11 1,11" fill="#b5541b" />}
        {severity === 'medium' && <polygon points="6,1 11,6 6,11 1,6" fill="none" stroke="#b5541b" strokeWidth="1.5" />}
        {severity === 'low' && <circle cx="6" cy="6" r="4" fill="none" stroke="#5d626b" strokeWidth="1.5" />}
      </svg>
      {LABEL[severity]}
    </span>
  );
}
