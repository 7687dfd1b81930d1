import type { NotificationKey } from '@/shared/rules/notifications';
import type { Role } from '@/shared/rules/roles';

/** A person in the organisation, as the team administration screens show them. */
export interface TeamMember {
  id: number;
  name: string;
  email: string;
  role: Role;
  active: boolean;
  phone: string | null;
  /** Invited, and has not yet set a password. */
  invitePending: boolean;
  /** Sites a viewer may see. Empty for other roles, which see every site. */
  siteIds: number[];
}

/** One line of the audit log (`GET /api/audit`), newest first. */
export interface AuditEntry {
  id: number;
  type: string;
  at: string;
  userId: number | null;
  actorId: number | null;
  detail: Record<string, unknown> | null;
  ip: string | null;
}

/** `GET /api/me/settings` and the answer to `PATCH /api/me/settings`. */
export interface MySettings {
  email: string;
  /** Shown on tags this person raises (prefilled) and on the board. */
  contactPhone: string | null;
  notifications: Record<NotificationKey, boolean>;
  /** The notification keys this person's role can receive; show only these. */
  available: NotificationKey[];
}

/** Answer to `POST /api/auth/password/reset-request`: the same whether or not the address exists. */
export interface ResetRequestResponse {
  message: string;
}

/** Answer to `POST /api/auth/password/set`: the address to sign in with. */
export interface SetPasswordResponse {
  email: string;
}

/** An e-mail the outbox gave up on (the mail server refused it for good), as the team screen lists them for admins. */
export interface UndeliveredMail {
  id: number;
  /** The kind of e-mail (server/mail/outbox.ts MAIL_KINDS): invite, password-reset, tag-raised, … */
  kind: string;
  toEmail: string;
  createdAt: string;
  givenUpAt: string;
  attempts: number;
  /** What the mail server last said. */
  lastError: string | null;
}
