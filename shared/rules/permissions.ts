import type { Role } from '@/shared/rules/roles';
import type { TagLike } from '@/shared/rules/tags';

/**
 * Who may do what, in one place. The server's `requirePermission` middleware and `ensurePermission`,
 * the client's navigation, home screen and buttons all read this map; no role list is written anywhere else.
 * Organisation scope (another organisation's record answers 404) and a viewer's site limits are separate:
 * they decide which records an actor sees, this map decides what the actor may do with them.
 */
export const ROLE_PERMISSIONS = {
  /** Read the register, tags, readings and labels (a viewer only on the sites given to them). */
  viewRegister: ['admin', 'supervisor', 'engineer', 'viewer'],
  /** See every site of the organisation; the others see only the sites given to them. */
  seeEverySite: ['admin', 'supervisor', 'engineer'],
  /** Add plant rooms, items and photos; edit what they added. */
  addToRegister: ['admin', 'supervisor', 'engineer'],
  /** Edit any plant room or item, whoever added it. */
  editAnyRecord: ['admin', 'supervisor'],
  /** Create and change sites. */
  manageSites: ['admin', 'supervisor'],
  /** Archive items. */
  archiveRecords: ['admin', 'supervisor'],
  /** Import the register from CSV. */
  importRegister: ['admin', 'supervisor'],
  /** Log readings and record a heating system's design values (read on site, so engineers too). */
  recordReadings: ['admin', 'supervisor', 'engineer'],
  /** Raise an isolation or override tag. */
  raiseTag: ['admin', 'supervisor', 'engineer'],
  /** Hold a tag: be offered one, take one over, or be named its new holder in the holder's absence. */
  holdTags: ['admin', 'supervisor', 'engineer'],
  /** Add notes and photos to a live tag. */
  annotateTag: ['admin', 'supervisor', 'engineer'],
  /** Oversee tags everywhere: clear in the holder's absence, extend others' tags, the longer expiry limit. */
  superviseTags: ['admin', 'supervisor'],
  /** Record a site's periodic review of its isolation procedure (OSHA 29 CFR 1910.147(c)(6)). */
  reviewProcedures: ['admin', 'supervisor'],
  /** Replace an item's QR label (the old code stops working); engineers only on items they may edit. */
  replaceLabel: ['admin', 'supervisor', 'engineer'],
  /** The board of live tags across sites. */
  viewBoard: ['admin', 'supervisor', 'viewer'],
  /** Act from the board (open a tag to clear, extend or hand over); viewers only look. */
  actOnBoard: ['admin', 'supervisor'],
  /** List the people of the organisation (names on the board's filter, the holder picker). */
  listPeople: ['admin', 'supervisor'],
  /** Invite people, change roles, deactivate, give viewers their sites. */
  administerTeam: ['admin'],
  /** Read the audit log. */
  viewAudit: ['admin'],
  /** Start and end one's own visits to a site. */
  recordVisits: ['admin', 'supervisor', 'engineer'],
  /** Read everyone's visits, filter them by person, and receive end-of-visit summaries. */
  superviseVisits: ['admin', 'supervisor'],
  /** E-mails about every tag in the organisation (raised, cleared, morning digest). */
  receiveOrganisationMail: ['admin', 'supervisor'],
  /** E-mails about the tags one holds (cleared in absence, taken over). */
  receiveOwnTagMail: ['admin', 'supervisor', 'engineer'],
} as const satisfies Record<string, readonly Role[]>;

export type RolePermission = keyof typeof ROLE_PERMISSIONS;
export const ROLE_PERMISSION_NAMES = Object.keys(ROLE_PERMISSIONS) as RolePermission[];

/** The person acting: the signed-in user on either side. */
export interface Actor {
  id: number;
  role: Role;
}

/** May this actor (or nobody, when signed out) do this? */
export function may(actor: Pick<Actor, 'role'> | null | undefined, permission: RolePermission): boolean {
  return !!actor && (ROLE_PERMISSIONS[permission] as readonly Role[]).includes(actor.role);
}

/** The roles holding a permission, for a query that selects people by it (who gets which e-mail). */
export const rolesWith = (permission: RolePermission): Role[] => [...ROLE_PERMISSIONS[permission]];

/** Everything a role may do, for a role's description and for tests. */
export const permissionsOf = (role: Role): RolePermission[] => ROLE_PERMISSION_NAMES.filter((p) => may({ role }, p));

type TagSubject = Pick<TagLike, 'holderId' | 'status'>;

/**
 * Who may clear: only the person who holds the tag (OSHA 29 CFR 1910.147(e)(3)); a supervisor may clear someone
 * else's tag only through the removal-in-absence procedure (the exception in 1910.147(e)(3)(i)–(iii)).
 */
export function clearancePermission(actor: Actor, tag: TagSubject): 'own' | 'in-absence' | 'none' {
  if (tag.status !== 'live' || !may(actor, 'holdTags')) return 'none';
  if (actor.id === tag.holderId) return 'own';
  return may(actor, 'superviseTags') ? 'in-absence' : 'none';
}

/** Extend: the holder, or a supervisor. */
export function mayExtend(actor: Actor, tag: TagSubject): boolean {
  return tag.status === 'live' && (actor.id === tag.holderId || may(actor, 'superviseTags'));
}

/** Reassignment in absence: a supervisor or admin moves someone else's live tag through the absence procedure. */
export function mayReassignInAbsence(actor: Actor, tag: TagSubject): boolean {
  return tag.status === 'live' && may(actor, 'superviseTags') && actor.id !== tag.holderId;
}

/** Checks that depend on the record as well as the role. */
export const RECORD_PERMISSIONS = {
  /** Edit a plant room or item: anyone who may edit any record, or the engineer who added it. */
  editRecord: (actor: Actor, record: { createdBy: number | null | undefined }) =>
    may(actor, 'editAnyRecord') || (may(actor, 'addToRegister') && record.createdBy != null && record.createdBy === actor.id),
  /** Clear a tag: its holder; a supervisor through clearance in absence (clearancePermission above). */
  clearTag: (actor: Actor, tag: TagSubject) => clearancePermission(actor, tag) !== 'none',
  extendTag: (actor: Actor, tag: TagSubject) => mayExtend(actor, tag),
  /** Move an absent holder's tag to a colleague: a supervisor's absence procedure (mayReassignInAbsence above). A hand-over between two people present is offer and acceptance (shared/rules/tag-handover.ts). */
  reassignTagInAbsence: (actor: Actor, tag: TagSubject) => mayReassignInAbsence(actor, tag),
  /** Replace an item's label: only someone who may edit the item, as a new code kills the printed one. */
  replaceItemLabel: (actor: Actor, record: { createdBy: number | null | undefined }) => may(actor, 'replaceLabel') && RECORD_PERMISSIONS.editRecord(actor, record),
  /** Add a photo of the lock or tag in place: while the tag is live. */
  addTagPhoto: (actor: Actor, tag: TagSubject) => tag.status === 'live' && may(actor, 'annotateTag'),
} as const;
