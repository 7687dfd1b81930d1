import { useMeQuery } from '@/hooks/api/use-auth';
import { RECORD_PERMISSIONS, may, type Actor, type RolePermission } from '@/shared/rules/permissions';

/**
 * What the signed-in user may do, read from the permission map (shared/rules/permissions.ts), to hide or
 * disable what the server would refuse. Signed out, or before `/me` answers, nothing is allowed.
 */
export function usePermissions() {
  const me = useMeQuery().data;
  const actor: Actor | null = me ? { id: me.id, role: me.role } : null;
  const can = (permission: RolePermission) => may(actor, permission);
  return {
    actor,
    userId: me?.id ?? 0,
    may: can,
    /** A check that also depends on the record (who added it, who holds the tag). */
    mayOn: <K extends keyof typeof RECORD_PERMISSIONS>(check: K, record: Parameters<(typeof RECORD_PERMISSIONS)[K]>[1]) =>
      !!actor && (RECORD_PERMISSIONS[check] as (a: Actor, r: typeof record) => boolean)(actor, record),
    canAdd: can('addToRegister'),
    canCreateSite: can('manageSites'),
    canArchive: can('archiveRecords'),
    canImport: can('importRegister'),
    /** Supervisors edit anything; engineers edit what they added. */
    canEditRecord: (createdBy: { id: number } | null | undefined) => !!actor && RECORD_PERMISSIONS.editRecord(actor, { createdBy: createdBy?.id }),
  };
}
