/** Plant item types, energy sources and their labels: the register's vocabulary, shared by client and server. */
export const ASSET_TYPES = [
  'boiler', 'pump', 'actuator', 'valve', 'vessel', 'pressurisation-unit', 'water-heater', 'control-panel', 'terminal-unit',
  // Supplies and where they are isolated, so the register can say how items are connected (shared/rules/connections.ts).
  'gas-supply', 'electrical-supply', 'water-supply', 'distribution-board', 'isolator', 'pipework',
  'other',
] as const;
export type AssetType = (typeof ASSET_TYPES)[number];

export const ASSET_TYPE_LABELS: Record<AssetType, string> = {
  boiler: 'Boiler',
  pump: 'Pump',
  actuator: 'Actuator',
  valve: 'Valve',
  vessel: 'Expansion vessel',
  'pressurisation-unit': 'Pressurisation unit',
  'water-heater': 'Water heater / calorifier',
  'control-panel': 'Control panel',
  'terminal-unit': 'Fan coil / terminal unit',
  'gas-supply': 'Incoming gas supply / meter',
  'electrical-supply': 'Electrical intake',
  'water-supply': 'Incoming mains water',
  'distribution-board': 'Distribution board',
  isolator: 'Isolator / switch-disconnector',
  pipework: 'Pipework / header',
  other: 'Other',
};

/**
 * Every kind of energy an isolation must account for (OSHA 29 CFR 1910.147(b) "energy source": electrical,
 * mechanical, hydraulic, pneumatic, chemical, thermal or other). Added for building services: oil, a mains
 * make-up feed that can re-pressurise an isolated section, refrigerant, and stored electrical charge such as the
 * DC-link capacitors of a variable-speed drive (1910.147(d)(5) stored energy).
 */
export const ENERGY_SOURCES = [
  'gas', 'oil', 'electrical', 'stored-charge', 'stored-pressure', 'mains-make-up', 'hot-water',
  'refrigerant', 'pneumatic', 'mechanical', 'chemical',
] as const;
export type EnergySource = (typeof ENERGY_SOURCES)[number];

export const ENERGY_SOURCE_LABELS: Record<EnergySource, string> = {
  gas: 'Gas',
  oil: 'Oil (fuel supply)',
  electrical: 'Electrical',
  'stored-charge': 'Stored charge (drive capacitors)',
  'stored-pressure': 'Stored pressure',
  'mains-make-up': 'Mains make-up feed',
  'hot-water': 'Hot water or steam',
  refrigerant: 'Refrigerant',
  pneumatic: 'Pneumatic (compressed air)',
  mechanical: 'Mechanical / rotating',
  chemical: 'Chemical',
};

/** A YYYY-MM-DD date moved by whole calendar months (negative = back), clamped to the month's last day. */
export function addMonths(date: string, months: number): string {
  const [y, m, d] = date.split('-').map(Number);
  const target = new Date(Date.UTC(y, m - 1 + months, 1));
  // Clamp to the month's last day (31 Jan + 1 month → 28/29 Feb).
  const lastDay = new Date(Date.UTC(target.getUTCFullYear(), target.getUTCMonth() + 1, 0)).getUTCDate();
  target.setUTCDate(Math.min(d, lastDay));
  return target.toISOString().slice(0, 10);
}

/** Next service date = last service + interval (months); overdue when that date is before today. */
export function nextServiceDue(lastServiceDate: string | null, intervalMonths: number | null): string | null {
  if (!lastServiceDate || !intervalMonths) return null;
  return addMonths(lastServiceDate, intervalMonths);
}

export function isServiceOverdue(nextDue: string | null, today: string): boolean {
  return !!nextDue && nextDue < today;
}
