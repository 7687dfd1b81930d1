import { Asset } from '@/server/models/asset.model';
import { Site } from '@/server/models/site.model';
import { generateLabelCode } from '@/shared/rules/label-code';
import type { AssetType, EnergySource } from '@/shared/rules/register';

/** A site with a few plant items, written straight to the database for tests of features built on the register. */
export async function createSiteWithAssets(organisationId: number, createdBy: number, opts: { timeZone?: string; name?: string } = {}) {
  const site = await Site.create({
    organisationId, name: opts.name ?? 'Test Site', timeZone: opts.timeZone ?? 'Europe/London',
    clientContactName: null, clientContactPhone: null, clientContactEmail: null, createdBy,
  });
  const make = (plantId: string, name: string, type: AssetType, energySources: EnergySource[]) =>
    Asset.create({
      organisationId, siteId: site.id, plantRoomId: null, plantId, labelCode: generateLabelCode(), name, type, system: 'LTHW heating circuit 1',
      energySources, manufacturer: '', model: '', serialNumber: '', installDate: null, serviceIntervalMonths: null, lastServiceDate: null,
      nextServiceDue: null, notes: '', attributes: {}, createdBy,
    });
  return {
    site,
    pump: await make('P-01', 'Heating pump 1', 'pump', ['electrical', 'mechanical', 'hot-water', 'stored-pressure']),
    boiler: await make('B-01', 'Boiler 1', 'boiler', ['gas', 'electrical', 'hot-water', 'stored-pressure']),
    valve: await make('V-01', 'Pump 1 flow isolating valve', 'valve', []),
    isolator: await make('E-01', 'Pump 1 local isolator', 'other', ['electrical']),
  };
}
