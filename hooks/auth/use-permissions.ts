import { useMeQuery } from '@/hooks/api/use-auth';
import { canEdit, isSupervisory } from '@/shared/rules/roles';

/**
 * What the signed-in user may do in the register, to hide or disable actions. The server enforces the same
 * rules; this only spares people buttons that would be refused.
 */
export function usePermissions() {
  const me = useMeQuery().data;
  const role = me?.role ?? 'viewer';
  const supervisory = isSupervisory(role);
  return {
    userId: me?.id ?? 0,
    /** Engineers and up add plant rooms, items and photos. */
    canAdd: canEdit(role),
    canCreateSite: supervisory,
    canArchive: supervisory,
    canImport: supervisory,
    /** Supervisors edit anything; engineers edit what they added. */
    canEditRecord: (createdBy: { id: number } | null | undefined) => supervisory || (canEdit(role) && !!createdBy && createdBy.id === me?.id),
  };
}
