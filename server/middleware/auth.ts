import type { RequestHandler } from 'express';
import jwt from 'jsonwebtoken';
import { may, type RolePermission } from '@/shared/rules/permissions';
import type { Role } from '@/shared/rules/roles';
import { HttpError, forbidden } from '@/server/lib/http-error';
import { User } from '@/server/models/user.model';
import { grantedSiteIds } from '@/server/services/site-access.service';

export interface AuthUser {
  id: number;
  organisationId: number;
  role: Role;
  name: string;
  email: string;
  /** The sites given to a user who does not see every site (a viewer); read once per request by `auth`. */
  siteIds?: number[];
}

declare module 'express-serve-static-core' {
  interface Request {
    user?: AuthUser;
  }
}

interface TokenClaims {
  sub: string;
  org: number;
  ver: number;
}

const unauthenticated = (message = 'Please sign in.') => new HttpError(401, 'unauthenticated', message);

/**
 * Checks the bearer token, then the user row on every request, so a signed-out (token version raised)
 * or deactivated user is refused at once, not when the token expires.
 */
export const auth =
  (jwtSecret: string): RequestHandler =>
  async (req, _res, next) => {
    try {
      const header = req.get('authorization') ?? '';
      const match = /^Bearer\s+(.+)$/i.exec(header);
      if (!match) throw unauthenticated();
      let claims: TokenClaims;
      try {
        claims = jwt.verify(match[1], jwtSecret, { algorithms: ['HS256'] }) as unknown as TokenClaims;
      } catch (err) {
        throw unauthenticated(err instanceof jwt.TokenExpiredError ? 'Your session has expired. Please sign in again.' : 'Please sign in.');
      }
      const user = await User.findByPk(Number(claims.sub));
      if (!user || !user.active || user.tokenVersion !== claims.ver || user.organisationId !== claims.org) {
        throw unauthenticated('Your session has ended. Please sign in again.');
      }
      const siteIds = may(user, 'seeEverySite') ? undefined : await grantedSiteIds(user.id);
      req.user = { id: user.id, organisationId: user.organisationId, role: user.role, name: user.name, email: user.email, siteIds };
      next();
    } catch (err) {
      next(err);
    }
  };

/** A route's permission check; it names its permission, so tests read from the router which route needs which. */
export type PermissionGuard = RequestHandler & { readonly permission: RolePermission };

/** Refuses (403) an actor the permission map (shared/rules/permissions.ts) does not allow; behind `auth`. */
export function requirePermission(permission: RolePermission): PermissionGuard {
  const guard: RequestHandler = (req, _res, next) => {
    if (!req.user) return next(unauthenticated());
    if (!may(req.user, permission)) return next(forbidden());
    next();
  };
  return Object.assign(guard, { permission });
}

/** The same check inside a service, where the refusal can say why in the trade's words. */
export function ensurePermission(actor: AuthUser, permission: RolePermission, message?: string) {
  if (!may(actor, permission)) throw forbidden(message);
}


/** The signed-in user; only call behind `auth`. */
export function currentUser(req: { user?: AuthUser }): AuthUser {
  if (!req.user) throw unauthenticated();
  return req.user;
}
