// Shapes shared by every plant check, so a screen can show the working behind a number.

export type CheckFlagLevel = 'info' | 'caution' | 'danger';

export interface CheckFlag {
  level: CheckFlagLevel;
  message: string;
}

export interface CheckInput {
  label: string;
  value: number;
  unit: string;
}

export type HeatingCheckKey =
  | 'delta-t'
  | 'heat-delivered'
  | 'pump-head'
  | 'flow-setpoint-deviation'
  | 'system-pressure'
  | 'gas-standing-pressure'
  | 'gas-working-pressure'
  | 'burner-pressure'
  | 'flue-co2'
  | 'flue-co'
  | 'flue-co-co2-ratio'
  | 'store-temperature'
  | 'hot-water-return-temperature'
  | 'outlet-temperature'
  | 'inhibitor'
  | 'water-ph'
  | 'water-appearance'
  | 'conductivity'
  | 'unit-cut-in'
  | 'unit-cut-out';
/** Every check on a reading set, heating or otherwise. */
export type CheckKey = HeatingCheckKey;

export interface CheckResult {
  key: HeatingCheckKey;
  label: string;
  /** The formula in symbols, e.g. "ΔT = T_flow − T_return". */
  formula: string;
  inputs: CheckInput[];
  value: number;
  unit: string;
  /** For a result that is a category (a test kit's answer), the words shown instead of the number. */
  valueText?: string;
  /** The limit or band the value is compared with, in words ("store ≥ 60 °C"). */
  limit?: string;
  /** Where the limit comes from: a standard's clause, a guide, or "common practice, no published source". */
  source?: string;
  flag?: CheckFlag;
}

/** One line of a worked calculation: the formula and the same formula with numbers in. */
export interface WorkingStep {
  key: string;
  label: string;
  formula: string;
  substituted: string;
  value: number;
  unit: string;
  /** Where the rule or number comes from, when it is not plain arithmetic. */
  source?: string;
}

/** Formats a number for a substituted formula: trims float noise, keeps enough digits. */
export function formatNumber(value: number, significantDigits = 4): string {
  if (!Number.isFinite(value)) return String(value);
  if (value === 0) return '0';
  const magnitude = Math.floor(Math.log10(Math.abs(value)));
  const decimals = Math.max(0, significantDigits - 1 - magnitude);
  return Number(value.toFixed(Math.min(decimals, 10))).toString();
}

/** True for a usable number; null, undefined and NaN mean "not read". */
export const isReading = (value: number | null | undefined): value is number =>
  typeof value === 'number' && Number.isFinite(value);
