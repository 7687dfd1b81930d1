import type { Transaction } from 'sequelize';
import type { PhotoStorage } from '@/server/lib/photo-storage';
import { insertWithLabelCode } from '@/server/lib/unique-clash';
import { Asset } from '@/server/models/asset.model';
import { PlantRoom } from '@/server/models/plant-room.model';
import { Site } from '@/server/models/site.model';
import type { User } from '@/server/models/user.model';
import { storePhoto } from '@/server/services/photos.service';
import { DEMO_SITES, type DemoAuthor, type DemoItem } from '@/server/seed/demo-register-data';
import { itemPlaceholderSvg, renderPlaceholder, roomPlaceholderSvg } from '@/server/seed/demo-photos';
import { addMonths, nextServiceDue } from '@/shared/rules/register';
import { localDate } from '@/shared/rules/time-zone';

const TIME_ZONE = 'Europe/London';

/**
 * Seeds the demo register (sites, plant rooms, items, placeholder photos) into the demo organisation,
 * once: returns false when the organisation already has sites. Service dates are set relative to today,
 * so the same items are overdue whenever the demo is started.
 */
export async function seedDemoRegister(opts: {
  organisationId: number;
  authors: Record<DemoAuthor, User>;
  storage: PhotoStorage;
  transaction: Transaction;
  now?: Date;
}): Promise<boolean> {
  const { organisationId, authors, storage, transaction } = opts;
  if (await Site.count({ where: { organisationId }, transaction })) return false;
  const today = localDate(opts.now ?? new Date(), TIME_ZONE);
  const photoJobs: (() => Promise<unknown>)[] = [];

  const createItem = async (siteId: number, plantRoomId: number | null, code: string, item: DemoItem, author: User) => {
    const lastServiceDate = item.servicedMonthsAgo === null ? null : addMonths(today, -item.servicedMonthsAgo);
    const asset = await insertWithLabelCode((labelCode) =>
      Asset.create(
        {
          organisationId, siteId, plantRoomId, labelCode,
          plantId: item.plantId, name: item.name, type: item.type, system: item.system, energySources: item.energySources,
          manufacturer: `Maker ${String.fromCharCode(65 + (item.plantId.charCodeAt(0) % 6))}`,
          model: `${item.type.slice(0, 2).toUpperCase()}-${100 + item.plantId.length * 37}`,
          serialNumber: `${code}-${item.plantId.replace(/[^A-Z0-9]/g, '')}-${item.installYear}`,
          installDate: `${item.installYear}-0${(item.plantId.length % 9) + 1}-15`,
          serviceIntervalMonths: item.serviceIntervalMonths,
          lastServiceDate,
          nextServiceDue: nextServiceDue(lastServiceDate, item.serviceIntervalMonths),
          notes: item.notes ?? '',
          attributes: item.attributes,
          createdBy: author.id,
        },
        { transaction },
      ),
    );
    if (item.photo) {
      photoJobs.push(async () =>
        storePhoto(storage, { organisationId, assetId: asset.id, createdBy: author.id, caption: `${item.plantId} (placeholder drawing)` },
          await renderPlaceholder(itemPlaceholderSvg(item.plantId, item.name)), transaction),
      );
    }
  };

  for (const s of DEMO_SITES) {
    const site = await Site.create(
      {
        organisationId, name: s.name, address: s.address, timeZone: TIME_ZONE,
        clientContactName: s.contact.name, clientContactPhone: s.contact.phone, clientContactEmail: s.contact.email,
        createdBy: authors.supervisor.id,
      },
      { transaction },
    );
    for (const r of s.rooms) {
      const author = authors[r.author];
      const room = await PlantRoom.create(
        { organisationId, siteId: site.id, name: r.name, floorArea: r.floorArea, accessNotes: r.accessNotes, ...r.safety, createdBy: author.id },
        { transaction },
      );
      if (r.photo) {
        photoJobs.push(async () =>
          storePhoto(storage, { organisationId, plantRoomId: room.id, createdBy: author.id, caption: `${r.name} (placeholder drawing)` },
            await renderPlaceholder(roomPlaceholderSvg(r.name, s.name)), transaction),
        );
      }
      for (const item of r.items) await createItem(site.id, room.id, s.code, item, author);
    }
    for (const item of s.looseItems) await createItem(site.id, null, s.code, item, authors.engineer);
  }
  // Photos one after another: the transaction's single connection takes one statement at a time.
  for (const job of photoJobs) await job();
  return true;
}
