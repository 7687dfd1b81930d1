export const ROLES = ['admin', 'supervisor', 'engineer', 'viewer'] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  admin: 'Administrator',
  supervisor: 'Supervisor',
  engineer: 'Engineer',
  viewer: 'Viewer (read only)',
};

/** Roles that may change the register and raise tags. */
export const canEdit = (role: Role) => role !== 'viewer';
/** Roles that oversee every site: the board, clearance in absence, archiving. */
export const isSupervisory = (role: Role) => role === 'admin' || role === 'supervisor';
