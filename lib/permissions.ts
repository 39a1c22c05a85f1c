// The one permission map: which role may do what inside its team. Route handlers and
// server actions check it on the server; pages use it only to hide what a role cannot do.

export const ROLES = ['admin', 'acoustician', 'engineer', 'architect', 'viewer'] as const;
export type Role = (typeof ROLES)[number];

export const ACTIONS = [
  'team.read',
  'project.read',
  'project.create',
  'project.update',
  'plan.read',
  'plan.edit',
  'analysis.run',
  'review.write',
  'comment.write',
  'schedule.read',
  'schedule.issue',
  'members.manage',
  'billing.manage',
  'audit.read',
] as const;
export type Action = (typeof ACTIONS)[number];

const viewer: readonly Action[] = ['team.read', 'project.read', 'plan.read', 'schedule.read'];
const architect: readonly Action[] = [...viewer, 'comment.write'];
const engineer: readonly Action[] = [...viewer, 'analysis.run', 'review.write', 'comment.write'];
const acoustician: readonly Action[] = [
  ...viewer, 'project.create', 'project.update', 'plan.edit', 'analysis.run', 'comment.write', 'schedule.issue',
];
const admin: readonly Action[] = [...new Set([...acoustician, ...engineer, ...architect, 'members.manage', 'billing.manage', 'audit.read'] as Action[])];

export const PERMISSIONS: Readonly<Record<Role, ReadonlySet<Action>>> = {
  admin: new Set(admin),
  acoustician: new Set(acoustician),
  engineer: new Set(engineer),
  architect: new Set(architect),
  viewer: new Set(viewer),
};

// Actions that change a team's data: refused while the team is read-only after a failed
// payment (lib/billing/standing.ts). Reading, billing and the audit log stay open.
export const WRITE_ACTIONS: ReadonlySet<Action> = new Set<Action>([
  'project.create', 'project.update', 'plan.edit', 'review.write', 'comment.write', 'schedule.issue', 'members.manage',
]);

export function isWriteAction(action: string): boolean {
  return WRITE_ACTIONS.has(action as Action);
}

export function can(role: Role, action: Action): boolean {
  return PERMISSIONS[role].has(action);
}

export function isRole(value: unknown): value is Role {
  return typeof value === 'string' && (ROLES as readonly string[]).includes(value);
}

export const ROLE_LABELS: Record<Role, string> = {
  admin: 'Team admin',
  acoustician: 'Acoustician',
  engineer: 'Mechanical engineer',
  architect: 'Architect',
  viewer: 'Viewer',
};
