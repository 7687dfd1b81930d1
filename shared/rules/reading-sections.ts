// Which readings each item type offers: a boiler its gas pressures and flue gas, a calorifier its
// hot-water temperatures, a pressurisation unit its cut-in, cut-out and water treatment. The API
// accepts every reading on any item (a burner may be registered as "other"); forms show these.
import type { ReadingValueKey } from '@/shared/rules/reading-keys';
import type { AssetType, EnergySource } from '@/shared/rules/register';

type ReadingSectionKey = 'heating' | 'pressure' | 'pump' | 'unit' | 'treatment' | 'gas' | 'flue' | 'hot-water' | 'weather';

export interface ReadingSection {
  key: ReadingSectionKey;
  title: string;
  fields: ReadingValueKey[];
}

export const READING_SECTIONS: ReadingSection[] = [
  { key: 'hot-water', title: 'Hot water (Legionella control)', fields: ['storeTemperatureC', 'hotWaterReturnTemperatureC', 'outletTemperatureC', 'outletRunSeconds'] },
  { key: 'heating', title: 'Heating circuit', fields: ['flowTemperatureC', 'returnTemperatureC', 'flowSetpointC', 'flowRateM3PerS'] },
  { key: 'weather', title: 'Weather compensation', fields: ['outsideTemperatureC'] },
  { key: 'pressure', title: 'System pressure', fields: ['systemPressureGaugePa', 'gaugeHeightM'] },
  { key: 'pump', title: 'Pump', fields: ['pumpInletPressureGaugePa', 'pumpOutletPressureGaugePa'] },
  { key: 'unit', title: 'Pressurisation unit', fields: ['unitCutInPressureGaugePa', 'unitCutOutPressureGaugePa'] },
  { key: 'treatment', title: 'Water treatment', fields: ['inhibitorResult', 'waterPh', 'conductivityUSPerCm', 'waterAppearance'] },
  { key: 'gas', title: 'Gas pressures', fields: ['gasStandingPressurePa', 'gasWorkingPressurePa', 'burnerPressurePa'] },
  { key: 'flue', title: 'Flue-gas analysis', fields: ['flueO2Percent', 'flueCo2Percent', 'flueCoPpm', 'flueTemperatureC', 'combustionEfficiencyPercent'] },
];

// A type not listed here offers every section.
const BY_TYPE: Partial<Record<AssetType, ReadingSectionKey[]>> = {
  boiler: ['heating', 'weather', 'pressure', 'gas', 'flue'],
  pump: ['heating', 'pressure', 'pump'],
  actuator: ['heating'],
  valve: ['heating'],
  vessel: ['pressure'],
  'pressurisation-unit': ['pressure', 'unit', 'treatment'],
  'water-heater': ['hot-water'],
  'control-panel': ['heating', 'weather'],
  'terminal-unit': ['heating'],
  'gas-supply': ['gas'],
  'water-supply': ['pressure'],
  'electrical-supply': [],
  'distribution-board': [],
  isolator: [],
  pipework: ['heating', 'pressure'],
};

/** The sections an item offers; a gas-fired water heater also offers gas and flue gas. */
export function readingSectionsFor(type: AssetType, energySources: readonly EnergySource[] = []): ReadingSection[] {
  const keys = new Set(BY_TYPE[type] ?? READING_SECTIONS.map((s) => s.key));
  if (type === 'water-heater' && energySources.includes('gas')) {
    keys.add('gas');
    keys.add('flue');
  }
  return READING_SECTIONS.filter((s) => keys.has(s.key));
}
