import type { IsolatingKind, Medium } from '@/shared/rules/connections';
import type { AssetType, EnergySource } from '@/shared/rules/register';
import type { AssetState } from '@/shared/rules/tags';
import type { ImportRowError } from '@/shared/types/register';
import type { IsolationMethod } from '@/shared/rules/tags';

/** A plant item as a connection or a plan names it. */
export interface ItemRef {
  id: number;
  plantId: string;
  name: string;
  type: AssetType;
  plantRoomId: number | null;
}

/** "from supplies to" in one medium. */
export interface Connection {
  id: number;
  medium: Medium;
  from: ItemRef;
  to: ItemRef;
  createdAt: string;
  createdBy: { id: number; name: string };
}

/** An item's links: `from` = the items that supply it, `to` = the items it supplies. */
export interface AssetConnections {
  from: Connection[];
  to: Connection[];
}

export interface PlanPoint {
  item: ItemRef;
  kind: IsolatingKind;
  method: IsolationMethod;
  /** Links between this point and the item (1 = next to it). */
  distance: number;
  /** Other items that lose this supply when this point alone is closed. */
  affects: ItemRef[];
}

export interface PlanGap {
  supply: ItemRef;
  /** The path from the supply to the item, supply first, with no isolating item on it. */
  path: ItemRef[];
  message: string;
}

export interface SourcePlan {
  source: EnergySource;
  /** The isolating items that together cut every path from every supply of this source; none can be left out. */
  points: PlanPoint[];
  gaps: PlanGap[];
  /** Items inside the isolated section that hold energy and must be vented, drained or discharged. */
  storedEnergy: ItemRef[];
  /** Set when the register records no link of this source to the item. */
  unrecorded: string | null;
}

export interface IsolationPlan {
  asset: ItemRef;
  sources: SourcePlan[];
  /** Other items that lose a supply when all the plan's points are closed. */
  affects: ItemRef[];
  caution: string;
}

/** What closing an isolating item takes off supply, per energy source it carries. */
export interface ClosingAffects {
  asset: ItemRef;
  isolating: boolean;
  affects: { source: EnergySource; items: ItemRef[] }[];
}

/** The links of a plant room for its diagram, with each item's tag state. */
export interface PlantRoomDiagram {
  items: (ItemRef & { state: AssetState; overdue: boolean; inRoom: boolean })[];
  connections: { id: number; fromId: number; toId: number; medium: Medium }[];
}

export interface ConnectionImportResult {
  dryRun: boolean;
  rows: number;
  created: number;
  /** Rows naming a link that is already recorded (an exported file imported back gives only these). */
  unchanged: number;
  errors: ImportRowError[];
}
