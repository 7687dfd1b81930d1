import jwt from 'jsonwebtoken';
import type { ServerConfig } from '@/server/config';
import { HttpError } from '@/server/lib/http-error';
import { checkPassword, hashPassword } from '@/server/lib/passwords';
import { Organisation } from '@/server/models/organisation.model';
import { User } from '@/server/models/user.model';
import { recordAudit } from '@/server/services/audit.service';
import type { SignInInput } from '@/shared/schemas/auth';
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

export async function getMe(userId: number): Promise<UserDto> {
  const user = await User.findByPk(userId, { include: [{ model: Organisation, as: 'organisation' }] });
  if (!user) throw new HttpError(401, 'unauthenticated', 'Please sign in.');
  return toUserDto(user, user.organisation!);
}

