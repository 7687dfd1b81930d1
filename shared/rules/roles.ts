export const ROLES = ['admin', 'supervisor', 'engineer', 'viewer'] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  admin: 'Administrator',
  supervisor: 'Supervisor',
  engineer: 'Engineer',
  viewer: 'Viewer (read only)',
};

// What each role may do is in shared/rules/permissions.ts, and only there.
