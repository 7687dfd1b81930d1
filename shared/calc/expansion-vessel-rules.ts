// Settings and rules behind the expansion vessel check (method of EN 12828:2012+A1:2014,
// Annex D). The standard is not freely published; where the text below says
// "recalled" the rule is as commonly read from the standard and has not been checked
// against a copy of it here. All pressures are bar gauge, as vessels and valves are marked.

import { PA_PER_BAR, paToHeadM } from '@/shared/calc/units';

export interface SettingChoice {
  value: number;
  /** Where the number comes from, in words a reviewer can check. */
  source: string;
}

/** EN 12828 Annex D's own margin: p_0 ≥ p_st + p_D + 0.2 bar. A pre-charge that meets it never fails. */
export const STANDARD_PRE_CHARGE_MARGIN_BAR = 0.2;
export const STANDARD_PRE_CHARGE_SOURCE = 'EN 12828:2012+A1:2014 Annex D: p_0 ≥ p_st + p_D + 0.2 bar.';

/** Margin of the vessel pre-charge above the static head at the vessel. The first is the default. */
export const PRE_CHARGE_MARGIN_CHOICES: readonly SettingChoice[] = [
  { value: STANDARD_PRE_CHARGE_MARGIN_BAR, source: STANDARD_PRE_CHARGE_SOURCE },
  {
    value: 0.3,
    source: 'Site practice, no published source: pre-charge 0.3 bar above the static head. A pre-charge that meets the standard’s 0.2 bar rule is still not failed.',
  },
];

export interface ExpansionVesselSettings {
  preChargeMarginBar: number;
  preChargeMarginSource: string;
  /** Water reserve as a fraction of system volume. */
  waterReserveFraction: number;
  /** Smallest water reserve, litres. */
  waterReserveMinL: number;
}

export const DEFAULT_EXPANSION_VESSEL_SETTINGS: ExpansionVesselSettings = {
  preChargeMarginBar: PRE_CHARGE_MARGIN_CHOICES[0].value,
  preChargeMarginSource: PRE_CHARGE_MARGIN_CHOICES[0].source,
  // EN 12828 Annex D (recalled): V_WR ≥ 0.005·V_A, at least 3 L for diaphragm vessels.
  waterReserveFraction: 0.005,
  waterReserveMinL: 3,
};

export const WATER_RESERVE_SOURCE =
  'EN 12828 Annex D (recalled): V_WR ≥ 0.5 % of the system volume, at least 3 L.';

export const SAFETY_VALVE_MARGIN_SOURCE =
  'EN 12828 Annex D (recalled): p_e ≤ p_SV − Δp_SVc, with the safety valve closing ' +
  'margin Δp_SVc = 0.5 bar for p_SV ≤ 5 bar and 0.1·p_SV above 5 bar.';

export const VAPOUR_PRESSURE_SOURCE =
  'EN 12828 Annex D (recalled): above 100 °C the pre-charge also covers the vapour pressure p_D ' +
  'at the maximum temperature, here from IAPWS-IF97 less one standard atmosphere.';

export const NOMINAL_VOLUME_SOURCE =
  'EN 12828 Annex D: V_n,min = (V_e + V_WR)·(p_e + 1)/(p_e − p_0), pressures gauge, +1 bar for absolute.';

/** Safety valve closing margin Δp_SVc in bar, for a valve set to `safetyValveBarGauge`. */
export function safetyValveClosingMarginBar(safetyValveBarGauge: number): number {
  return safetyValveBarGauge <= 5 ? 0.5 : 0.1 * safetyValveBarGauge;
}

/** Static head converted the trade's way: 1 bar ≈ 10.197 m of water (1000 kg/m³, g_n). */
export const METRES_WATER_PER_BAR = paToHeadM(PA_PER_BAR);
