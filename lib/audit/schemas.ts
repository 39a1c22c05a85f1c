import { z } from 'zod';
import { AUDIT_AREAS, type AuditArea } from './actions';

// A day of the calendar: 2026-13-45 has the right shape but is no day at all.
function isCalendarDay(value: string): boolean {
  const date = new Date(`${value}T00:00:00.000Z`);
  return !Number.isNaN(date.getTime()) && date.toISOString().slice(0, 10) === value;
}

const day = z
  .string()
  .trim()
  .regex(/^\d{4}-\d{2}-\d{2}$/, 'Use a date like 2026-12-01.')
  .refine(isCalendarDay, 'That day does not exist: use a date like 2026-12-01.')
  .optional()
  .or(z.literal('').transform(() => undefined));

// The audit log's filter, shared by the filter form, the page and the export route.
export const auditFilterSchema = z
  .object({
    area: z
      .enum(Object.keys(AUDIT_AREAS) as [AuditArea, ...AuditArea[]], { error: 'Pick members, invitations or seats and billing.' })
      .optional()
      .or(z.literal('').transform(() => undefined)),
    from: day,
    to: day,
  })
  .refine((filter) => !filter.from || !filter.to || filter.from <= filter.to, { message: 'The start date is after the end date.', path: ['to'] });
export type AuditFilter = z.infer<typeof auditFilterSchema>;
export type AuditFilterInput = z.input<typeof auditFilterSchema>;

export function auditFilterFromParams(params: URLSearchParams | Record<string, string | string[] | undefined>): unknown {
  const read = (name: string) => {
    const value = params instanceof URLSearchParams ? params.get(name) : params[name];
    return Array.isArray(value) ? value[0] : value ?? undefined;
  };
  return { area: read('area'), from: read('from'), to: read('to') };
}
