import { describe, expect, it } from 'vitest';
import { sampleTractor, sampleTrailer } from '../testing.js';
import { validateVehicle, type VehicleInput } from './index.js';

const fields = (input: VehicleInput) => validateVehicle(input).map((problem) => problem.field);

describe('validateVehicle', () => {
  it('accepts a complete tractor', () => {
    expect(validateVehicle(sampleTractor())).toEqual([]);
  });

  it('names the field of a VIN with the letter O', () => {
    expect(fields({ ...sampleTractor(), vin: '1YC4TRK80NO118044' })).toEqual(['vin']);
  });

  it('refuses a long-stroke type 9 chamber, which the 393.47(e) table does not list', () => {
    const input = sampleTractor();
    input.config.axles[0]!.chamber = { size: 9, stroke: 'long' };
    expect(fields(input)).toEqual(['config.axles.0.chamber.stroke']);
  });

  it('refuses a chamber on a hydraulic brake and asks for one on an air brake', () => {
    const input = sampleTractor();
    input.config.axles[0]!.brake = 'hydraulic';
    delete input.config.axles[1]!.chamber;
    expect(fields(input)).toEqual(['config.axles.0.chamber', 'config.axles.1.chamber']);
  });

  it('refuses a cold-inflation spec above the sidewall maximum', () => {
    const input = sampleTractor();
    input.config.axles[1]!.tire.coldInflationPsi = 125;
    expect(validateVehicle(input)).toEqual([
      {
        field: 'config.axles.1.tire.coldInflationPsi',
        message: 'The cold-inflation spec cannot be above the sidewall maximum.',
      },
    ]);
  });

  it('wants steering on a power unit and none on a trailer', () => {
    const input = sampleTractor();
    delete input.config.steering;
    expect(fields(input)).toEqual(['config.steering']);
    const trailer = sampleTrailer();
    trailer.config.steering = { wheelDiameterIn: 20, type: 'power' };
    expect(fields(trailer)).toEqual(['config.steering']);
  });

  it('starts a power unit with its steer axle and keeps trailer axles off it', () => {
    const input = sampleTractor();
    input.config.axles[0]!.position = 'drive';
    input.config.axles[1]!.position = 'trailer';
    expect(fields(input)).toEqual(['config.axles.0.position', 'config.axles.1.position']);
  });
});
