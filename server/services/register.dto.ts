import type { Asset } from '@/server/models/asset.model';
import type { Photo } from '@/server/models/photo.model';
import type { PlantRoom } from '@/server/models/plant-room.model';
import type { Site } from '@/server/models/site.model';
import type { User } from '@/server/models/user.model';
import { isServiceOverdue } from '@/shared/rules/register';
import { localDate } from '@/shared/rules/time-zone';
import type { Asset as AssetDto, Photo as PhotoDto, PlantRoom as PlantRoomDto, Site as SiteDto } from '@/shared/types/register';

// Shapes of shared/types/register.ts: column names never reach the client.

const person = (user: User | undefined, id: number) => ({ id, name: user?.name ?? '' });

const photoUrl = (id: number) => `/api/photos/${id}`;
const thumbnailUrl = (id: number) => `/api/photos/${id}/thumbnail`;

export function toPhotoDto(photo: Photo): PhotoDto {
  return {
    id: photo.id,
    url: photoUrl(photo.id),
    thumbnailUrl: thumbnailUrl(photo.id),
    width: photo.width,
    height: photo.height,
    caption: photo.caption,
    createdAt: photo.createdAt.toISOString(),
    createdBy: person(photo.creator, photo.createdBy),
  };
}

export function toSiteDto(site: Site, counts: { plantRoomCount: number; assetCount: number }): SiteDto {
  return {
    id: site.id,
    name: site.name,
    address: site.address,
    timeZone: site.timeZone,
    clientContactName: site.clientContactName,
    clientContactPhone: site.clientContactPhone,
    clientContactEmail: site.clientContactEmail,
    plantRoomCount: counts.plantRoomCount,
    assetCount: counts.assetCount,
    createdAt: site.createdAt.toISOString(),
    updatedAt: site.updatedAt.toISOString(),
  };
}

export function toPlantRoomDto(room: PlantRoom, extra: { assetCount: number; liveTagCount: number; photos: Photo[] }): PlantRoomDto {
  return {
    id: room.id,
    siteId: room.siteId,
    siteName: room.site?.name ?? '',
    name: room.name,
    floorArea: room.floorArea,
    accessNotes: room.accessNotes,
    safety: {
      emergencyStop: room.emergencyStop,
      gasIsolation: room.gasIsolation,
      electricalIsolator: room.electricalIsolator,
      firstAid: room.firstAid,
      exits: room.exits,
    },
    assetCount: extra.assetCount,
    liveTagCount: extra.liveTagCount,
    photos: extra.photos.map(toPhotoDto),
    createdBy: person(room.creator, room.createdBy),
    createdAt: room.createdAt.toISOString(),
    updatedAt: room.updatedAt.toISOString(),
  };
}

/** `now` decides overdue: the next service date is compared with today's date at the site. */
type AssetBaseDto = Omit<AssetDto, 'state' | 'overdue' | 'liveIsolations' | 'liveOverrides' | 'unprovedIsolations'>;

/** The register's view of an item; its tag state is added by the assets service. */
export function toAssetDto(asset: Asset, extra: { photos?: Photo[]; thumbnailPhotoId: number | null; now?: Date }): AssetBaseDto {
  const today = localDate(extra.now ?? new Date(), asset.site?.timeZone ?? 'UTC');
  return {
    id: asset.id,
    siteId: asset.siteId,
    siteName: asset.site?.name ?? '',
    plantRoomId: asset.plantRoomId,
    plantRoomName: asset.plantRoom?.name ?? null,
    plantId: asset.plantId,
    labelCode: asset.labelCode,
    name: asset.name,
    type: asset.type,
    system: asset.system,
    energySources: asset.energySources,
    manufacturer: asset.manufacturer,
    model: asset.model,
    serialNumber: asset.serialNumber,
    installDate: asset.installDate,
    serviceIntervalMonths: asset.serviceIntervalMonths,
    lastServiceDate: asset.lastServiceDate,
    nextServiceDue: asset.nextServiceDue,
    serviceOverdue: !asset.archivedAt && isServiceOverdue(asset.nextServiceDue, today),
    notes: asset.notes,
    attributes: asset.attributes,
    archived: !!asset.archivedAt,
    archivedAt: asset.archivedAt ? asset.archivedAt.toISOString() : null,
    ...(extra.photos ? { photos: extra.photos.map(toPhotoDto) } : {}),
    thumbnailUrl: extra.thumbnailPhotoId ? thumbnailUrl(extra.thumbnailPhotoId) : null,
    createdBy: person(asset.creator, asset.createdBy),
    createdAt: asset.createdAt.toISOString(),
    updatedAt: asset.updatedAt.toISOString(),
  };
}
