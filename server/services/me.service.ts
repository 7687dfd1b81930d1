/** The signed-in person's own account: who they are, their contact phone and the e-mails they receive. */
import type { Sequelize } from 'sequelize';
import { HttpError, notFound } from '@/server/lib/http-error';
import type { AuthUser } from '@/server/middleware/auth';
import { NotificationSetting } from '@/server/models/notification-setting.model';
import { Organisation } from '@/server/models/organisation.model';
import { User } from '@/server/models/user.model';
import { toUserDto } from '@/server/services/auth.service';
import { NOTIFICATION_KEYS, notificationsForRole, type NotificationKey } from '@/shared/rules/notifications';
import type { MySettingsInput } from '@/shared/schemas/team';
import type { MySettings } from '@/shared/types/team';
import type { User as UserDto } from '@/shared/types/user';

export async function getMe(userId: number): Promise<UserDto> {
  const user = await User.findByPk(userId, { include: [{ model: Organisation, as: 'organisation' }] });
  if (!user) throw new HttpError(401, 'unauthenticated', 'Please sign in.');
  return toUserDto(user, user.organisation!);
}

function toSettings(user: User, row: NotificationSetting | null): MySettings {
  const available = notificationsForRole(user.role);
  const notifications = Object.fromEntries(NOTIFICATION_KEYS.map((k) => [k, available.includes(k) && (row ? row[k] : true)])) as Record<NotificationKey, boolean>;
  return { email: user.email, contactPhone: user.phone ?? null, notifications, available };
}

export async function getMySettings(actor: AuthUser): Promise<MySettings> {
  const user = await User.findByPk(actor.id);
  if (!user) throw notFound('User');
  return toSettings(user, await NotificationSetting.findByPk(actor.id));
}

/** Saves the contact phone and the e-mail choices; choices the role cannot receive are kept as they were. */
export async function updateMySettings(sequelize: Sequelize, actor: AuthUser, input: MySettingsInput): Promise<MySettings> {
  return sequelize.transaction(async (transaction) => {
    const user = await User.findByPk(actor.id, { transaction, lock: transaction.LOCK.UPDATE });
    if (!user) throw notFound('User');
    if (input.contactPhone !== undefined) await user.update({ phone: input.contactPhone || null }, { transaction });
    let row = await NotificationSetting.findByPk(actor.id, { transaction, lock: transaction.LOCK.UPDATE });
    const available = notificationsForRole(user.role);
    const changes = Object.fromEntries(NOTIFICATION_KEYS.filter((k) => available.includes(k) && typeof input.notifications?.[k] === 'boolean').map((k) => [k, input.notifications![k]!]));
    if (Object.keys(changes).length) {
      row = row ? await row.update(changes, { transaction }) : await NotificationSetting.create({ userId: actor.id, raised: true, cleared: true, digest: true, myTags: true, ...changes }, { transaction });
    }
    return toSettings(user, row);
  });
}
