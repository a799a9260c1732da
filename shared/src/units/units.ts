// Quantities the walk-around measures, their canonical units and conversion from any spoken unit.

export const QUANTITIES = [
  'tread_depth',
  'tire_pressure',
  'lining_thickness',
  'pushrod_stroke',
  'steering_lash',
  'slack_angle',
  'air_pressure',
  'leak_rate',
] as const;
export type Quantity = (typeof QUANTITIES)[number];

export const CANONICAL_UNITS = {
  tread_depth: 'in/32',
  tire_pressure: 'psi',
  lining_thickness: 'in',
  pushrod_stroke: 'in',
  steering_lash: 'in',
  slack_angle: 'deg',
  air_pressure: 'psi',
  leak_rate: 'psi/min',
} as const satisfies Record<Quantity, string>;
export type CanonicalUnit<Q extends Quantity = Quantity> = (typeof CANONICAL_UNITS)[Q];

// Every unit a driver may say or a client may send, grouped by dimension.
export const UNITS = [
  'in',
  'in/32',
  'in/16',
  'in/8',
  'in/4',
  'mm',
  'cm',
  'psi',
  'kPa',
  'bar',
  'deg',
  'psi/min',
  'kPa/min',
  'bar/min',
] as const;
export type Unit = (typeof UNITS)[number];

type Dimension = 'length' | 'pressure' | 'angle' | 'pressure_rate';

const DIMENSION_OF_QUANTITY: Record<Quantity, Dimension> = {
  tread_depth: 'length',
  tire_pressure: 'pressure',
  lining_thickness: 'length',
  pushrod_stroke: 'length',
  steering_lash: 'length',
  slack_angle: 'angle',
  air_pressure: 'pressure',
  leak_rate: 'pressure_rate',
};

// Factor to the dimension's base unit: inches, psi, degrees, psi per minute.
const PSI_PER_KPA = 1 / 6.894757; // 1 psi = 6.894757 kPa (NIST SP 811, B.8)
const UNIT_FACTORS: Record<Unit, { dimension: Dimension; toBase: number }> = {
  in: { dimension: 'length', toBase: 1 },
  'in/32': { dimension: 'length', toBase: 1 / 32 },
  'in/16': { dimension: 'length', toBase: 1 / 16 },
  'in/8': { dimension: 'length', toBase: 1 / 8 },
  'in/4': { dimension: 'length', toBase: 1 / 4 },
  mm: { dimension: 'length', toBase: 1 / 25.4 }, // 1 in = 25.4 mm exactly
  cm: { dimension: 'length', toBase: 1 / 2.54 },
  psi: { dimension: 'pressure', toBase: 1 },
  kPa: { dimension: 'pressure', toBase: PSI_PER_KPA },
  bar: { dimension: 'pressure', toBase: 100 * PSI_PER_KPA }, // 1 bar = 100 kPa
  deg: { dimension: 'angle', toBase: 1 },
  'psi/min': { dimension: 'pressure_rate', toBase: 1 },
  'kPa/min': { dimension: 'pressure_rate', toBase: PSI_PER_KPA },
  'bar/min': { dimension: 'pressure_rate', toBase: 100 * PSI_PER_KPA },
};

const UNIT_ALIASES: Record<string, Unit> = {
  in: 'in',
  inch: 'in',
  inches: 'in',
  '"': 'in',
  'in/32': 'in/32',
  '32nds': 'in/32',
  '32nd': 'in/32',
  '/32': 'in/32',
  'in/16': 'in/16',
  '16ths': 'in/16',
  'in/8': 'in/8',
  '8ths': 'in/8',
  'in/4': 'in/4',
  mm: 'mm',
  millimetre: 'mm',
  millimetres: 'mm',
  millimeter: 'mm',
  millimeters: 'mm',
  cm: 'cm',
  psi: 'psi',
  kpa: 'kPa',
  bar: 'bar',
  deg: 'deg',
  degree: 'deg',
  degrees: 'deg',
  '°': 'deg',
  'psi/min': 'psi/min',
  'kpa/min': 'kPa/min',
  'bar/min': 'bar/min',
};

export function isQuantity(value: unknown): value is Quantity {
  return (QUANTITIES as readonly unknown[]).includes(value);
}

export function parseUnit(text: string): Unit | undefined {
  return UNIT_ALIASES[text.trim().toLowerCase()];
}

export function canonicalUnitOf<Q extends Quantity>(quantity: Q): CanonicalUnit<Q> {
  return CANONICAL_UNITS[quantity];
}

export function unitFits(quantity: Quantity, unit: Unit): boolean {
  return UNIT_FACTORS[unit].dimension === DIMENSION_OF_QUANTITY[quantity];
}

export class UnitError extends Error {}

// Converts a value in any unit of the quantity's dimension into the quantity's canonical unit.
// A value crosses every boundary (API, IndexedDB, database) as { quantity, value, unit }, checked here at
// run time; the result is in canonicalUnitOf(quantity).
export function toCanonical(quantity: Quantity, value: number, unit: string): number {
  const parsed = parseUnit(unit);
  if (!parsed) {
    throw new UnitError(`Unknown unit "${unit}". Use one of: ${UNITS.join(', ')}.`);
  }
  if (!unitFits(quantity, parsed)) {
    throw new UnitError(`${parsed} is not a unit of ${quantity.replace(/_/g, ' ')}; use ${canonicalUnitOf(quantity)}.`);
  }
  const canonical = canonicalUnitOf(quantity) as Unit;
  const base = value * UNIT_FACTORS[parsed].toBase;
  return base / UNIT_FACTORS[canonical].toBase;
}
