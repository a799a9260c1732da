// An invented demo combination for tests: Juniper Ridge Freight's tractor 4127 and dry van 5310.
import type {
  AxleConfig,
  AxlePosition,
  ChamberSize,
  TireArrangement,
  TireSpec,
  VehicleInput,
} from '../vehicle/index.js';
import type { Checklist, ChecklistItem, ChecklistStop } from './types.js';

// Every sample axle has air drum brakes with long-stroke chambers.
function airDrumAxle(position: AxlePosition, tires: TireArrangement, size: ChamberSize, tire: TireSpec): AxleConfig {
  return { position, tires, brake: 'air_drum', chamber: { size, stroke: 'long' }, tire };
}

// The sample units' invented numbers, VINs and plates.
const TRACTOR_4127 = { unitNumber: '4127', kind: 'tractor', vin: '3JRFT4127PX000417', plate: 'JRF 4127' } as const;
const TRAILER_5310 = { unitNumber: '5310', kind: 'trailer', vin: '1JRVN5310RX005310', plate: 'JRT 5310' } as const;

// A 3-axle tractor: power steering, steer brakes type 20 long stroke, drives type 30 long stroke.
export function sampleTractor(): VehicleInput {
  const driveTire: TireSpec = { size: '11R22.5', coldInflationPsi: 100, sidewallMaxPsi: 105 };
  return {
    ...TRACTOR_4127,
    config: {
      steering: { wheelDiameterIn: 20, type: 'power' },
      axles: [
        airDrumAxle('steer', 'single', 20, { size: '295/75R22.5', coldInflationPsi: 110, sidewallMaxPsi: 120 }),
        airDrumAxle('drive', 'dual', 30, { ...driveTire }),
        airDrumAxle('drive', 'dual', 30, { ...driveTire }),
      ],
    },
  };
}

// A 2-axle dry van trailer: duals, air drum brakes, type 30 long-stroke chambers.
export function sampleTrailer(): VehicleInput {
  const tire: TireSpec = { size: '295/75R22.5', coldInflationPsi: 95, sidewallMaxPsi: 110 };
  return {
    ...TRAILER_5310,
    config: {
      axles: [airDrumAxle('trailer', 'dual', 30, { ...tire }), airDrumAxle('trailer', 'dual', 30, { ...tire })],
    },
  };
}

// The tractor and its trailer, in walk-around order (power unit first).
export function sampleCombination(): VehicleInput[] {
  return [sampleTractor(), sampleTrailer()];
}

// One stop for each item, for a hand-built checklist in a test that walks items one by one.
export function stopPerItem(items: readonly ChecklistItem[]): ChecklistStop[] {
  return items.map((item) => ({
    key: item.stopKey,
    zone: item.zone,
    unitIndex: item.unitIndex,
    label: item.positionLabel,
    prompt: item.prompt,
    shortPrompt: item.shortPrompt,
    itemKeys: [item.key],
  }));
}

// A hand-built check item on the tractor, its key standing for its name, stop and prompts.
export function handItem(key: string, zone: string, overrides: Partial<ChecklistItem> = {}): ChecklistItem {
  return {
    key,
    zone,
    stopKey: key,
    name: key,
    names: [key],
    unitIndex: 0,
    unitKind: 'tractor',
    category: 'lights',
    safety: false,
    title: key,
    positionLabel: `Tractor, ${key}`,
    prompt: key,
    shortPrompt: key,
    expects: { type: 'check' },
    points: [],
    ...overrides,
  };
}

// An invented three-zone tractor pre-trip (front, left side, in the cab) over hand-built items, a stop each.
export function threeZoneChecklist(items: ChecklistItem[]): Checklist {
  return {
    kind: 'pre_trip',
    locale: 'en',
    zones: [
      { key: 'front', title: 'Front' },
      { key: 'left', title: 'Left side' },
      { key: 'cab', title: 'In the cab' },
    ],
    stops: stopPerItem(items),
    items,
  };
}
