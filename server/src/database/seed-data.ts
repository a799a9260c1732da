import type { AxleConfig, Role, VehicleConfig, VehicleKind } from '@yardcall/shared';

// The demo scenario is invented: two small fleets, their people and their units.
// Tire pressures are typical cold-inflation figures (about 100-120 psi, from memory; common practice),
// not a rule: the tire maker's load/inflation table for the real load governs (49 CFR 393.75(i)).

export const DEMO_PASSWORD = 'yardcall-demo';

export interface SeedUser {
  email: string;
  name: string;
  role: Role;
  isStudent?: boolean;
}

export interface SeedVehicle {
  unitNumber: string;
  kind: VehicleKind;
  vin: string;
  plate: string;
  config: VehicleConfig;
}

export interface SeedOrganization {
  name: string;
  users: SeedUser[];
  vehicles: SeedVehicle[];
  // Whether the seed writes the demo history (seed-history.ts) into this organisation.
  history?: boolean;
}

const STEERING_20_POWER = { wheelDiameterIn: 20, type: 'power' } as const;

function steer(
  chamber: AxleConfig['chamber'],
  tireSize = '11R22.5',
  brake: AxleConfig['brake'] = 'air_drum',
): AxleConfig {
  return {
    position: 'steer',
    tires: 'single',
    brake,
    chamber,
    tire: { size: tireSize, coldInflationPsi: 110, sidewallMaxPsi: 120 },
  };
}

function drive(chamber: AxleConfig['chamber'], tireSize = '11R22.5'): AxleConfig {
  return {
    position: 'drive',
    tires: 'dual',
    brake: 'air_drum',
    chamber,
    tire: { size: tireSize, coldInflationPsi: 100, sidewallMaxPsi: 120 },
  };
}

function trailerAxle(
  brake: 'air_drum' | 'air_disc',
  chamber: AxleConfig['chamber'],
  tireSize: string,
  coldInflationPsi: number,
): AxleConfig {
  return {
    position: 'trailer',
    tires: 'dual',
    brake,
    chamber,
    tire: { size: tireSize, coldInflationPsi, sidewallMaxPsi: 120 },
  };
}

type UnitIds = Pick<SeedVehicle, 'unitNumber' | 'vin' | 'plate'>;

// A tractor on a steer axle and two like drive axles, with 20 in power steering.
function tandemTractor(unit: UnitIds, steerAxle: AxleConfig, driveAxle: AxleConfig): SeedVehicle {
  return {
    ...unit,
    kind: 'tractor',
    config: { axles: [steerAxle, driveAxle, structuredClone(driveAxle)], steering: STEERING_20_POWER },
  };
}

// A trailer on two like axles.
function tandemTrailer(unit: UnitIds, axle: AxleConfig): SeedVehicle {
  return { ...unit, kind: 'trailer', config: { axles: [axle, structuredClone(axle)] } };
}

// VINs: 17 characters without I, O or Q and with a valid check digit (49 CFR 565.15); "7YC" is an invented maker code.
export const SEED_ORGANIZATIONS: SeedOrganization[] = [
  {
    name: 'Kestrel Valley Freight',
    history: true,
    users: [
      { email: 'driver@yardcall.test', name: 'Dana Okafor', role: 'driver' },
      { email: 'mechanic@yardcall.test', name: 'Rui Almeida', role: 'mechanic' },
      { email: 'supervisor@yardcall.test', name: 'Priya Lindqvist', role: 'supervisor' },
      { email: 'trainer@yardcall.test', name: 'Marcus Hale', role: 'trainer' },
      { email: 'admin@yardcall.test', name: 'Ingrid Solberg', role: 'admin' },
      { email: 'tomas.reyes@yardcall.test', name: 'Tomas Reyes', role: 'driver' },
      { email: 'aiyana.brooks@yardcall.test', name: 'Aiyana Brooks', role: 'driver' },
      { email: 'student@yardcall.test', name: 'Jordan Pike', role: 'driver', isStudent: true },
      { email: 'noor.haddad@yardcall.test', name: 'Noor Haddad', role: 'driver', isStudent: true },
    ],
    vehicles: [
      tandemTractor(
        { unitNumber: 'KV-101', vin: '7YCTA3K28SN100217', plate: 'KVF 4417' },
        steer({ size: 20, stroke: 'standard' }),
        drive({ size: 30, stroke: 'long' }),
      ),
      tandemTractor(
        { unitNumber: 'KV-102', vin: '7YCTA3K2XSN100218', plate: 'KVF 4418' },
        steer({ size: 24, stroke: 'long' }, '295/75R22.5'),
        drive({ size: 30, stroke: 'standard' }, '295/75R22.5'),
      ),
      tandemTractor(
        { unitNumber: 'KV-103', vin: '7YCTB3L22TN100341', plate: 'KVF 5102' },
        steer({ size: 20, stroke: 'long', ratedStroke3In: true }),
        drive({ size: 30, stroke: 'long' }),
      ),
      // 53 ft dry van.
      tandemTrailer(
        { unitNumber: 'KV-T21', vin: '7YCVD2F10SN200114', plate: 'KVT 2114' },
        trailerAxle('air_drum', { size: 30, stroke: 'long' }, '11R22.5', 100),
      ),
      // Spread-axle flatbed with air disc brakes.
      tandemTrailer(
        { unitNumber: 'KV-T22', vin: '7YCVF2S17RN200122', plate: 'KVT 2122' },
        trailerAxle('air_disc', { size: 24, stroke: 'standard' }, '295/75R22.5', 105),
      ),
      tandemTrailer(
        { unitNumber: 'KV-T23', vin: '7YCVD2F13TN200139', plate: 'KVT 2139' },
        trailerAxle('air_drum', { size: 30, stroke: 'standard' }, '11R22.5', 100),
      ),
      {
        // Box truck for local delivery, hydraulic brakes.
        unitNumber: 'KV-S31',
        kind: 'straight_truck',
        vin: '7YCSC2H14SN300025',
        plate: 'KVS 3125',
        config: {
          axles: [
            {
              position: 'steer',
              tires: 'single',
              brake: 'hydraulic',
              tire: { size: '245/70R19.5', coldInflationPsi: 105, sidewallMaxPsi: 120 },
            },
            {
              position: 'drive',
              tires: 'dual',
              brake: 'hydraulic',
              tire: { size: '245/70R19.5', coldInflationPsi: 95, sidewallMaxPsi: 120 },
            },
          ],
          steering: STEERING_20_POWER,
        },
      },
    ],
  },
  {
    // A second fleet, so tests can prove that no query crosses organisations.
    name: 'Tamarack Bay Haulers',
    users: [{ email: 'admin@tamarack-bay.test', name: 'Oskar Venn', role: 'admin' }],
    vehicles: [
      tandemTractor(
        { unitNumber: 'TB-7', vin: '7YCTA3K26RN400512', plate: 'TBH 0007' },
        steer({ size: 20, stroke: 'standard' }),
        drive({ size: 30, stroke: 'long' }),
      ),
    ],
  },
];
