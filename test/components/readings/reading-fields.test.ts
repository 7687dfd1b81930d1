import { describe, expect, it } from 'vitest';
import { vesselFormPath, vesselFormToRequest, initialVesselForm } from '@/components/readings/expansion-vessel-fields';
import { describeValues, entryToSi, formPathFor, initialReadingForm, parseEntry, readingFormToSi } from '@/components/readings/reading-fields';
import { emptyReadingValues } from '@/shared/rules/readings';

describe('reading form entries', () => {
  it('reads decimal commas and refuses text', () => {
    expect(parseEntry(' 1,5 ')).toBe(1.5);
    expect(parseEntry('')).toBeNull();
    expect(parseEntry('1.5 bar')).toBeNaN();
    expect(parseEntry('-0.2')).toBe(-0.2);
  });

  it('converts each unit to SI on entry', () => {
    // ISO 80000-4: 1 bar = 100 kPa = 100 000 Pa
    expect(entryToSi('1.5', 'pressure', 'bar')).toBe(150_000);
    expect(entryToSi('150', 'pressure', 'kPa')).toBe(150_000);
    // 1 L = 0.001 m³; 60 L/min = 1 L/s; 3.6 m³/h = 1 L/s (definitions of the units)
    expect(entryToSi('60', 'flow', 'L/min')).toBeCloseTo(0.001, 12);
    expect(entryToSi('3.6', 'flow', 'm3/h')).toBeCloseTo(0.001, 12);
  });

  it('turns the form into the API body and names unreadable fields by their form path', () => {
    const form = initialReadingForm();
    form.entries.systemPressureGaugePa = '150';
    form.units.systemPressureGaugePa = 'kPa';
    form.entries.flowTemperatureC = 'hot';
    form.surfaceTemperatures = [{ location: 'Pump casing', temperatureC: '4x' }];
    const { body, unreadable } = readingFormToSi(form);
    expect(body.systemPressureGaugePa).toBe(150_000);
    expect(body.flowTemperatureC).toBeNull();
    expect(unreadable).toEqual({ 'entries.flowTemperatureC': 'Enter a number.', 'surfaceTemperatures.0.temperatureC': 'Enter a number.' });
    expect(formPathFor('flowRateM3PerS')).toBe('entries.flowRateM3PerS');
    expect(formPathFor('surfaceTemperatures[2].location')).toBe('surfaceTemperatures.2.location');
  });

  it('prefills a correction in the default units and summarises a set as engineers read it', () => {
    const values = { ...emptyReadingValues(), systemPressureGaugePa: 185_000, flowRateM3PerS: 0.0025, surfaceTemperatures: [{ location: 'Flue', temperatureC: 140 }] };
    const form = initialReadingForm(values);
    expect(form.entries.systemPressureGaugePa).toBe('1.85');
    expect(form.entries.flowRateM3PerS).toBe('2.5');
    expect(describeValues(values)).toEqual([
      { label: 'Flow rate', text: '2.5 L/s' },
      { label: 'System pressure', text: '1.85 bar' },
      { label: 'Flue', text: '140 °C' },
    ]);
  });
});

describe('expansion vessel form', () => {
  it('converts m³ and kPa to the calculator’s litres and bar, and keeps vessel errors on their rows', () => {
    const form = { ...initialVesselForm(), systemVolume: '0.5', systemVolumeUnit: 'm3', fillTemperatureC: '10', maxFlowTemperatureC: '80', staticHeightM: '5', safetyValve: '300', safetyValveUnit: 'kPa', vessels: ['50', ''] };
    const { body, unreadable } = vesselFormToRequest(form);
    expect(body).toMatchObject({ systemVolumeL: 500, safetyValveSettingBarGauge: 3, installedVesselVolumesL: [50], preChargeBarGauge: null, preChargeMarginBar: 0.2 });
    expect(unreadable).toEqual({ 'vessels.1': 'Enter the vessel volume or remove this row.' });
    expect(vesselFormPath('installedVesselVolumesL[1]')).toBe('vessels.1');
    expect(vesselFormPath('systemVolumeL')).toBe('systemVolume');
  });

  it('treats a single empty vessel row as no vessel fitted', () => {
    expect(vesselFormToRequest(initialVesselForm()).body.installedVesselVolumesL).toEqual([]);
    expect(vesselFormToRequest(initialVesselForm()).unreadable).toEqual({});
  });
});
