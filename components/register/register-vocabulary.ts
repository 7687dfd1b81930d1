import type { MaterialCommunityIcons } from '@/components/ui/icons';
import type { ComponentProps } from 'react';
import type { AssetType, EnergySource } from '@/shared/rules/register';
import type { SafetyLocations } from '@/shared/types/register';

type IconName = ComponentProps<typeof MaterialCommunityIcons>['name'];

export const ENERGY_SOURCE_ICONS: Record<EnergySource, IconName> = {
  gas: 'fire',
  oil: 'oil',
  electrical: 'flash',
  'stored-charge': 'battery-charging-high',
  'stored-pressure': 'gauge',
  'mains-make-up': 'water-pump',
  'hot-water': 'water-thermometer',
  refrigerant: 'snowflake',
  pneumatic: 'air-filter',
  mechanical: 'cog',
  chemical: 'flask-outline',
};

export const ASSET_TYPE_ICONS: Record<AssetType, IconName> = {
  boiler: 'water-boiler',
  pump: 'pump',
  actuator: 'axis-arrow',
  valve: 'valve',
  vessel: 'propane-tank-outline',
  'pressurisation-unit': 'gauge',
  'water-heater': 'storage-tank-outline',
  'control-panel': 'view-dashboard-variant-outline',
  'terminal-unit': 'fan',
  'gas-supply': 'meter-gas-outline',
  'electrical-supply': 'transmission-tower',
  'water-supply': 'water-pump',
  'distribution-board': 'view-grid-outline',
  isolator: 'electric-switch',
  pipework: 'pipe',
  other: 'cube-outline',
};

/** Labels and units for the type-specific fields in shared/schemas/register.ts (the unit is in each key's name). */
export const ATTRIBUTE_META: Record<string, { label: string; unit?: string; hint?: string }> = {
  fuel: { label: 'Fuel' },
  ratedOutputKw: { label: 'Rated output', unit: 'kW' },
  flowSetpointC: { label: 'Flow setpoint', unit: '°C' },
  burnerPressureMbar: { label: 'Burner pressure setting', unit: 'mbar', hint: 'From the data plate or the commissioning sheet.' },
  duty: { label: 'Duty arrangement' },
  circuit: { label: 'Circuit served' },
  normalPosition: { label: 'Position with no signal' },
  controlSignal: { label: 'Control signal' },
  capacityL: { label: 'Capacity', unit: 'L' },
  preChargeBar: { label: 'Pre-charge pressure', unit: 'bar', hint: 'Gauge pressure of the gas side, from the data plate.' },
  designPressureBar: { label: 'Design pressure', unit: 'bar' },
  fillPressureBar: { label: 'Cold fill pressure', unit: 'bar' },
  setpointC: { label: 'Stored water setpoint', unit: '°C' },
  isolation: { label: 'Isolates', hint: 'Only a valve recorded as isolating is offered as an isolation point.' },
  isolatorForm: { label: 'Form of isolator' },
  meterPoint: { label: 'Meter or supply point reference' },
  supplyNumber: { label: 'Supply number' },
  ways: { label: 'Number of ways' },
};

const OPTION_LABELS: Record<string, string> = {
  'natural-gas': 'Natural gas',
  lpg: 'LPG',
  oil: 'Oil',
  electric: 'Electric',
  biomass: 'Biomass',
  other: 'Other',
  duty: 'Duty',
  standby: 'Standby',
  'duty-assist': 'Duty assist',
  single: 'Single (no standby)',
  'normally-open': 'Normally open',
  'normally-closed': 'Normally closed',
  manual: 'Manual',
  '0-10v': '0–10 V',
  '2-10v': '2–10 V',
  '4-20ma': '4–20 mA',
  '24v-on-off': '24 V on/off',
  '230v-on-off': '230 V on/off',
  '3-point': '3-point (raise/lower)',
  motorised: 'Motorised isolating valve',
  none: 'Control valve (does not isolate)',
  isolator: 'Isolator',
  'switch-disconnector': 'Switch-disconnector',
  'fused-spur': 'Fused spur',
  'plug-and-socket': 'Plug and socket',
};

export const optionLabel = (value: string) => OPTION_LABELS[value] ?? value;

/** The plant room's safety-critical locations, in the order someone arriving needs them. */
export const SAFETY_LOCATIONS: { key: keyof SafetyLocations; label: string; icon: IconName; hint: string }[] = [
  { key: 'emergencyStop', label: 'Emergency stop', icon: 'stop-circle', hint: 'Where the emergency stop or plant-room shutdown switch is.' },
  { key: 'gasIsolation', label: 'Gas isolation', icon: 'pipe-valve', hint: 'Where the gas isolation valve for this room is.' },
  { key: 'electricalIsolator', label: 'Electrical isolator', icon: 'flash', hint: 'Where the main electrical isolator for the plant is.' },
  { key: 'firstAid', label: 'First aid and eyewash', icon: 'medical-bag', hint: 'Nearest first aid kit and eyewash station.' },
  { key: 'exits', label: 'Exits', icon: 'exit-run', hint: 'Exits and escape routes from the room.' },
];

const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

/** 2025-03-07 → "7 Mar 2025": a month name cannot be misread as day/month or month/day. */
export function formatDate(iso: string | null | undefined): string {
  if (!iso) return '—';
  const [y, m, d] = iso.slice(0, 10).split('-').map(Number);
  if (!y || !m || !d) return iso;
  return `${d} ${MONTHS[m - 1]} ${y}`;
}

/** Today as YYYY-MM-DD in the device's own time zone. */
export function todayIso(now = new Date()): string {
  const p = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${p(now.getMonth() + 1)}-${p(now.getDate())}`;
}
