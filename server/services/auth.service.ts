/** Signing in and out, and passwords: invitation and reset links, and setting a password from one. */
import crypto from 'node:crypto';
import jwt from 'jsonwebtoken';
import { Op, type Sequelize, type Transaction } from 'sequelize';
import type { ServerConfig } from '@/server/config';
import { clock } from '@/server/lib/clock';
import { HttpError } from '@/server/lib/http-error';
import { checkPassword, hashPassword } from '@/server/lib/passwords';
import { enqueueMail } from '@/server/mail/outbox';
import { Organisation } from '@/server/models/organisation.model';
import { PasswordToken, type PasswordTokenPurpose } from '@/server/models/password-token.model';
import { User } from '@/server/models/user.model';
import { recordAudit } from '@/server/services/audit.service';
import { INVITE_TTL_HOURS, RESET_TTL_HOURS } from '@/shared/rules/notifications';
import type { SignInInput } from '@/shared/schemas/auth';
import type { ResetRequestInput, SetPasswordInput } from '@/shared/schemas/team';
import type { ResetRequestResponse, SetPasswordResponse } from '@/shared/types/team';
import type { SignInResponse, User as UserDto } from '@/shared/types/user';

export function toUserDto(user: User, organisation: Organisation): UserDto {
  return { id: user.id, name: user.name, email: user.email, role: user.role, organisation: { id: organisation.id, name: organisation.name } };
}

export async function signIn(input: SignInInput, config: ServerConfig, ip: string | null): Promise<SignInResponse> {
  const user = await User.findOne({ where: { email: input.email }, include: [{ model: Organisation, as: 'organisation' }] });
  // An unknown address is compared with a stand-in hash of the same cost, so both failures take the same time.
  const { ok, rehash } = await checkPassword(input.password, user?.passwordHash ?? null, config.bcryptCost);
  if (!user || !ok || !user.active) {
    await recordAudit({ type: 'sign-in-failed', organisationId: user?.organisationId ?? null, userId: user?.id ?? null, detail: { email: input.email }, ip });
    // One answer for an unknown address, a wrong password and a deactivated account.
    throw new HttpError(401, 'invalid-credentials', 'That e-mail and password do not match an active account.');
  }
  if (rehash) await user.update({ passwordHash: await hashPassword(input.password, config.bcryptCost) });
  await recordAudit({ type: 'sign-in', organisationId: user.organisationId, userId: user.id, ip });
  const token = jwt.sign({ org: user.organisationId, ver: user.tokenVersion }, config.jwtSecret, {
    algorithm: 'HS256',
    subject: String(user.id),
    expiresIn: config.tokenTtlSeconds,
  });
  return { token, user: toUserDto(user, user.organisation!) };
}

/** Ends every session of the user: tokens carry the version they were issued with. */
export async function signOut(userId: number, ip: string | null) {
  const user = await User.findByPk(userId);
  if (!user) return;
  await user.increment('tokenVersion');
  await recordAudit({ type: 'sign-out', organisationId: user.organisationId, userId: user.id, ip });
}

const sha256 = (token: string) => crypto.createHash('sha256').update(token).digest('hex');

/** The one answer to a reset request, whether or not the address belongs to anyone. */
export const RESET_REQUEST_ANSWER: ResetRequestResponse = {
  message: 'If that address belongs to an active account, a link to choose a new password is on its way. It works once, for one hour.',
};

/**
 * Issues a one-time link token (32 random bytes, base64url) and queues its e-mail in the caller's transaction.
 * Earlier unused links of the same user are withdrawn, so only the newest one works.
 */
export async function issuePasswordLink(
  sequelize: Sequelize,
  user: User,
  purpose: PasswordTokenPurpose,
  opts: { createdBy: number | null; invitedBy?: string; transaction: Transaction },
): Promise<void> {
  const now = clock.now();
  const token = crypto.randomBytes(32).toString('base64url');
  const expiresAt = new Date(now.getTime() + (purpose === 'invite' ? INVITE_TTL_HOURS : RESET_TTL_HOURS) * 3600_000);
  await PasswordToken.update({ usedAt: now }, { where: { userId: user.id, usedAt: null }, transaction: opts.transaction });
  await PasswordToken.create({ userId: user.id, purpose, tokenHash: sha256(token), expiresAt, createdBy: opts.createdBy }, { transaction: opts.transaction });
  const organisation = await Organisation.findByPk(user.organisationId, { transaction: opts.transaction });
  await enqueueMail(sequelize, [{
    organisationId: user.organisationId,
    kind: purpose === 'invite' ? 'invite' : 'password-reset',
    toEmail: user.email,
    toUserId: user.id,
    payload: { recipientName: user.name, token, expiresAt: expiresAt.toISOString(), invitedBy: opts.invitedBy, organisationName: organisation?.name },
  }], opts.transaction);
}

/** Withdraws every outstanding link of a user (deactivation). */
export async function withdrawPasswordLinks(userId: number, transaction: Transaction) {
  await PasswordToken.update({ usedAt: clock.now() }, { where: { userId, usedAt: null }, transaction });
}

/**
 * A forgotten password: an active account with that address gets a one-hour link; an unknown or deactivated
 * address gets nothing. The caller answers RESET_REQUEST_ANSWER (202) either way.
 */
export async function requestPasswordReset(sequelize: Sequelize, input: ResetRequestInput, ip: string | null): Promise<void> {
  const user = await User.findOne({ where: { email: input.email } });
  if (!user || !user.active) return;
  await sequelize.transaction(async (transaction) => {
    await issuePasswordLink(sequelize, user, 'reset', { createdBy: null, transaction });
    await recordAudit({ type: 'password-reset', organisationId: user.organisationId, userId: user.id, actorId: null, detail: { stage: 'link-sent' }, ip }, transaction);
  });
}

const badLink = () => new HttpError(400, 'link-invalid', 'This link has expired or has already been used. Ask for a new one from the sign-in page, or ask your administrator.');

/**
 * Sets the password from an invitation or reset link. The token row is locked, so of two simultaneous uses
 * one succeeds and the other finds it used. Every existing session of the user ends (token version raised).
 */
export async function setPasswordWithToken(sequelize: Sequelize, config: ServerConfig, input: SetPasswordInput, ip: string | null): Promise<SetPasswordResponse> {
  const passwordHash = await hashPassword(input.password, config.bcryptCost);
  return sequelize.transaction(async (transaction) => {
    const now = clock.now();
    const row = await PasswordToken.findOne({
      where: { tokenHash: sha256(input.token), usedAt: null, expiresAt: { [Op.gt]: now } },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!row) throw badLink();
    const user = await User.findByPk(row.userId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!user || !user.active) throw badLink();
    await row.update({ usedAt: now }, { transaction });
    await user.update({ passwordHash, tokenVersion: user.tokenVersion + 1 }, { transaction });
    await withdrawPasswordLinks(user.id, transaction);
    await recordAudit({ type: 'password-reset', organisationId: user.organisationId, userId: user.id, detail: { stage: 'password-set', purpose: row.purpose }, ip }, transaction);
    return { email: user.email };
  });
}
