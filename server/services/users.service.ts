/** The organisation's people: the list, one person, and team administration (invite, role, active, a viewer's sites). */
import { Op, UniqueConstraintError, type Sequelize, type Transaction } from 'sequelize';
import { HttpError, forbidden, notFound, unprocessable } from '@/server/lib/http-error';
import type { AuthUser } from '@/server/middleware/auth';
import { Organisation } from '@/server/models/organisation.model';
import { Site } from '@/server/models/site.model';
import { User } from '@/server/models/user.model';
import { UserSiteAccess } from '@/server/models/user-site-access.model';
import { recordAudit } from '@/server/services/audit.service';
import { issuePasswordLink, withdrawPasswordLinks } from '@/server/services/auth.service';
import { siteIdsByUser } from '@/server/services/site-access.service';
import { listPage, pageRows, type Paging } from '@/shared/rules/paging';
import { may, rolesWith } from '@/shared/rules/permissions';
import type { ChangeUserInput, InviteUserInput, SiteAccessInput } from '@/shared/schemas/team';
import type { ListResponse } from '@/shared/types/api';
import type { TeamMember } from '@/shared/types/team';

function toTeamMember(u: User, siteIds: number[]): TeamMember {
  return { id: u.id, name: u.name, email: u.email, role: u.role, active: u.active, phone: u.phone ?? null, invitePending: !u.passwordHash, siteIds: may(u, 'seeEverySite') ? [] : siteIds };
}

async function teamMembers(users: User[], transaction?: Transaction): Promise<TeamMember[]> {
  const sites = await siteIdsByUser(users.map((u) => u.id), transaction);
  return users.map((u) => toTeamMember(u, sites.get(u.id) ?? []));
}

async function findMember(actor: AuthUser, id: number, transaction: Transaction): Promise<User> {
  const user = await User.findOne({ where: { id, organisationId: actor.organisationId }, transaction, lock: transaction.LOCK.UPDATE });
  if (!user) throw notFound('User');
  return user;
}

export async function listUsers(actor: AuthUser, paging: Paging): Promise<ListResponse<TeamMember>> {
  const { rows, count } = await User.findAndCountAll({
    where: { organisationId: actor.organisationId },
    order: [['name', 'ASC']],
    ...pageRows(paging),
  });
  return listPage(await teamMembers(rows), count, paging);
}

/** Another organisation's user is answered exactly like a missing one. */
export async function getUser(actor: AuthUser, id: number): Promise<TeamMember> {
  const user = await User.findOne({ where: { id, organisationId: actor.organisationId } });
  if (!user) throw notFound('User');
  return (await teamMembers([user]))[0];
}

const EMAIL_UNAVAILABLE = 'This address cannot be invited. If the person is not in your team list, ask them for another address.';

/** Adds a person with no password and e-mails them a 7-day one-time link to choose one. */
export async function inviteUser(sequelize: Sequelize, actor: AuthUser, input: InviteUserInput, ip: string | null): Promise<TeamMember> {
  try {
    return await sequelize.transaction(async (transaction) => {
      const user = await User.create({ organisationId: actor.organisationId, name: input.name, email: input.email, role: input.role, passwordHash: null }, { transaction });
      await issuePasswordLink(sequelize, user, 'invite', { createdBy: actor.id, invitedBy: actor.name, transaction });
      await recordAudit({ type: 'user-invited', organisationId: actor.organisationId, userId: user.id, actorId: actor.id, detail: { email: user.email, role: user.role }, ip }, transaction);
      return toTeamMember(user, []);
    });
  } catch (err) {
    // Addresses are unique across the whole service. One answer whether the address is on this team or held by
    // another organisation, and it never says "has an account": the team list shows who is here already.
    if (err instanceof UniqueConstraintError) throw new HttpError(409, 'email-taken', EMAIL_UNAVAILABLE, { email: EMAIL_UNAVAILABLE });
    throw err;
  }
}

/** Sends a fresh invitation to someone who has not yet chosen a password; earlier links stop working. */
export async function resendInvite(sequelize: Sequelize, actor: AuthUser, id: number, ip: string | null): Promise<TeamMember> {
  return sequelize.transaction(async (transaction) => {
    const user = await findMember(actor, id, transaction);
    if (user.passwordHash) throw new HttpError(409, 'already-joined', 'This person has already chosen a password.');
    if (!user.active) throw new HttpError(409, 'inactive', 'Reactivate this person before inviting them again.');
    await issuePasswordLink(sequelize, user, 'invite', { createdBy: actor.id, invitedBy: actor.name, transaction });
    await recordAudit({ type: 'user-invited', organisationId: actor.organisationId, userId: user.id, actorId: actor.id, detail: { email: user.email, role: user.role, resent: true }, ip }, transaction);
    return (await teamMembers([user], transaction))[0];
  });
}

/**
 * Changes a role and/or deactivates or reactivates. Deactivation raises the token version as well, so every
 * session ends at once (the auth middleware also refuses inactive users). An admin cannot change their own role
 * or deactivate themselves, and the organisation always keeps one active admin.
 */
export async function changeUser(sequelize: Sequelize, actor: AuthUser, id: number, input: ChangeUserInput, ip: string | null): Promise<TeamMember> {
  return sequelize.transaction(async (transaction) => {
    // One change of roles or active state per organisation at a time, and only by someone still an active admin
    // when it runs: two admins deactivating each other at the same moment must not leave no admin at all.
    await Organisation.findByPk(actor.organisationId, { transaction, lock: transaction.LOCK.UPDATE });
    const self = await User.findByPk(actor.id, { transaction });
    if (!self || !self.active || !may(self, 'administerTeam')) throw forbidden();
    const user = await findMember(actor, id, transaction);
    const newRole = input.role ?? user.role;
    const newActive = input.active ?? user.active;
    if (user.id === actor.id && (newRole !== user.role || !newActive)) {
      throw new HttpError(409, 'self', 'You cannot change your own role or deactivate yourself. Ask another admin.');
    }
    // The last active person who may administer the team keeps that role and stays active.
    if (may(user, 'administerTeam') && user.active && (!may({ role: newRole }, 'administerTeam') || !newActive)) {
      const admins = await User.count({ where: { organisationId: actor.organisationId, role: rolesWith('administerTeam'), active: true, id: { [Op.ne]: user.id } }, transaction });
      if (admins === 0) throw new HttpError(409, 'last-admin', 'The organisation needs at least one active admin.');
    }
    const audit = (type: 'role-change' | 'user-deactivated' | 'user-reactivated', detail: Record<string, unknown>) =>
      recordAudit({ type, organisationId: actor.organisationId, userId: user.id, actorId: actor.id, detail, ip }, transaction);
    if (newRole !== user.role) {
      await audit('role-change', { from: user.role, to: newRole });
      user.role = newRole;
    }
    if (newActive !== user.active) {
      if (!newActive) {
        user.tokenVersion = user.tokenVersion + 1;
        await withdrawPasswordLinks(user.id, transaction);
      }
      await audit(newActive ? 'user-reactivated' : 'user-deactivated', {});
      user.active = newActive;
    }
    await user.save({ transaction });
    return (await teamMembers([user], transaction))[0];
  });
}

/** Replaces the list of sites a viewer may see. Other roles see every site, so a list for them is refused. */
export async function setSiteAccess(sequelize: Sequelize, actor: AuthUser, id: number, input: SiteAccessInput, ip: string | null): Promise<TeamMember> {
  return sequelize.transaction(async (transaction) => {
    const user = await findMember(actor, id, transaction);
    if (may(user, 'seeEverySite')) throw unprocessable('Only viewers are limited to particular sites; other roles see every site.', { siteIds: 'Only viewers are limited to particular sites.' });
    const wanted = [...new Set(input.siteIds)].sort((a, b) => a - b);
    const found = wanted.length ? await Site.count({ where: { id: wanted, organisationId: actor.organisationId }, transaction }) : 0;
    if (found !== wanted.length) throw unprocessable('Some fields need attention.', { siteIds: 'A site in the list does not exist.' });
    const current = (await UserSiteAccess.findAll({ where: { userId: user.id }, transaction })).map((r) => r.siteId);
    const added = wanted.filter((s) => !current.includes(s));
    const removed = current.filter((s) => !wanted.includes(s));
    if (removed.length) await UserSiteAccess.destroy({ where: { userId: user.id, siteId: removed }, transaction });
    if (added.length) await UserSiteAccess.bulkCreate(added.map((siteId) => ({ userId: user.id, siteId, grantedBy: actor.id })), { transaction });
    if (added.length || removed.length) {
      await recordAudit({ type: 'site-access-change', organisationId: actor.organisationId, userId: user.id, actorId: actor.id, detail: { added, removed, siteIds: wanted }, ip }, transaction);
    }
    return toTeamMember(user, wanted);
  });
}
