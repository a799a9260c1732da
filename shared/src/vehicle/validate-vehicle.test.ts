import { describe, expect, it } from 'vitest';
import { validateVehicle, type VehicleInput } from './index.js';

const tractor = (): VehicleInput => ({
  unitNumber: 'T-118',
  kind: 'tractor',
  vin: '1YC4TRK80NR118044',
  plate: 'JRF 118',
  config: {
    axles: [
      {
        position: 'steer',
        tires: 'single',
        brake: 'air_drum',
        chamber: { size: 24, stroke: 'long' },
        tire: { size: '295/75R22.5', coldInflationPsi: 110, sidewallMaxPsi: 120 },
      },
      {
        position: 'drive',
        tires: 'dual',
        brake: 'air_drum',
        chamber: { size: 30, stroke: 'long' },
        tire: { size: '11R22.5', coldInflationPsi: 100, sidewallMaxPsi: 120 },
      },
    ],
    steering: { wheelDiameterIn: 20, type: 'power' },
  },
});

const fields = (input: VehicleInput) => validateVehicle(input).map((problem) => problem.field);

describe('validateVehicle', () => {
  it('accepts a complete tractor', () => {
    expect(validateVehicle(tractor())).toEqual([]);
  });

  it('names the field of a VIN with the letter O', () => {
    expect(fields({ ...tractor(), vin: '1YC4TRK80NO118044' })).toEqual(['vin']);
  });

  it('refuses a long-stroke type 9 chamber, which the 393.47(e) table does not list', () => {
    const input = tractor();
    input.config.axles[0]!.chamber = { size: 9, stroke: 'long' };
    expect(fields(input)).toEqual(['config.axles.0.chamber.stroke']);
  });

  it('refuses a chamber on a hydraulic brake and asks for one on an air brake', () => {
    const input = tractor();
    input.config.axles[0]!.brake = 'hydraulic';
    delete input.config.axles[1]!.chamber;
    expect(fields(input)).toEqual(['config.axles.0.chamber', 'config.axles.1.chamber']);
  });

  it('refuses a cold-inflation spec above the sidewall maximum', () => {
    const input = tractor();
    input.config.axles[1]!.tire.coldInflationPsi = 125;
    expect(validateVehicle(input)).toEqual([
      {
        field: 'config.axles.1.tire.coldInflationPsi',
        message: 'The cold-inflation spec cannot be above the sidewall maximum.',
      },
    ]);
  });

  it('wants steering on a power unit and none on a trailer', () => {
    const input = tractor();
    delete input.config.steering;
    expect(fields(input)).toEqual(['config.steering']);
    const trailer: VehicleInput = {
      ...tractor(),
      kind: 'trailer',
      config: {
        axles: [
          {
            position: 'trailer',
            tires: 'dual',
            brake: 'air_disc',
            chamber: { size: 30, stroke: 'standard' },
            tire: { size: '11R22.5', coldInflationPsi: 100, sidewallMaxPsi: 120 },
          },
        ],
        steering: { wheelDiameterIn: 20, type: 'power' },
      },
    };
    expect(fields(trailer)).toEqual(['config.steering']);
  });

  it('starts a power unit with its steer axle and keeps trailer axles off it', () => {
    const input = tractor();
    input.config.axles[0]!.position = 'drive';
    input.config.axles[1]!.position = 'trailer';
    expect(fields(input)).toEqual(['config.axles.0.position', 'config.axles.1.position']);
  });
});
