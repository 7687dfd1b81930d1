import type {
  CheckFlagLevel,
  CheckKey,
  CheckResult,
  CheckSettingsValues,
  ExpansionVesselInputs,
  ExpansionVesselResult,
  GasAppliance,
  GlycolKind,
  InhibitorResult,
  SettingChoice,
  WaterAppearance,
} from '@/shared/calc';
import type { ListResponse } from '@/shared/types/api';

export interface SurfaceTemperature {
  location: string;
  temperatureC: number;
}

/** One set of readings as stored: SI units (°C, m³/s, Pa gauge); null = not read. */
export interface ReadingValues {
  flowTemperatureC: number | null;
  returnTemperatureC: number | null;
  flowSetpointC: number | null;
  flowRateM3PerS: number | null;
  systemPressureGaugePa: number | null;
  pumpInletPressureGaugePa: number | null;
  pumpOutletPressureGaugePa: number | null;
  /** Height of the gauge above the vessel or reference point, m (negative below it). */
  gaugeHeightM: number | null;
  outsideTemperatureC: number | null;
  /** Gas pressures, Pa gauge (entered in mbar). */
  gasStandingPressurePa: number | null;
  gasWorkingPressurePa: number | null;
  burnerPressurePa: number | null;
  flueO2Percent: number | null;
  flueCo2Percent: number | null;
  flueCoPpm: number | null;
  flueTemperatureC: number | null;
  /** As the analyser gives it. */
  combustionEfficiencyPercent: number | null;
  storeTemperatureC: number | null;
  hotWaterReturnTemperatureC: number | null;
  outletTemperatureC: number | null;
  outletRunSeconds: number | null;
  inhibitorResult: InhibitorResult | null;
  waterPh: number | null;
  conductivityUSPerCm: number | null;
  waterAppearance: WaterAppearance | null;
  unitCutInPressureGaugePa: number | null;
  unitCutOutPressureGaugePa: number | null;
  surfaceTemperatures: SurfaceTemperature[];
}

export interface ReadingFlag {
  key: CheckKey;
  level: CheckFlagLevel;
  message: string;
}

/** The design values the checks were run against, and where each came from. */
export interface CheckSettings {
  siteId: number;
  /** The asset's `system` text; null when the item is not on a named system. */
  systemName: string | null;
  settings: CheckSettingsValues;
  /** Per setting, in words: "System settings", "Pressurisation unit PU-1", "This reading". */
  sources: Partial<Record<keyof CheckSettingsValues, string>>;
  /** The gas appliance as the register records it (fuel, burner pressure); family null when not a gas appliance. */
  appliance: GasAppliance;
}

export interface ReadingSet {
  id: number;
  assetId: number;
  takenAt: string;
  values: ReadingValues;
  note: string;
  /** Computed by the server when the set was logged. */
  results: CheckResult[];
  flags: ReadingFlag[];
  settingsUsed: CheckSettings;
  createdBy: { id: number; name: string };
  createdAt: string;
  /** The set this one corrects. */
  supersedesId: number | null;
  correctionReason: string | null;
  /** The correction that replaced this set; the original stays on record. */
  supersededBy: { id: number; at: string; by: { id: number; name: string } } | null;
}

export interface ReadingList extends ListResponse<ReadingSet> {
  /** The settings a new set on this item would be checked against now. */
  checkSettings: CheckSettings;
}

export interface HeatingSystem {
  siteId: number;
  name: string;
  /** Whether design values have been saved for this system (otherwise all values are null). */
  configured: boolean;
  designDeltaTK: number | null;
  flowSetpointC: number | null;
  /** Override; when null the fill pressure of the system's pressurisation unit in the register is used. */
  fillPressureGaugePa: number | null;
  safetyValveSettingGaugePa: number | null;
  systemVolumeM3: number | null;
  staticHeightM: number | null;
  maxFlowTemperatureC: number | null;
  fillTemperatureC: number | null;
  preChargeMarginBar: number | null;
  glycolKind: GlycolKind | null;
  glycolPercent: number | null;
  compensationOutsideLowC: number | null;
  compensationFlowAtLowC: number | null;
  compensationOutsideHighC: number | null;
  compensationFlowAtHighC: number | null;
  /** Register items on this site with this system text. */
  assetCount: number;
  updatedAt: string | null;
  updatedBy: { id: number; name: string } | null;
}

/** An expansion vessel from the register (asset type `vessel`). */
export interface RegisterVessel {
  assetId: number;
  plantId: string;
  name: string;
  capacityL: number | null;
  preChargeBar: number | null;
}

export interface ExpansionSettingsUsed {
  preChargeMarginBar: number;
  preChargeMarginSource: string;
  choices: readonly SettingChoice[];
}

export interface ExpansionVesselCheckResponse {
  inputs: ExpansionVesselInputs;
  settings: ExpansionSettingsUsed;
  result: ExpansionVesselResult;
}

/** The vessel check for one site + system, with inputs taken from its settings and the register. */
export interface SystemExpansionCheck {
  siteId: number;
  systemName: string;
  system: HeatingSystem;
  vessels: RegisterVessel[];
  /** What is still needed before the check can run, in words. */
  missing: string[];
  /** Inputs as far as known; the calculator is prefilled with these. */
  inputs: Partial<ExpansionVesselInputs> & { installedVesselVolumesL: number[] };
  settings: ExpansionSettingsUsed;
  result: ExpansionVesselResult | null;
}

/** The latest current reading set of one item, for the register CSV. */
export interface LatestReadingExport {
  assetId: number;
  readingId: number;
  takenAt: string;
  takenBy: string;
  values: ReadingValues;
  flags: ReadingFlag[];
  note: string;
}

/** The latest current set of one item on a site, with its flags: the site's list of what needs attention. */
export interface LatestFlaggedReading {
  assetId: number;
  plantId: string;
  assetName: string;
  plantRoomName: string | null;
  readingId: number;
  takenAt: string;
  takenBy: string;
  worstFlag: CheckFlagLevel;
  flags: ReadingFlag[];
}
