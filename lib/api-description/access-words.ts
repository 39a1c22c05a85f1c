// Who may call an operation, in words for the reference page, from the one permission map.
import { can, ROLE_LABELS, ROLES, type Action } from '@/lib/permissions';
import type { ApiOperation } from './types';

export function accessWords(operation: Pick<ApiOperation, 'access' | 'sessionOnly'>): string {
  const session = operation.sessionOnly ? '; a signed-in browser session only, not an API token' : '';
  if (operation.access === 'public') return 'Public: no sign-in';
  if (operation.access === 'signed-in') return `Anyone signed in${session}`;
  const roles = ROLES.filter((role) => can(role, operation.access as Action)).map((role) => ROLE_LABELS[role].toLowerCase());
  return `${operation.access}: ${roles.join(', ')}${session}`;
}
