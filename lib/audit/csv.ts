// The audit log as CSV, written by csvText (lib/csv): a cell a spreadsheet would read as a formula
// stays text.
import { csvText } from '@/lib/csv/csv-text';
import type { AuditLine } from './data';

export function auditCsv(lines: AuditLine[]): string {
  return csvText(['When (UTC)', 'Who', 'What', 'Subject'], lines.map((line) => [line.at, line.actorName, line.actionLabel, line.subject]));
}
