// An invented demo combination for tests: Juniper Ridge Freight's tractor 4127 and dry van 5310.
import type { VehicleInput } from '../vehicle/index.js';
import type { ChecklistItem, ChecklistStop } from './types.js';

// A 3-axle tractor: power steering, steer brakes type 20 long stroke, drives type 30 long stroke.
export function sampleTractor(): VehicleInput {
  return {
    unitNumber: '4127',
    kind: 'tractor',
    vin: '3JRFT4127PX000417',
    plate: 'JRF 4127',
    config: {
      steering: { wheelDiameterIn: 20, type: 'power' },
      axles: [
        {
          position: 'steer',
          tires: 'single',
          brake: 'air_drum',
          chamber: { size: 20, stroke: 'long' },
          tire: { size: '295/75R22.5', coldInflationPsi: 110, sidewallMaxPsi: 120 },
        },
        {
          position: 'drive',
          tires: 'dual',
          brake: 'air_drum',
          chamber: { size: 30, stroke: 'long' },
          tire: { size: '11R22.5', coldInflationPsi: 100, sidewallMaxPsi: 105 },
        },
        {
          position: 'drive',
          tires: 'dual',
          brake: 'air_drum',
          chamber: { size: 30, stroke: 'long' },
          tire: { size: '11R22.5', coldInflationPsi: 100, sidewallMaxPsi: 105 },
        },
      ],
    },
  };
}

// A 2-axle dry van trailer: duals, air drum brakes, type 30 long-stroke chambers.
export function sampleTrailer(): VehicleInput {
  return {
    unitNumber: '5310',
    kind: 'trailer',
    vin: '1JRVN5310RX005310',
    plate: 'JRT 5310',
    config: {
      axles: [
        {
          position: 'trailer',
          tires: 'dual',
          brake: 'air_drum',
          chamber: { size: 30, stroke: 'long' },
          tire: { size: '295/75R22.5', coldInflationPsi: 95, sidewallMaxPsi: 110 },
        },
        {
          position: 'trailer',
          tires: 'dual',
          brake: 'air_drum',
          chamber: { size: 30, stroke: 'long' },
          tire: { size: '295/75R22.5', coldInflationPsi: 95, sidewallMaxPsi: 110 },
        },
      ],
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
