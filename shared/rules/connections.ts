import type { AssetType, EnergySource } from '@/shared/rules/register';
import type { IsolationMethod } from '@/shared/rules/tags';

/**
 * How plant items are connected: a directed link "A supplies B" carrying one medium. Each medium maps to the
 * energy source a tag isolates, so a plan for "gas" follows the gas links.
 */
export const MEDIA = [
  'gas', 'oil', 'electrical', 'heating-flow', 'heating-return', 'hot-water', 'cold-water', 'mains-water',
  'refrigerant', 'compressed-air',
] as const;
export type Medium = (typeof MEDIA)[number];

export const MEDIUM_LABELS: Record<Medium, string> = {
  gas: 'Gas',
  oil: 'Oil',
  electrical: 'Electrical',
  'heating-flow': 'Heating flow',
  'heating-return': 'Heating return',
  'hot-water': 'Domestic hot water',
  'cold-water': 'Cold water',
  'mains-water': 'Mains water',
  refrigerant: 'Refrigerant',
  'compressed-air': 'Compressed air',
};

/** The energy source a tag isolates when this medium is cut. */
export const MEDIUM_SOURCE: Record<Medium, EnergySource> = {
  gas: 'gas',
  oil: 'oil',
  electrical: 'electrical',
  'heating-flow': 'hot-water',
  'heating-return': 'hot-water',
  'hot-water': 'hot-water',
  'cold-water': 'stored-pressure',
  'mains-water': 'mains-make-up',
  refrigerant: 'refrigerant',
  'compressed-air': 'pneumatic',
};

/**
 * Gas, oil and electricity reach an item only from upstream. Water, refrigerant and air circuits are filled and
 * under pressure on both sides of an item, so a path to it may run against the drawn direction (the return side
 * of a pump is as live as its flow side): the planner follows these links both ways.
 * (common practice, no published source: isolate both the flow and the return of a wet item)
 */
export const ONE_WAY_MEDIA: ReadonlySet<Medium> = new Set<Medium>(['gas', 'oil', 'electrical']);

const WET: Medium[] = ['heating-flow', 'heating-return', 'hot-water', 'cold-water', 'mains-water'];
const FLUIDS: Medium[] = ['gas', 'oil', ...WET, 'refrigerant', 'compressed-air'];

/** The media each type of item can carry; a link in a medium either end cannot carry is refused. */
export const TYPE_MEDIA: Record<AssetType, readonly Medium[]> = {
  boiler: ['gas', 'oil', 'electrical', 'heating-flow', 'heating-return', 'cold-water', 'mains-water'],
  pump: ['electrical', ...WET],
  actuator: ['electrical', 'compressed-air'],
  valve: FLUIDS,
  vessel: WET,
  'pressurisation-unit': ['electrical', ...WET],
  'water-heater': ['gas', 'oil', 'electrical', ...WET],
  'control-panel': ['electrical'],
  'terminal-unit': ['electrical', 'heating-flow', 'heating-return', 'cold-water', 'refrigerant'],
  'gas-supply': ['gas'],
  'electrical-supply': ['electrical'],
  'water-supply': ['mains-water', 'cold-water'],
  'distribution-board': ['electrical'],
  isolator: ['electrical'],
  pipework: FLUIDS,
  other: MEDIA,
};

export const canCarry = (type: AssetType, medium: Medium) => TYPE_MEDIA[type].includes(medium);

/** Incoming supplies: where a medium enters the site. Nothing upstream of them is in the register. */
export const SUPPLY_TYPES: ReadonlySet<AssetType> = new Set<AssetType>(['gas-supply', 'electrical-supply', 'water-supply']);

/** Items that put heat or pressure into a wet circuit: a plan treats them as supplies of that circuit. */
export const GENERATOR_TYPES: Partial<Record<AssetType, readonly EnergySource[]>> = {
  boiler: ['hot-water'],
  'water-heater': ['hot-water'],
  'pressurisation-unit': ['stored-pressure', 'hot-water'],
};

/** Where the trade says to isolate an incoming supply when the register shows no point downstream of it. */
export const SUPPLY_ISOLATION_HINT: Partial<Record<AssetType, string>> = {
  'gas-supply': 'isolate at the meter (emergency control valve)',
  'electrical-supply': 'isolate at the intake or the board',
  'water-supply': 'isolate at the incoming stop valve',
};

export const VALVE_ISOLATION = ['manual', 'motorised', 'none'] as const;
type ValveIsolation = (typeof VALVE_ISOLATION)[number];
export const ISOLATOR_FORMS = ['isolator', 'switch-disconnector', 'fused-spur', 'plug-and-socket'] as const;
type IsolatorForm = (typeof ISOLATOR_FORMS)[number];

const VALVE_ISOLATION_LABELS: Record<ValveIsolation, string> = {
  manual: 'Manual isolating valve',
  motorised: 'Motorised isolating valve',
  none: 'Control valve (does not isolate)',
};
const ISOLATOR_FORM_LABELS: Record<IsolatorForm, string> = {
  isolator: 'Isolator',
  'switch-disconnector': 'Switch-disconnector',
  'fused-spur': 'Fused spur',
  'plug-and-socket': 'Plug and socket',
};

/** How an item isolates, or null when it is not an isolation point. */
export type IsolatingKind = `valve-${Exclude<ValveIsolation, 'none'>}` | IsolatorForm;

export function isolatingKind(item: { type: AssetType; attributes: Record<string, unknown> }): IsolatingKind | null {
  if (item.type === 'valve') {
    const how = item.attributes.isolation;
    return how === 'manual' || how === 'motorised' ? `valve-${how}` : null;
  }
  if (item.type === 'isolator') {
    const form = item.attributes.isolatorForm;
    return (ISOLATOR_FORMS as readonly unknown[]).includes(form) ? (form as IsolatorForm) : 'isolator';
  }
  return null;
}

/** The tag's isolation method for a point of this kind. */
export const KIND_METHOD: Record<IsolatingKind, IsolationMethod> = {
  'valve-manual': 'valve-locked',
  'valve-motorised': 'valve-locked',
  isolator: 'isolator-locked',
  'switch-disconnector': 'isolator-locked',
  'fused-spur': 'fuse-withdrawn',
  'plug-and-socket': 'disconnected',
};

export const KIND_LABELS: Record<IsolatingKind, string> = {
  'valve-manual': VALVE_ISOLATION_LABELS.manual,
  'valve-motorised': VALVE_ISOLATION_LABELS.motorised,
  ...ISOLATOR_FORM_LABELS,
};

/** Items that hold energy after their supplies are cut and must be vented, drained or discharged. */
export const STORED_ENERGY_TYPES: ReadonlySet<AssetType> = new Set<AssetType>(['vessel', 'water-heater', 'pipework', 'pressurisation-unit']);
