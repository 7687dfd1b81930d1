// Hot-water temperatures against Legionella control: calorifiers, cylinders and water heaters.
// Limits from HSE ACOP L8 (4th edition, 2013) and HSG274 Part 2 (2014), hot-water systems.
import { formatNumber as f, isReading, type CheckResult } from '@/shared/calc/check-result';

export const LEGIONELLA_LIMITS = {
  /** Stored hot water at 60 °C or more. */
  storeMinC: 60,
  /** Return from a circulating loop at 50 °C or more (55 °C in healthcare premises). */
  returnMinC: 50,
  /** Outlets at 50 °C or more within one minute of running (55 °C in healthcare premises). */
  outletMinC: 50,
  outletWithinS: 60,
  /** Legionella bacteria multiply between 20 °C and 45 °C. */
  growthMinC: 20,
  growthMaxC: 45,
} as const;

export const LEGIONELLA_SOURCE =
  'HSE ACOP L8 (2013) and HSG274 Part 2 (2014): store hot water at 60 °C or more, return at 50 °C or more ' +
  '(55 °C in healthcare premises), outlets at 50 °C or more within one minute; Legionella multiply between 20 °C and 45 °C.';

/** What to do about a low hot-water temperature, said plainly. */
export const LEGIONELLA_ADVICE =
  'Raise the temperature and recheck until it holds, tell the duty holder (the person responsible for water safety) today, ' +
  'and follow the site’s water-safety plan, which may call for flushing or disinfection by a competent person.';

export interface HotWaterReadings {
  storeTemperatureC?: number | null;
  hotWaterReturnTemperatureC?: number | null;
  outletTemperatureC?: number | null;
  /** How long the outlet ran before the reading; when not given the reading is taken as the one-minute reading. */
  outletRunSeconds?: number | null;
}

const inGrowthRange = (c: number) => c >= LEGIONELLA_LIMITS.growthMinC && c <= LEGIONELLA_LIMITS.growthMaxC;

function lowTemperatureFlag(what: string, valueC: number, minC: number, after = ''): NonNullable<CheckResult['flag']> {
  const growth = inGrowthRange(valueC);
  return {
    level: growth ? 'danger' : 'caution',
    message:
      `Legionella risk: ${what} is at ${f(valueC)} °C${after}, below the ${f(minC)} °C it must reach` +
      (growth ? `, and inside the 20–45 °C range where Legionella bacteria multiply. ` : '. ') +
      LEGIONELLA_ADVICE,
  };
}

function temperatureCheck(
  key: 'store-temperature' | 'hot-water-return-temperature',
  label: string,
  what: string,
  valueC: number,
  minC: number,
): CheckResult {
  const result: CheckResult = {
    key,
    label,
    formula: `T ≥ ${f(minC)} °C`,
    inputs: [{ label, value: valueC, unit: '°C' }],
    value: valueC,
    unit: '°C',
    limit: `${f(minC)} °C or more`,
    source: LEGIONELLA_SOURCE,
  };
  if (valueC < minC) result.flag = lowTemperatureFlag(what, valueC, minC);
  return result;
}

function outletCheck(outletC: number, runSeconds: number | null | undefined): CheckResult {
  const { outletMinC: minC, outletWithinS: withinS } = LEGIONELLA_LIMITS;
  const seconds = isReading(runSeconds) ? runSeconds : withinS;
  const result: CheckResult = {
    key: 'outlet-temperature',
    label: 'Hot outlet temperature',
    formula: `T_outlet ≥ ${f(minC)} °C within ${f(withinS)} s of running`,
    inputs: [
      { label: 'Outlet temperature', value: outletC, unit: '°C' },
      { label: isReading(runSeconds) ? 'Time run' : 'Time run (taken as one minute)', value: seconds, unit: 's' },
    ],
    value: outletC,
    unit: '°C',
    limit: `${f(minC)} °C or more within one minute`,
    source: LEGIONELLA_SOURCE,
  };
  if (outletC < minC) {
    result.flag = lowTemperatureFlag('the hot outlet', outletC, minC, ` after ${f(seconds)} s of running`);
  } else if (seconds > withinS) {
    result.flag = {
      level: 'caution',
      message:
        `Legionella risk: the hot outlet took ${f(seconds)} s to reach ${f(outletC)} °C, longer than one minute. ` +
        `Look for a long dead leg or a circulation fault. ${LEGIONELLA_ADVICE}`,
    };
  }
  return result;
}

/** Checks whichever hot-water temperatures were read. */
export function hotWaterChecks(readings: HotWaterReadings): CheckResult[] {
  const results: CheckResult[] = [];
  const { storeTemperatureC: store, hotWaterReturnTemperatureC: ret, outletTemperatureC: outlet } = readings;
  if (isReading(store)) {
    results.push(temperatureCheck('store-temperature', 'Stored hot water temperature', 'the stored hot water', store, LEGIONELLA_LIMITS.storeMinC));
  }
  if (isReading(ret)) {
    results.push(temperatureCheck('hot-water-return-temperature', 'Hot water return temperature', 'the hot water return', ret, LEGIONELLA_LIMITS.returnMinC));
  }
  if (isReading(outlet)) results.push(outletCheck(outlet, readings.outletRunSeconds));
  return results;
}
