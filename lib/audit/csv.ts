// The audit log as CSV. A cell a spreadsheet would read as a formula (starting with = + - @,
// a tab or a carriage return) gets a leading apostrophe so it stays text.
import Papa from 'papaparse';
import type { AuditLine } from './data';

const FORMULA_START = /^[=+\-@\t\r]/;

export function neutraliseCell(value: string): string {
  return FORMULA_START.test(value) ? `'${value}` : value;
}

export function auditCsv(lines: AuditLine[]): string {
  const rows = lines.map((line) => [line.at, line.actorName, line.actionLabel, line.subject].map(neutraliseCell));
  return Papa.unparse({ fields: ['When (UTC)', 'Who', 'What', 'Subject'], data: rows }, { newline: '\r\n' });
}
