import type { AssetType, EnergySource } from '@/shared/rules/register';
import type { AssetState } from '@/shared/rules/tags';
import type { PointUse, Tag } from '@/shared/types/tags';

export interface Site {
  id: number;
  name: string;
  address: string;
  timeZone: string;
  clientContactName: string | null;
  clientContactPhone: string | null;
  clientContactEmail: string | null;
  plantRoomCount: number;
  assetCount: number;
  /** Single site only: every live tag on the site, most urgent first. */
  liveTags?: Tag[];
  createdAt: string;
  updatedAt: string;
}

export interface SafetyLocations {
  emergencyStop: string;
  gasIsolation: string;
  electricalIsolator: string;
  firstAid: string;
  exits: string;
}

export interface Photo {
  id: number;
  /** Authenticated URLs under /api/photos/:id; fetch with the bearer token. */
  url: string;
  thumbnailUrl: string;
  width: number;
  height: number;
  caption: string | null;
  createdAt: string;
  createdBy: { id: number; name: string };
}

export interface PlantRoom {
  id: number;
  siteId: number;
  siteName: string;
  name: string;
  floorArea: string;
  accessNotes: string;
  safety: SafetyLocations;
  assetCount: number;
  /** Live isolations and overrides on items in the room. */
  liveTagCount: number;
  /** Single plant room only: its live tags, most urgent first. */
  liveTags?: Tag[];
  photos: Photo[];
  createdBy: { id: number; name: string };
  createdAt: string;
  updatedAt: string;
}

/** Type-specific fields; which keys apply depends on the asset type (see shared/schemas/register.ts). */
export type AssetAttributes = Record<string, string | number | boolean | null>;

export interface Asset {
  id: number;
  siteId: number;
  siteName: string;
  plantRoomId: number | null;
  plantRoomName: string | null;
  plantId: string;
  labelCode: string;
  name: string;
  type: AssetType;
  system: string;
  energySources: EnergySource[];
  manufacturer: string;
  model: string;
  serialNumber: string;
  installDate: string | null;
  serviceIntervalMonths: number | null;
  lastServiceDate: string | null;
  nextServiceDue: string | null;
  serviceOverdue: boolean;
  notes: string;
  attributes: AssetAttributes;
  archived: boolean;
  /** When it was archived (ISO UTC); null while in service. */
  archivedAt: string | null;
  photos?: Photo[];
  thumbnailUrl: string | null;
  /** From the item's live tags (shared/rules/tags.ts assetStateFromTags), computed by the server's clock. */
  state: AssetState;
  overdue: boolean;
  liveIsolations: number;
  liveOverrides: number;
  /** Live isolations on the item with no proof recorded ("not proved"). */
  unprovedIsolations: number;
  /** Single item only: its live tags, and the live tags for which it is an isolation point. */
  liveTags?: Tag[];
  pointUses?: PointUse[];
  createdBy: { id: number; name: string };
  createdAt: string;
  updatedAt: string;
}

export interface ImportRowError {
  /** Spreadsheet row number, counting the header as row 1. */
  row: number;
  column: string;
  message: string;
}

export interface ImportResult {
  dryRun: boolean;
  rows: number;
  created: number;
  updated: number;
  /** Rows that match an item exactly as stored (an exported file imported back gives only these). */
  unchanged: number;
  /** Plant rooms named in the file that do not exist yet; they are created with the import. */
  newPlantRooms: { site: string; name: string }[];
  errors: ImportRowError[];
}
