import { z } from 'zod';
import { isAuditAction, isAuditArea } from './actions';

// A day of the calendar: 2026-13-45 has the right shape but is no day at all.
function isCalendarDay(value: string): boolean {
  const date = new Date(`${value}T00:00:00.000Z`);
  return !Number.isNaN(date.getTime()) && date.toISOString().slice(0, 10) === value;
}

const empty = z.literal('').transform(() => undefined);

const day = z
  .string()
  .trim()
  .regex(/^\d{4}-\d{2}-\d{2}$/, 'Use a date like 2026-12-01.')
  .refine(isCalendarDay, 'That day does not exist: use a date like 2026-12-01.')
  .optional()
  .or(empty);

/** The person filter's value for lines written by the payment service (no member did them). */
export const SERVICE_ACTOR = 'service';

// The audit log's filter, shared by the filter form, the page and the export route. `kind` is an
// area (every kind of line in it) or one kind of line; `person` a member's user id, or "service".
export const auditFilterSchema = z
  .object({
    kind: z
      .string()
      .trim()
      .refine((value) => isAuditArea(value) || isAuditAction(value), 'Pick a kind of event from the list.')
      .optional()
      .or(empty),
    person: z
      .union([z.uuid({ error: 'Pick a person from the list.' }), z.literal(SERVICE_ACTOR)], { error: 'Pick a person from the list.' })
      .optional()
      .or(empty),
    from: day,
    to: day,
  })
  .refine((filter) => !filter.from || !filter.to || filter.from <= filter.to, { message: 'The start date is after the end date.', path: ['to'] });
export type AuditFilter = z.infer<typeof auditFilterSchema>;
export type AuditFilterInput = z.input<typeof auditFilterSchema>;

// `area` is the older name of `kind` (links written before the filter grew); `kind` wins when both are given.
export function auditFilterFromParams(params: URLSearchParams | Record<string, string | string[] | undefined>): { kind?: string; person?: string; from?: string; to?: string } {
  const read = (name: string) => {
    const value = params instanceof URLSearchParams ? params.get(name) ?? undefined : params[name];
    return Array.isArray(value) ? value[0] : value ?? undefined;
  };
  return { kind: read('kind') || read('area'), person: read('person'), from: read('from'), to: read('to') };
}
