import {
  isAirBraked,
  isPowerUnit,
  type AxleConfig,
  type AxlePosition,
  type BrakeType,
  type ChamberSize,
  type ChamberStroke,
  type FieldProblem,
  type SteeringType,
  type TireArrangement,
  type VehicleKind,
  type VehicleRequest,
  type VehicleResponse,
  type VehicleStatus,
} from '@yardcall/shared';

// What the form edits: numbers stay text until submit so a half-typed value is not lost.
export interface AxleDraft {
  position: AxlePosition;
  tires: TireArrangement;
  brake: BrakeType;
  chamberSize: ChamberSize | null;
  chamberStroke: ChamberStroke;
  ratedStroke3In: boolean;
  tireSize: string;
  coldInflationPsi: string;
  sidewallMaxPsi: string;
}

export interface VehicleDraft {
  unitNumber: string;
  kind: VehicleKind;
  vin: string;
  plate: string;
  status: VehicleStatus;
  steeringWheelDiameterIn: string;
  steeringType: SteeringType;
  axles: AxleDraft[];
}

export const MAX_AXLES = 6;

export function newAxleDraft(position: AxlePosition): AxleDraft {
  return {
    position,
    tires: position === 'steer' ? 'single' : 'dual',
    brake: 'air_drum',
    chamberSize: null,
    chamberStroke: 'standard',
    ratedStroke3In: false,
    // Tire size and pressures come from the vehicle and its tires: no guessed defaults.
    tireSize: '',
    coldInflationPsi: '',
    sidewallMaxPsi: '',
  };
}

export function defaultAxlePositions(kind: VehicleKind): AxlePosition[] {
  switch (kind) {
    case 'tractor':
      return ['steer', 'drive', 'drive'];
    case 'trailer':
      return ['trailer', 'trailer'];
    case 'straight_truck':
    case 'bus':
      return ['steer', 'drive'];
  }
}

export function newVehicleDraft(kind: VehicleKind = 'tractor'): VehicleDraft {
  return {
    unitNumber: '',
    kind,
    vin: '',
    plate: '',
    status: 'in_service',
    steeringWheelDiameterIn: '',
    steeringType: 'power',
    axles: defaultAxlePositions(kind).map(newAxleDraft),
  };
}

// A trailer has trailer axles and no steering; a power unit starts with a steer axle.
export function changeKind(draft: VehicleDraft, kind: VehicleKind): VehicleDraft {
  const wasTrailer = draft.kind === 'trailer';
  const isTrailer = kind === 'trailer';
  if (wasTrailer === isTrailer) return { ...draft, kind };
  return { ...draft, kind, axles: defaultAxlePositions(kind).map(newAxleDraft) };
}

function parseNumber(text: string): number {
  return text.trim() === '' ? Number.NaN : Number(text.replace(',', '.'));
}

function axleToConfig(axle: AxleDraft): AxleConfig {
  const config: AxleConfig = {
    position: axle.position,
    tires: axle.tires,
    brake: axle.brake,
    tire: {
      size: axle.tireSize.trim(),
      coldInflationPsi: parseNumber(axle.coldInflationPsi),
      sidewallMaxPsi: parseNumber(axle.sidewallMaxPsi),
    },
  };
  // The chamber exists only for air brakes; a hydraulic axle sends none.
  if (isAirBraked(axle.brake) && axle.chamberSize !== null) {
    const ratedStroke3In =
      axle.chamberStroke === 'long' && (axle.chamberSize === 20 || axle.chamberSize === 24) && axle.ratedStroke3In;
    config.chamber = {
      size: axle.chamberSize,
      stroke: axle.chamberStroke,
      ...(ratedStroke3In ? { ratedStroke3In } : {}),
    };
  }
  return config;
}

export function draftToRequest(draft: VehicleDraft): VehicleRequest {
  return {
    unitNumber: draft.unitNumber.trim(),
    kind: draft.kind,
    vin: draft.vin.trim().toUpperCase(),
    plate: draft.plate.trim(),
    status: draft.status,
    config: {
      axles: draft.axles.map(axleToConfig),
      ...(isPowerUnit(draft.kind)
        ? { steering: { wheelDiameterIn: parseNumber(draft.steeringWheelDiameterIn), type: draft.steeringType } }
        : {}),
    },
  };
}

export function draftFromVehicle(vehicle: VehicleResponse): VehicleDraft {
  return {
    unitNumber: vehicle.unitNumber,
    kind: vehicle.kind,
    vin: vehicle.vin,
    plate: vehicle.plate,
    status: vehicle.status,
    steeringWheelDiameterIn: vehicle.config.steering ? String(vehicle.config.steering.wheelDiameterIn) : '',
    steeringType: vehicle.config.steering?.type ?? 'power',
    axles: vehicle.config.axles.map((axle) => ({
      position: axle.position,
      tires: axle.tires,
      brake: axle.brake,
      chamberSize: axle.chamber?.size ?? null,
      chamberStroke: axle.chamber?.stroke ?? 'standard',
      ratedStroke3In: axle.chamber?.ratedStroke3In ?? false,
      tireSize: axle.tire.size,
      coldInflationPsi: String(axle.tire.coldInflationPsi),
      sidewallMaxPsi: String(axle.tire.sidewallMaxPsi),
    })),
  };
}

// Problems keyed by the field that shows them. A missing chamber is told at the chamber type.
export function problemsByField(problems: FieldProblem[]): Record<string, string> {
  const byField: Record<string, string> = {};
  for (const { field, message } of problems) {
    const shownAt = /^config\.axles\.\d+\.chamber$/.test(field) ? `${field}.size` : field;
    byField[shownAt] ??= message;
  }
  return byField;
}

// The DOM id of a field, from its path in the vehicle, so the first problem can take focus.
export function fieldId(path: string): string {
  return `vehicle-${path.replaceAll('.', '-')}`;
}
