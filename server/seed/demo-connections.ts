import { Op, type Transaction } from 'sequelize';
import { insertWithLabelCode } from '@/server/lib/unique-clash';
import { Asset } from '@/server/models/asset.model';
import { Connection } from '@/server/models/connection.model';
import { PlantRoom } from '@/server/models/plant-room.model';
import { Site } from '@/server/models/site.model';
import type { Medium } from '@/shared/rules/connections';
import type { AssetType, EnergySource } from '@/shared/rules/register';

type NewItem = [plantId: string, type: AssetType, name: string, system: string, energySources: EnergySource[], attributes?: Record<string, string>];

const manual = { isolation: 'manual', normalPosition: 'normally-open', controlSignal: 'manual' };
const gasValve = (id: string, name: string): NewItem => [id, 'valve', name, 'Gas supply', ['gas'], manual];
const wetValve = (id: string, name: string, normal = 'normally-open'): NewItem => [id, 'valve', name, 'LTHW primary', ['hot-water', 'stored-pressure'], { ...manual, normalPosition: normal }];
const spur = (id: string, name: string, form = 'fused-spur'): NewItem => [id, 'isolator', name, 'Boiler house electrical', ['electrical'], { isolatorForm: form }];

/** The supplies and isolation points the connections of the main boiler house need (invented plant). */
const BOILER_HOUSE_ITEMS: NewItem[] = [
  ['GS-01', 'gas-supply', 'Incoming gas supply and meter', 'Gas supply', ['gas'], { meterPoint: 'Demo meter point 0001' }],
  gasValve('ECV-01', 'Emergency control valve at the meter'),
  ['GH-01', 'pipework', 'Boiler gas header', 'Gas supply', ['gas'], {}],
  gasValve('GV-B01', 'Boiler 1 gas isolating cock'),
  gasValve('GV-B02', 'Boiler 2 gas isolating cock'),
  gasValve('GV-B03', 'Boiler 3 gas isolating cock'),
  ['ES-01', 'electrical-supply', 'Electrical intake', 'Electrical supply', ['electrical'], { supplyNumber: 'Demo supply 0001' }],
  ['DB-01', 'distribution-board', 'Mechanical services distribution board', 'Electrical supply', ['electrical'], { ways: '12' }],
  spur('ISO-CP01', 'Control panel main switch-disconnector', 'switch-disconnector'),
  spur('FS-B01', 'Boiler 1 fused spur'),
  spur('FS-B02', 'Boiler 2 fused spur'),
  spur('FS-B03', 'Boiler 3 fused spur'),
  spur('ISO-P01', 'Primary pumps local isolator', 'isolator'),
  spur('ISO-P02', 'Circuit 1 twin pump local isolator', 'isolator'),
  wetValve('FV-B01', 'Boiler 1 flow isolating valve'),
  wetValve('FV-B02', 'Boiler 2 flow isolating valve'),
  wetValve('FV-B03', 'Boiler 3 flow isolating valve'),
  wetValve('RV-B01', 'Boiler 1 return isolating valve'),
  wetValve('RV-B02', 'Boiler 2 return isolating valve'),
  wetValve('RV-B03', 'Boiler 3 return isolating valve'),
  ['FH-01', 'pipework', 'Primary flow header', 'LTHW primary', ['hot-water', 'stored-pressure'], {}],
  ['RH-01', 'pipework', 'Primary return header', 'LTHW primary', ['hot-water', 'stored-pressure'], {}],
  wetValve('IV-C1', 'Heating circuit 1 flow isolating valve'),
  wetValve('BV-C1', 'Heating circuit 1 bypass valve', 'normally-closed'),
  wetValve('IV-C1R', 'Heating circuit 1 return isolating valve'),
  ['PW-C1', 'pipework', 'Heating circuit 1 pipework (main block radiators)', 'LTHW heating circuit 1', ['hot-water', 'stored-pressure'], {}],
  ['WS-01', 'water-supply', 'Incoming mains water', 'Cold water', ['mains-make-up'], { meterPoint: 'Demo water meter 0001' }],
  ['SV-01', 'valve', 'Pressurisation unit feed stop valve', 'Cold water', ['mains-make-up'], manual],
];

const boilers = ['B01', 'B02', 'B03'];
/** "from>to:medium", as drawn on the boiler house schematic. */
const BOILER_HOUSE_LINKS: string[] = [
  // The gas main through the emergency control valve and the boiler house valve to the header and each boiler.
  'GS-01>ECV-01:gas', 'ECV-01>V-01:gas', 'V-01>GH-01:gas',
  ...boilers.flatMap((b) => [`GH-01>GV-${b}:gas`, `GV-${b}>B-${b.slice(1)}:gas`]),
  // The intake through the board and isolators to the panel, the boilers and the pumps.
  'ES-01>DB-01:electrical', 'DB-01>ISO-CP01:electrical', 'ISO-CP01>CP-01:electrical',
  ...boilers.flatMap((b) => [`CP-01>FS-${b}:electrical`, `FS-${b}>B-${b.slice(1)}:electrical`]),
  'CP-01>ISO-P01:electrical', 'ISO-P01>P-01A:electrical', 'ISO-P01>P-01B:electrical',
  'CP-01>ISO-P02:electrical', 'ISO-P02>P-02A:electrical', 'ISO-P02>P-02B:electrical',
  'CP-01>ACT-12:electrical', 'CP-01>PU-01:electrical', 'CP-01>P-03:electrical',
  // Each boiler between its flow and return valves on the primary headers.
  ...boilers.flatMap((b) => [`B-${b.slice(1)}>FV-${b}:heating-flow`, `FV-${b}>FH-01:heating-flow`, `RH-01>RV-${b}:heating-return`, `RV-${b}>B-${b.slice(1)}:heating-return`]),
  // Heating circuit 1: isolating valve with a bypass round it, mixing valve, twin pumps, radiators, return valve.
  'FH-01>IV-C1:heating-flow', 'FH-01>BV-C1:heating-flow', 'IV-C1>V-12:heating-flow', 'BV-C1>V-12:heating-flow',
  'V-12>P-02A:heating-flow', 'V-12>P-02B:heating-flow', 'P-02A>PW-C1:heating-flow', 'P-02B>PW-C1:heating-flow',
  'PW-C1>IV-C1R:heating-return', 'IV-C1R>RH-01:heating-return',
  // The calorifier's primary coil, recorded without its valves (the plan shows that as a gap).
  'FH-01>P-03:heating-flow', 'P-03>CAL-01:heating-flow', 'CAL-01>RH-01:heating-return',
  // The pressurisation unit on the mains feed, making up into the return header beside the expansion vessel.
  'WS-01>SV-01:mains-water', 'SV-01>PU-01:mains-water', 'PU-01>RH-01:heating-return', 'RH-01>EV-01:heating-return',
];

/**
 * Connects the Quillmere main boiler house: adds its supplies and isolation points and draws the links. Runs once,
 * with the demo register; the existing valves are recorded as isolating (V-01) or control valves (V-12).
 */
export async function seedDemoConnections(opts: { organisationId: number; createdBy: number; transaction: Transaction }) {
  const { organisationId, createdBy, transaction } = opts;
  const site = await Site.findOne({ where: { organisationId, name: { [Op.like]: 'Quillmere%' } }, transaction });
  const room = site && (await PlantRoom.findOne({ where: { siteId: site.id, name: 'Main boiler house' }, transaction }));
  if (!site || !room || (await Connection.count({ where: { siteId: site.id }, transaction }))) return;
  for (const [plantId, type, name, system, energySources, attributes] of BOILER_HOUSE_ITEMS) {
    await insertWithLabelCode((labelCode) =>
      Asset.create({
        organisationId, siteId: site.id, plantRoomId: room.id, labelCode, plantId, name, type, system, energySources,
        manufacturer: `Maker ${String.fromCharCode(65 + (plantId.charCodeAt(0) % 6))}`, model: '', serialNumber: '', installDate: null, serviceIntervalMonths: null, lastServiceDate: null,
        nextServiceDue: null, notes: '', attributes: attributes ?? {}, createdBy,
      }, { transaction }),
    );
  }
  const items = await Asset.findAll({ where: { siteId: site.id }, transaction });
  const byPlantId = new Map(items.map((a) => [a.plantId, a]));
  const mark = async (plantId: string, isolation: string) => {
    const valve = byPlantId.get(plantId);
    if (valve) await valve.update({ attributes: { ...valve.attributes, isolation } }, { transaction });
  };
  await mark('V-01', 'manual');
  await mark('V-12', 'none');
  await Connection.bulkCreate(
    BOILER_HOUSE_LINKS.map((spec) => {
      const [ends, medium] = spec.split(':');
      const [from, to] = ends.split('>').map((p) => byPlantId.get(p)!);
      return { organisationId, siteId: site.id, fromAssetId: from.id, toAssetId: to.id, medium: medium as Medium, createdBy };
    }),
    { transaction },
  );
}
