import type { AssetType, EnergySource } from '@/shared/rules/register';
import type { AssetAttributes } from '@/shared/types/register';

// The demo register: three invented sites with invented plant. Makers are placeholders ("Maker A"), never brands.

export type DemoAuthor = 'supervisor' | 'engineer' | 'engineer2';

export interface DemoItem {
  plantId: string;
  type: AssetType;
  name: string;
  system: string;
  energySources: EnergySource[];
  attributes: AssetAttributes;
  /** Months since the last service; null = no service recorded. Above the interval = overdue. */
  servicedMonthsAgo: number | null;
  serviceIntervalMonths: number | null;
  installYear: number;
  notes?: string;
  photo?: boolean;
}

export interface DemoRoom {
  name: string;
  floorArea: string;
  accessNotes: string;
  safety: { emergencyStop: string; gasIsolation: string; electricalIsolator: string; firstAid: string; exits: string };
  author: DemoAuthor;
  photo?: boolean;
  items: DemoItem[];
}

export interface DemoSite {
  name: string;
  code: string;
  address: string;
  contact: { name: string; phone: string; email: string };
  rooms: DemoRoom[];
  /** Items outside any plant room (in ceiling voids, on floors). */
  looseItems: DemoItem[];
}

type Opt = Partial<DemoItem>;
const base = (plantId: string, type: AssetType, name: string, system: string, energySources: EnergySource[], attributes: AssetAttributes, o: Opt): DemoItem => ({
  plantId, type, name, system, energySources, attributes, servicedMonthsAgo: 4, serviceIntervalMonths: 12, installYear: 2016, ...o,
});

const boiler = (id: string, name: string, kw: number, o: Opt = {}) =>
  base(id, 'boiler', name, 'LTHW primary', ['gas', 'electrical', 'hot-water'], { fuel: 'natural-gas', ratedOutputKw: kw, flowSetpointC: 80, burnerPressureMbar: 9 }, o);
const pump = (id: string, name: string, system: string, duty: string, circuit: string, o: Opt = {}) =>
  base(id, 'pump', name, system, ['electrical', 'mechanical'], { duty, circuit }, o);
const heatingPump = (id: string, name: string, system: string, duty: string, circuit: string, o: Opt = {}) =>
  base(id, 'pump', name, system, ['electrical', 'mechanical', 'hot-water'], { duty, circuit }, o);
const valve = (id: string, name: string, system: string, normalPosition: string, controlSignal: string, o: Opt = {}) =>
  base(id, 'valve', name, system, system === 'Gas supply' ? ['gas'] : ['hot-water', 'stored-pressure'], { normalPosition, controlSignal }, { serviceIntervalMonths: null, servicedMonthsAgo: null, ...o });
const actuator = (id: string, name: string, system: string, controlSignal: string, o: Opt = {}) =>
  base(id, 'actuator', name, system, ['electrical'], { normalPosition: 'normally-closed', controlSignal }, { serviceIntervalMonths: null, servicedMonthsAgo: null, ...o });
const vessel = (id: string, name: string, system: string, capacityL: number, preChargeBar: number, designPressureBar: number, o: Opt = {}) =>
  base(id, 'vessel', name, system, ['stored-pressure', ...(system.startsWith('Cold') ? [] : ['hot-water' as const])], { capacityL, preChargeBar, designPressureBar }, o);
const pressurisation = (id: string, name: string, fillPressureBar: number, o: Opt = {}) =>
  base(id, 'pressurisation-unit', name, 'LTHW primary', ['electrical', 'stored-pressure'], { fillPressureBar }, o);
const waterHeater = (id: string, name: string, system: string, energy: EnergySource[], capacityL: number, setpointC: number, o: Opt = {}) =>
  base(id, 'water-heater', name, system, energy, { capacityL, setpointC }, o);
const panel = (id: string, name: string, system: string, o: Opt = {}) => base(id, 'control-panel', name, system, ['electrical'], {}, { serviceIntervalMonths: 12, ...o });
const terminal = (id: string, name: string, system: string, o: Opt = {}) =>
  base(id, 'terminal-unit', name, system, ['electrical', 'mechanical', 'hot-water'], {}, { serviceIntervalMonths: 6, ...o });
const other = (id: string, name: string, system: string, energy: EnergySource[], o: Opt = {}) => base(id, 'other', name, system, energy, {}, o);

const safety = (emergencyStop: string, gasIsolation: string, electricalIsolator: string, firstAid: string, exits: string) =>
  ({ emergencyStop, gasIsolation, electricalIsolator, firstAid, exits });

export const DEMO_SITES: DemoSite[] = [
  {
    name: 'Quillmere Academy (demo)',
    code: 'QA',
    address: 'Quillmere Lane, Demotown (invented address)',
    contact: { name: 'Lorna Quist', phone: '+44 7700 900201', email: 'premises@quillmere.example.test' },
    rooms: [
      {
        name: 'Main boiler house', floorArea: 'Ground floor, east end of the main block', author: 'engineer', photo: true,
        accessNotes: 'Key from reception (key safe code held by the premises manager). External door from the service yard; the yard gate is locked during the school day. Sign in at reception first; no lone working during term time.',
        safety: safety(
          'Red mushroom-head boiler house emergency stop inside the yard door, left-hand side, 1.4 m high. A second one is outside, beside the door.',
          'Yellow-handled quarter-turn valve on the incoming gas main by the meter, north wall, 1.2 m high; the automatic solenoid valve is downstream of it.',
          'Mechanical services panel CP-01 main isolator (grey door, padlockable), right of the yard door.',
          'First-aid kit and eyewash station in the caretaker’s office across the corridor; nearest defibrillator at main reception.',
          'Yard door (east) to the service yard; second exit through the internal door to the ground-floor corridor. Assembly point: staff car park.',
        ),
        items: [
          boiler('B-01', 'Boiler 1 (lead)', 320, { photo: true, servicedMonthsAgo: 14, notes: 'Lead boiler. Sequence changes weekly via the control panel.' }),
          boiler('B-02', 'Boiler 2', 320, { servicedMonthsAgo: 14 }),
          boiler('B-03', 'Boiler 3 (standby)', 320, { servicedMonthsAgo: 5, installYear: 2019 }),
          heatingPump('P-01A', 'Primary pump A (duty)', 'LTHW primary', 'duty', 'Primary header'),
          heatingPump('P-01B', 'Primary pump B (standby)', 'LTHW primary', 'standby', 'Primary header'),
          heatingPump('P-02A', 'Heating circuit 1 pump A', 'LTHW heating circuit 1', 'duty', 'Main block radiators'),
          heatingPump('P-02B', 'Heating circuit 1 pump B', 'LTHW heating circuit 1', 'standby', 'Main block radiators'),
          heatingPump('P-03', 'DHW primary pump', 'DHW primary', 'single', 'Calorifier primary coil'),
          valve('V-01', 'Boiler house gas isolation valve', 'Gas supply', 'normally-open', 'manual', { notes: 'Manual isolation only; do not use as a control valve.' }),
          valve('V-12', 'Heating circuit 1 mixing valve', 'LTHW heating circuit 1', 'normally-open', '3-point'),
          actuator('ACT-12', 'Actuator on V-12', 'LTHW heating circuit 1', '0-10v'),
          vessel('EV-01', 'Heating expansion vessel', 'LTHW primary', 300, 1.5, 6, { photo: true, servicedMonthsAgo: 13 }),
          pressurisation('PU-01', 'Heating pressurisation unit', 1.8, { photo: true }),
          waterHeater('CAL-01', 'DHW calorifier', 'DHW primary', ['hot-water', 'stored-pressure'], 1500, 60, { servicedMonthsAgo: 7, serviceIntervalMonths: 6 }),
          panel('CP-01', 'Boiler house control panel', 'Boiler house controls', { photo: true }),
          other('O-01', 'Dosing pot', 'LTHW primary', ['chemical', 'stored-pressure', 'hot-water'], { notes: 'Inhibitor dosing pot. Wear gloves and eye protection; isolate and vent before opening.' }),
        ],
      },
      {
        name: 'Sports hall plant room', floorArea: 'First-floor mezzanine above the changing rooms', author: 'engineer',
        accessNotes: 'Stair from the PE corridor; door kept locked (key on the caretaker’s ring). Low headroom under the ductwork at the far end.',
        safety: safety(
          'Emergency stop on the wall at the top of the stair, beside the light switch.',
          'No gas in this room. Gas for the site is isolated in the main boiler house.',
          'Local isolator for the sports hall plant inside panel CP-02, left of the door.',
          'First-aid kit in the PE office (ground floor, next to the changing rooms).',
          'Back down the stair to the PE corridor; fire exit at the end of the corridor to the playing field.',
        ),
        items: [
          heatingPump('P-04A', 'Heating circuit 2 pump A', 'LTHW heating circuit 2', 'duty', 'Sports hall air handling coil'),
          heatingPump('P-04B', 'Heating circuit 2 pump B', 'LTHW heating circuit 2', 'standby', 'Sports hall air handling coil', { servicedMonthsAgo: 15 }),
          valve('V-20', 'Heating circuit 2 two-port valve', 'LTHW heating circuit 2', 'normally-closed', '24v-on-off'),
          actuator('ACT-20', 'Actuator on V-20', 'LTHW heating circuit 2', '24v-on-off'),
          waterHeater('WH-01', 'Changing room water heater', 'DHW secondary', ['electrical', 'hot-water', 'stored-pressure'], 200, 60, { servicedMonthsAgo: 2 }),
          panel('CP-02', 'Sports hall plant control panel', 'Sports hall controls'),
        ],
      },
      {
        name: 'Science block roof plant', floorArea: 'Roof of the science block', author: 'engineer2',
        accessNotes: 'Caged ladder from the second-floor store; roof hatch is alarmed — tell reception before opening. Stay inside the guard-railed walkway; no access in high wind or ice.',
        safety: safety(
          'Emergency stop on the booster set panel CP-03 door.',
          'No gas on the roof.',
          'Rotary isolator on the wall by the roof hatch for all roof plant.',
          'First-aid kit and eyewash in the science prep room (second floor), beside the chemical store.',
          'Roof hatch and caged ladder only. Do not go onto the roof alone.',
        ),
        items: [
          pump('P-10A', 'Cold water booster pump A', 'Cold water boosting', 'duty-assist', 'Booster set 1'),
          pump('P-10B', 'Cold water booster pump B', 'Cold water boosting', 'duty-assist', 'Booster set 1'),
          vessel('EV-10', 'Booster set accumulator', 'Cold water boosting', 100, 3.5, 10),
          panel('CP-03', 'Booster set control panel', 'Cold water boosting'),
          other('O-02', 'Fume cupboard extract fan', 'Science extract', ['electrical', 'mechanical'], { servicedMonthsAgo: 20 }),
        ],
      },
    ],
    looseItems: [
      terminal('FCU-01', 'Changing room 1 fan coil', 'LTHW heating circuit 2', { notes: 'In the ceiling void above changing room 1; access panel by the door.' }),
      terminal('FCU-02', 'Changing room 2 fan coil', 'LTHW heating circuit 2', { servicedMonthsAgo: 8 }),
    ],
  },
  {
    name: 'Orvenbrook Leisure Centre (demo)',
    code: 'OL',
    address: 'Orvenbrook Road, Demotown (invented address)',
    contact: { name: 'Declan Ferrow', phone: '+44 7700 900202', email: 'duty.manager@orvenbrook.example.test' },
    rooms: [
      {
        name: 'Boiler room', floorArea: 'Ground floor, rear service corridor', author: 'engineer2', photo: true,
        accessNotes: 'Through the staff entrance; the duty manager holds the key. Open 06:00–22:00.',
        safety: safety(
          'Emergency stop beside the door inside the boiler room, red mushroom head under a hinged cover.',
          'Yellow-handled gas isolation valve on the incoming main, high level on the left as you enter; a gas detection panel beside it shuts the solenoid valve.',
          'Main mechanical services isolator in panel CP-01 (right of the door).',
          'First-aid room and eyewash next to reception; defibrillator at reception.',
          'Service corridor door (south) and the external door to the bin store (east).',
        ),
        items: [
          boiler('B-01', 'Boiler 1', 450, { photo: true, servicedMonthsAgo: 3 }),
          boiler('B-02', 'Boiler 2', 450, { servicedMonthsAgo: 3 }),
          heatingPump('P-01A', 'Primary pump A', 'LTHW primary', 'duty', 'Primary header'),
          heatingPump('P-01B', 'Primary pump B', 'LTHW primary', 'standby', 'Primary header'),
          heatingPump('P-05', 'Pool heat exchanger primary pump', 'Pool heating', 'single', 'Pool heat exchanger primary', { servicedMonthsAgo: 13 }),
          valve('V-05', 'Pool heat exchanger three-port valve', 'Pool heating', 'normally-open', '3-point'),
          actuator('ACT-05', 'Actuator on V-05', 'Pool heating', '0-10v'),
          vessel('EV-01', 'Heating expansion vessel', 'LTHW primary', 500, 1.5, 6),
          pressurisation('PU-01', 'Heating pressurisation unit', 1.7, { servicedMonthsAgo: 12 }),
          waterHeater('CAL-01', 'Shower calorifier 1', 'DHW primary', ['hot-water', 'stored-pressure'], 2000, 60, { serviceIntervalMonths: 6, servicedMonthsAgo: 5, photo: true }),
          waterHeater('CAL-02', 'Shower calorifier 2', 'DHW primary', ['hot-water', 'stored-pressure'], 2000, 60, { serviceIntervalMonths: 6, servicedMonthsAgo: 9 }),
          panel('CP-01', 'Boiler room control panel', 'Boiler room controls'),
        ],
      },
      {
        name: 'Pool plant room', floorArea: 'Basement, below the pool hall', author: 'engineer2', photo: true,
        accessNotes: 'Stair from the poolside store. Warm, humid and chemical odours: ventilate before long work. Chemical deliveries through the external hatch only.',
        safety: safety(
          'Emergency stop for the pool circulation pumps on panel CP-20; a second one at poolside by the lifeguard chair.',
          'No gas in this room.',
          'Pool plant isolator inside panel CP-20, front face.',
          'Eyewash station and drench shower at the foot of the stair; first-aid room by reception.',
          'Stair to the poolside store; emergency escape hatch to the car park (north wall).',
        ),
        items: [
          pump('P-20A', 'Pool circulation pump A', 'Pool water circulation', 'duty', 'Main pool'),
          pump('P-20B', 'Pool circulation pump B', 'Pool water circulation', 'standby', 'Main pool'),
          other('O-10', 'Sand filter 1', 'Pool water circulation', ['stored-pressure'], { notes: 'Backwash weekly; record the pressure before and after.' }),
          other('O-11', 'Sand filter 2', 'Pool water circulation', ['stored-pressure']),
          other('O-12', 'Hypochlorite dosing set', 'Pool water treatment', ['chemical', 'electrical'], { servicedMonthsAgo: 7, serviceIntervalMonths: 6, notes: 'Chemical dosing: follow the site chemical handling procedure and wear the PPE listed on the door.' }),
          valve('V-21', 'Filter backwash valve', 'Pool water circulation', 'normally-closed', 'manual'),
          panel('CP-20', 'Pool plant control panel', 'Pool plant controls'),
        ],
      },
    ],
    looseItems: [],
  },
  {
    name: 'Castellan Yard Offices (demo)',
    code: 'CY',
    address: 'Castellan Yard, Demotown (invented address)',
    contact: { name: 'Mina Oakshott', phone: '+44 7700 900203', email: 'facilities@castellan.example.test' },
    rooms: [
      {
        name: 'Basement plant room', floorArea: 'Level B1, off the car park lobby', author: 'supervisor', photo: true,
        accessNotes: 'Fob access; fobs from the security desk on the ground floor against a signature. Car park ramp in use — wear hi-vis between the lift lobby and the plant room door.',
        safety: safety(
          'Emergency stop by the door, inside, at 1.5 m; labelled "Plant emergency stop".',
          'Gas isolation valve (yellow lever) on the incoming main in the gas meter enclosure, to the left of the plant room door in the car park.',
          'Main switchboard isolator for mechanical services in the switch room next door (security desk has the key).',
          'First-aid kit at the security desk; eyewash in the plant room by the dosing pot.',
          'Plant room door to the car park lobby; second exit via the fire stair in the far corner to ground level.',
        ),
        items: [
          boiler('B-01', 'Boiler 1', 250, { photo: true }),
          boiler('B-02', 'Boiler 2', 250, { servicedMonthsAgo: 16 }),
          valve('V-02', 'Boiler 2 gas isolating valve', 'Gas supply', 'normally-open', 'manual', { notes: 'Quarter-turn lever valve on the gas drop to boiler 2; takes a padlock through the lever.' }),
          heatingPump('P-01A', 'Primary pump A', 'LTHW primary', 'duty', 'Primary header'),
          heatingPump('P-01B', 'Primary pump B', 'LTHW primary', 'standby', 'Primary header'),
          heatingPump('P-02A', 'Heating circuit 1 pump A', 'LTHW heating circuit 1', 'duty', 'Perimeter radiators'),
          heatingPump('P-02B', 'Heating circuit 1 pump B', 'LTHW heating circuit 1', 'standby', 'Perimeter radiators'),
          valve('V-12', 'Heating circuit 1 three-port valve', 'LTHW heating circuit 1', 'normally-open', '0-10v'),
          actuator('ACT-12', 'Actuator on V-12', 'LTHW heating circuit 1', '0-10v'),
          vessel('EV-01', 'Heating expansion vessel', 'LTHW primary', 200, 1.5, 6, { servicedMonthsAgo: null }),
          pressurisation('PU-01', 'Heating pressurisation unit', 1.8),
          pump('P-30A', 'Cold water booster pump A', 'Cold water boosting', 'duty-assist', 'Booster set'),
          pump('P-30B', 'Cold water booster pump B', 'Cold water boosting', 'duty-assist', 'Booster set', { servicedMonthsAgo: 18 }),
          panel('CP-01', 'Basement plant control panel', 'Building management controls'),
        ],
      },
      {
        name: 'Roof plant room', floorArea: 'Level 7, east core', author: 'supervisor',
        accessNotes: 'Lift to level 6, then the east core stair. Roof door opens outward; hook it back in wind.',
        safety: safety(
          'Emergency stop inside the door on the left.',
          'Gas isolation valve for the water heater on the pipe entering the room, by the door, yellow lever.',
          'Roof plant isolator in panel CP-02.',
          'First-aid kit on level 6 by the lift lobby.',
          'East core stair; the west core stair across the roof walkway is the second route.',
        ),
        items: [
          waterHeater('WH-01', 'Gas-fired water heater', 'DHW', ['gas', 'electrical', 'hot-water', 'stored-pressure'], 300, 60, { servicedMonthsAgo: 11 }),
          panel('CP-02', 'Roof plant control panel', 'Building management controls'),
          other('O-20', 'Toilet extract fan', 'General extract', ['electrical', 'mechanical'], { serviceIntervalMonths: 12, servicedMonthsAgo: 6 }),
        ],
      },
    ],
    looseItems: [
      terminal('FCU-7.01', 'Level 7 meeting room fan coil', 'LTHW heating circuit 2', { servicedMonthsAgo: 7 }),
      terminal('FCU-7.02', 'Level 7 open office fan coil', 'LTHW heating circuit 2'),
    ],
  },
];
