import { describe, expect, it } from 'vitest';
import { RECORD_PERMISSIONS, ROLE_PERMISSIONS, ROLE_PERMISSION_NAMES, may, permissionsOf } from '@/shared/rules/permissions';
import { ROLES } from '@/shared/rules/roles';

describe('the permission map', () => {
  it('answers every named check for every role from its own list, and nothing for nobody', () => {
    for (const permission of ROLE_PERMISSION_NAMES) {
      for (const role of ROLES) expect(may({ role }, permission)).toBe((ROLE_PERMISSIONS[permission] as readonly string[]).includes(role));
      expect(may(null, permission)).toBe(false);
    }
  });

  it('keeps a viewer to reading: every permission a viewer holds is a looking one', () => {
    // common practice, no published source: a read-only account changes nothing and receives no tag mail
    expect(permissionsOf('viewer').sort()).toEqual(['viewBoard', 'viewRegister']);
  });

  it('keeps team administration and the audit log to administrators', () => {
    expect(ROLE_PERMISSIONS.administerTeam).toEqual(['admin']);
    expect(ROLE_PERMISSIONS.viewAudit).toEqual(['admin']);
    // common practice, no published source: every permission but the viewer's limited view is an administrator's
    expect(permissionsOf('admin')).toEqual(ROLE_PERMISSION_NAMES);
  });
});

describe('record checks', () => {
  const engineer = { id: 7, role: 'engineer' as const };
  const supervisor = { id: 8, role: 'supervisor' as const };
  const viewer = { id: 9, role: 'viewer' as const };

  it('lets an engineer edit what they added and a supervisor anything; a viewer nothing', () => {
    expect(RECORD_PERMISSIONS.editRecord(engineer, { createdBy: 7 })).toBe(true);
    expect(RECORD_PERMISSIONS.editRecord(engineer, { createdBy: 8 })).toBe(false);
    expect(RECORD_PERMISSIONS.editRecord(engineer, { createdBy: null })).toBe(false);
    expect(RECORD_PERMISSIONS.editRecord(supervisor, { createdBy: 7 })).toBe(true);
    expect(RECORD_PERMISSIONS.editRecord(viewer, { createdBy: 9 })).toBe(false);
  });

  it('lets only the holder clear, a supervisor clear in absence, and nobody clear a cleared tag', () => {
    // OSHA 29 CFR 1910.147(e)(3): each device removed by the employee who applied it
    expect(RECORD_PERMISSIONS.clearTag(engineer, { holderId: 7, status: 'live' })).toBe(true);
    expect(RECORD_PERMISSIONS.clearTag(engineer, { holderId: 8, status: 'live' })).toBe(false);
    // OSHA 29 CFR 1910.147(e)(3)(i)-(iii): removal by others under a documented procedure, directed by the employer
    expect(RECORD_PERMISSIONS.clearTag(supervisor, { holderId: 7, status: 'live' })).toBe(true);
    expect(RECORD_PERMISSIONS.clearTag(engineer, { holderId: 7, status: 'cleared' })).toBe(false);
    expect(RECORD_PERMISSIONS.addTagPhoto(viewer, { holderId: 9, status: 'live' })).toBe(false);
  });
});
