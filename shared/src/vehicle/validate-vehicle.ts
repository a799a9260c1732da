import {
  AXLE_POSITIONS,
  BRAKE_TYPES,
  CHAMBER_SIZES,
  CHAMBER_STROKES,
  STEERING_TYPES,
  TIRE_ARRANGEMENTS,
  VEHICLE_KINDS,
  isAirBraked,
  isPowerUnit,
  type VehicleConfig,
  type VehicleKind,
} from './vehicle.js';

// A problem with one field, named by its path in the vehicle (e.g. "config.axles.1.tire.coldInflationPsi").
export interface FieldProblem {
  field: string;
  message: string;
}

export interface VehicleInput {
  unitNumber: string;
  kind: VehicleKind;
  vin: string;
  plate: string;
  config: VehicleConfig;
}

const LONG_STROKE_SIZES: readonly number[] = [12, 16, 20, 24, 30];

// 17 characters, no I, O or Q (ISO 3779 / 49 CFR 565.15).
const VIN_PATTERN = /^[A-HJ-NPR-Z0-9]{17}$/;

function oneOf<T extends string | number>(allowed: readonly T[], value: unknown): value is T {
  return (allowed as readonly unknown[]).includes(value);
}

function isNumberBetween(value: unknown, min: number, max: number): value is number {
  return typeof value === 'number' && Number.isFinite(value) && value >= min && value <= max;
}

// The one home of the vehicle rules: the server's DTO validation and the client's form use it.
export function validateVehicle(input: VehicleInput): FieldProblem[] {
  const problems: FieldProblem[] = [];
  const add = (field: string, message: string) => problems.push({ field, message });

  if (typeof input.unitNumber !== 'string' || !/^[A-Za-z0-9][A-Za-z0-9 -]{0,19}$/.test(input.unitNumber.trim())) {
    add('unitNumber', 'Enter a unit number of 1 to 20 letters, digits, spaces or dashes.');
  }
  if (!oneOf(VEHICLE_KINDS, input.kind)) {
    add('kind', `Choose a kind: ${VEHICLE_KINDS.join(', ')}.`);
  }
  if (typeof input.vin !== 'string' || !VIN_PATTERN.test(input.vin.toUpperCase())) {
    add('vin', 'A VIN has 17 letters and digits, without I, O or Q.');
  }
  if (typeof input.plate !== 'string' || !/^[A-Za-z0-9 -]{2,12}$/.test(input.plate.trim())) {
    add('plate', 'Enter the plate as 2 to 12 letters, digits, spaces or dashes.');
  }
  problems.push(...validateVehicleConfig(input.kind, input.config));
  return problems;
}

export function validateVehicleConfig(kind: VehicleKind, config: VehicleConfig): FieldProblem[] {
  const problems: FieldProblem[] = [];
  const add = (field: string, message: string) => problems.push({ field: `config.${field}`, message });

  if (!config || !Array.isArray(config.axles)) {
    add('axles', 'Add the axles, front to back.');
    return problems;
  }
  if (config.axles.length < 1 || config.axles.length > 6) {
    add('axles', 'A unit has 1 to 6 axles.');
  }
  const power = oneOf(VEHICLE_KINDS, kind) && isPowerUnit(kind);

  config.axles.forEach((axle, index) => {
    const at = `axles.${index}`;
    if (!oneOf(AXLE_POSITIONS, axle.position)) {
      add(`${at}.position`, `Choose a position: ${AXLE_POSITIONS.join(', ')}.`);
    } else if (kind === 'trailer' && axle.position !== 'trailer') {
      add(`${at}.position`, 'Every axle of a trailer is a trailer axle.');
    } else if (power && axle.position === 'trailer') {
      add(`${at}.position`, 'A power unit has steer, drive or tag axles, not trailer axles.');
    }
    if (power && index === 0 && axle.position !== 'steer') {
      add(`${at}.position`, 'The first axle of a power unit is the steer axle.');
    }
    if (!oneOf(TIRE_ARRANGEMENTS, axle.tires)) {
      add(`${at}.tires`, 'Choose single or dual tires.');
    } else if (axle.position === 'steer' && axle.tires === 'dual') {
      add(`${at}.tires`, 'A steer axle has single tires.');
    }
    if (!oneOf(BRAKE_TYPES, axle.brake)) {
      add(`${at}.brake`, `Choose a brake type: ${BRAKE_TYPES.join(', ')}.`);
    } else if (isAirBraked(axle.brake)) {
      if (!axle.chamber) {
        add(`${at}.chamber`, 'An air brake needs its chamber type (9 to 36) and stroke.');
      } else {
        if (!oneOf(CHAMBER_SIZES, axle.chamber.size)) {
          add(`${at}.chamber.size`, `Choose a chamber type: ${CHAMBER_SIZES.join(', ')}.`);
        }
        if (!oneOf(CHAMBER_STROKES, axle.chamber.stroke)) {
          add(`${at}.chamber.stroke`, 'Choose standard or long stroke.');
        } else if (axle.chamber.stroke === 'long' && !LONG_STROKE_SIZES.includes(axle.chamber.size)) {
          // The 49 CFR 393.47(e) table lists long-stroke limits for types 12 to 30 only.
          add(`${at}.chamber.stroke`, `Long stroke is listed for chamber types ${LONG_STROKE_SIZES.join(', ')} only.`);
        }
        if (
          axle.chamber.ratedStroke3In &&
          !(axle.chamber.stroke === 'long' && (axle.chamber.size === 20 || axle.chamber.size === 24))
        ) {
          add(
            `${at}.chamber.ratedStroke3In`,
            'A 3 in rated stroke applies to long-stroke type 20 and 24 chambers only.',
          );
        }
      }
    } else if (axle.chamber) {
      add(`${at}.chamber`, 'A hydraulic brake has no air chamber: remove the chamber.');
    }
    const tire = axle.tire;
    if (!tire) {
      add(`${at}.tire`, 'Enter the tire size and pressures.');
      return;
    }
    if (typeof tire.size !== 'string' || !/^[0-9A-Za-z./ -]{4,20}$/.test(tire.size.trim())) {
      add(`${at}.tire.size`, 'Enter the tire size as on the sidewall, e.g. 11R22.5.');
    }
    if (!isNumberBetween(tire.sidewallMaxPsi, 20, 200)) {
      add(`${at}.tire.sidewallMaxPsi`, 'Enter the sidewall maximum in psi (20 to 200).');
    }
    if (!isNumberBetween(tire.coldInflationPsi, 20, 200)) {
      add(`${at}.tire.coldInflationPsi`, 'Enter the cold-inflation spec in psi (20 to 200).');
    } else if (isNumberBetween(tire.sidewallMaxPsi, 20, 200) && tire.coldInflationPsi > tire.sidewallMaxPsi) {
      add(`${at}.tire.coldInflationPsi`, 'The cold-inflation spec cannot be above the sidewall maximum.');
    }
  });

  if (power) {
    const steering = config.steering;
    if (!steering) {
      add('steering', 'A power unit needs its steering wheel diameter and steering type.');
    } else {
      if (!isNumberBetween(steering.wheelDiameterIn, 12, 26)) {
        add('steering.wheelDiameterIn', 'Enter the steering wheel diameter in inches (12 to 26).');
      }
      if (!oneOf(STEERING_TYPES, steering.type)) {
        add('steering.type', 'Choose power or manual steering.');
      }
    }
  } else if (config.steering) {
    add('steering', 'A trailer has no steering wheel: remove the steering.');
  }
  return problems;
}
