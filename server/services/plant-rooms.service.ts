import { Op, QueryTypes, UniqueConstraintError } from 'sequelize';
import { HttpError } from '@/server/lib/http-error';
import type { AuthUser } from '@/server/middleware/auth';
import { PlantRoom } from '@/server/models/plant-room.model';
import { Site } from '@/server/models/site.model';
import { User } from '@/server/models/user.model';
import { photosOf } from '@/server/services/photos.service';
import { assertCanEdit, findPlantRoom, findSite, siteForField } from '@/server/services/register.lookup';
import { toPlantRoomDto } from '@/server/services/register.dto';
import { liveTagCounts, liveTagsIn } from '@/server/services/live-tags.service';
import { recordOpened } from '@/server/services/recent-places.service';
import type { PlantRoomInput } from '@/shared/schemas/register';
import type { PlantRoom as PlantRoomDto, SafetyLocations } from '@/shared/types/register';
import type { ListResponse } from '@/shared/types/api';
import { listPage, pageRows, type Paging } from '@/shared/rules/paging';

type PlantRoomPatch = Partial<Omit<PlantRoomInput, 'siteId' | 'safety'>> & { safety?: Partial<SafetyLocations> };

const include = [
  { model: Site, as: 'site', attributes: ['id', 'name'] },
  { model: User, as: 'creator', attributes: ['id', 'name'] },
];

const duplicateName = (name: string) =>
  new HttpError(409, 'conflict', `This site already has a plant room called "${name}".`, { name: 'Another plant room on this site has this name.' });

async function toDtos(rooms: PlantRoom[]): Promise<PlantRoomDto[]> {
  const ids = rooms.map((r) => r.id);
  const photos = await photosOf('plantRoomId', ids);
  const counts = new Map<number, number>();
  if (ids.length) {
    const rows = await PlantRoom.sequelize!.query<{ roomId: number; n: bigint | number }>(
      'SELECT plant_room_id AS roomId, COUNT(*) AS n FROM assets WHERE plant_room_id IN (:ids) AND archived_at IS NULL GROUP BY plant_room_id',
      { replacements: { ids }, type: QueryTypes.SELECT },
    );
    for (const r of rows) counts.set(Number(r.roomId), Number(r.n));
  }
  const live = await liveTagCounts(rooms[0]?.organisationId ?? 0, 'plantRoom', ids);
  return rooms.map((r) => toPlantRoomDto(r, { assetCount: counts.get(r.id) ?? 0, liveTagCount: live.get(r.id) ?? 0, photos: photos.get(r.id) ?? [] }));
}

export async function listSitePlantRooms(actor: AuthUser, siteId: number, paging: Paging): Promise<ListResponse<PlantRoomDto>> {
  await findSite(actor, siteId);
  const { rows, count } = await PlantRoom.findAndCountAll({
    where: { siteId, organisationId: actor.organisationId },
    include,
    order: [['name', 'ASC'], ['id', 'ASC']],
    ...pageRows(paging),
  });
  return listPage(await toDtos(rows), count, paging);
}

async function getPlantRoom(actor: AuthUser, id: number): Promise<PlantRoomDto> {
  await findPlantRoom(actor, id);
  const room = await PlantRoom.findByPk(id, { include });
  return (await toDtos([room!]))[0];
}

/** A plant room as its screen opens it: with its live tags, and remembered among the person's recent places. */
export async function openPlantRoom(actor: AuthUser, id: number): Promise<PlantRoomDto> {
  const room = await getPlantRoom(actor, id);
  await recordOpened(actor, 'plant-room', id);
  return { ...room, liveTags: await liveTagsIn(actor, { plantRoomId: id }) };
}

export async function createPlantRoom(actor: AuthUser, input: PlantRoomInput): Promise<PlantRoomDto> {
  const site = await siteForField(actor, input.siteId);
  if (await PlantRoom.findOne({ where: { siteId: site.id, name: input.name } })) throw duplicateName(input.name);
  try {
    const room = await PlantRoom.create({
      organisationId: actor.organisationId,
      siteId: site.id,
      name: input.name,
      floorArea: input.floorArea,
      accessNotes: input.accessNotes,
      ...input.safety,
      createdBy: actor.id,
    });
    return getPlantRoom(actor, room.id);
  } catch (err) {
    if (err instanceof UniqueConstraintError) throw duplicateName(input.name);
    throw err;
  }
}

export async function updatePlantRoom(actor: AuthUser, id: number, patch: PlantRoomPatch): Promise<PlantRoomDto> {
  const room = await findPlantRoom(actor, id);
  assertCanEdit(actor, room.createdBy, 'plant room');
  if (patch.name !== undefined && patch.name !== room.name) {
    const other = await PlantRoom.findOne({ where: { siteId: room.siteId, name: patch.name, id: { [Op.ne]: room.id } } });
    if (other) throw duplicateName(patch.name);
    room.name = patch.name;
  }
  if (patch.floorArea !== undefined) room.floorArea = patch.floorArea;
  if (patch.accessNotes !== undefined) room.accessNotes = patch.accessNotes;
  for (const [key, value] of Object.entries(patch.safety ?? {})) {
    if (value !== undefined) room.set(key as keyof SafetyLocations, value);
  }
  try {
    await room.save();
  } catch (err) {
    if (err instanceof UniqueConstraintError) throw duplicateName(room.name);
    throw err;
  }
  return getPlantRoom(actor, room.id);
}
