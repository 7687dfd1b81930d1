// Water-treatment tests on a sealed heating system: inhibitor, pH, conductivity and appearance.
import { formatNumber as f, isReading, type CheckResult } from '@/shared/calc/check-result';

/** The inhibitor result as the manufacturer's test kit states it. */
export const INHIBITOR_RESULTS = ['in-range', 'low', 'none', 'high'] as const;
export type InhibitorResult = (typeof INHIBITOR_RESULTS)[number];
export const INHIBITOR_LABELS: Record<InhibitorResult, string> = {
  'in-range': 'Within the kit’s range',
  low: 'Below the kit’s range',
  none: 'None detected',
  high: 'Above the kit’s range',
};

export const WATER_APPEARANCES = ['clear', 'cloudy', 'discoloured', 'dirty'] as const;
export type WaterAppearance = (typeof WATER_APPEARANCES)[number];
export const WATER_APPEARANCE_LABELS: Record<WaterAppearance, string> = {
  clear: 'Clear',
  cloudy: 'Slightly cloudy',
  discoloured: 'Discoloured (brown or black)',
  dirty: 'Sludge or debris in the sample',
};

export const PH_RANGE = { min: 7.5, max: 9.5 } as const;
const PH_SOURCE =
  'BSRIA BG 50/2021, water treatment for closed heating systems: pH 7.5–9.5 for mixed metals (from memory); ' +
  'aluminium heat exchangers often need a lower upper limit, so the boiler manufacturer’s range comes first.';
const INHIBITOR_SOURCE = 'The inhibitor manufacturer’s test, as stated on the kit.';
const TREATMENT_ADVICE = 'Dose or flush as the site’s water-treatment regime says, then test again.';

export interface WaterTreatmentReadings {
  inhibitorResult?: InhibitorResult | null;
  waterPh?: number | null;
  conductivityUSPerCm?: number | null;
  waterAppearance?: WaterAppearance | null;
}

/** Category results carry their index in the list as the value and their words as `valueText`. */
export function waterTreatmentChecks(r: WaterTreatmentReadings): CheckResult[] {
  const results: CheckResult[] = [];
  if (r.inhibitorResult) {
    const result: CheckResult = {
      key: 'inhibitor', label: 'Inhibitor', valueText: INHIBITOR_LABELS[r.inhibitorResult], formula: 'Test kit reading within its stated range',
      inputs: [], value: INHIBITOR_RESULTS.indexOf(r.inhibitorResult), unit: '', limit: 'Within the kit’s range', source: INHIBITOR_SOURCE,
    };
    if (r.inhibitorResult === 'low' || r.inhibitorResult === 'none') {
      result.flag = { level: 'caution', message: `Inhibitor ${r.inhibitorResult === 'none' ? 'not detected' : 'below the kit’s range'}: the system is open to corrosion and sludge. ${TREATMENT_ADVICE}` };
    } else if (r.inhibitorResult === 'high') {
      result.flag = { level: 'info', message: 'Inhibitor above the kit’s range: no harm as a rule, but check the dosing record.' };
    }
    results.push(result);
  }
  if (isReading(r.waterPh)) {
    const result: CheckResult = {
      key: 'water-ph', label: 'pH of the system water', formula: `${PH_RANGE.min} ≤ pH ≤ ${PH_RANGE.max}`,
      inputs: [{ label: 'pH', value: r.waterPh, unit: '' }], value: r.waterPh, unit: 'pH', limit: `${PH_RANGE.min}–${PH_RANGE.max}`, source: PH_SOURCE,
    };
    if (r.waterPh < PH_RANGE.min || r.waterPh > PH_RANGE.max) {
      result.flag = { level: 'caution', message: `pH ${f(r.waterPh, 3)} is outside ${PH_RANGE.min}–${PH_RANGE.max}: ${r.waterPh < PH_RANGE.min ? 'acidic water attacks steel and copper' : 'alkaline water attacks aluminium'}. ${TREATMENT_ADVICE}` };
    }
    results.push(result);
  }
  if (isReading(r.conductivityUSPerCm)) {
    results.push({
      key: 'conductivity', label: 'Conductivity', formula: 'Compared with earlier readings on the trend',
      inputs: [{ label: 'Conductivity', value: r.conductivityUSPerCm, unit: 'µS/cm' }], value: r.conductivityUSPerCm, unit: 'µS/cm',
      limit: 'No fixed limit: a rise between visits points to fresh water, added chemicals or corrosion',
      source: 'Common practice, no published source.',
    });
  }
  if (r.waterAppearance) {
    const result: CheckResult = {
      key: 'water-appearance', label: 'Appearance', valueText: WATER_APPEARANCE_LABELS[r.waterAppearance], formula: 'Sample looked at in a clear container',
      inputs: [], value: WATER_APPEARANCES.indexOf(r.waterAppearance), unit: '', limit: 'Clear or slightly cloudy',
      source: 'Common practice, no published source.',
    };
    if (r.waterAppearance === 'discoloured' || r.waterAppearance === 'dirty') {
      result.flag = { level: 'caution', message: `The sample is ${r.waterAppearance === 'dirty' ? 'carrying sludge or debris' : 'discoloured'}: corrosion is likely. Send a sample for analysis and clean or flush as the water-treatment regime says.` };
    }
    results.push(result);
  }
  return results;
}
