// Where a heating reading stops being unremarkable. These bands are common practice
// among commissioning and maintenance engineers, with no published source; each one
// is a setting so a site can tighten or relax it.

export interface HeatingCheckBands {
  /** ΔT more than this fraction away from design is flagged (0.3 = ±30 %). */
  deltaTToleranceFraction: number;
  /** Flow within ± this of setpoint carries no flag. */
  setpointDeadbandK: number;
  /** Flow more than this above setpoint is a caution (controls or sensor not holding). */
  setpointOvershootCautionK: number;
  /** Flow more than this below setpoint is a caution; smaller shortfalls are info (still climbing). */
  setpointShortfallCautionK: number;
  /** System pressure more than this below the fill pressure is a caution. */
  lowPressureToleranceBar: number;
}

export const DEFAULT_HEATING_CHECK_BANDS: HeatingCheckBands = {
  deltaTToleranceFraction: 0.3,
  setpointDeadbandK: 2,
  setpointOvershootCautionK: 5,
  setpointShortfallCautionK: 15,
  lowPressureToleranceBar: 0.1,
};
