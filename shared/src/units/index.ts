// The units area's surface: quantities, their units and the conversion to each quantity's canonical unit.
export {
  CANONICAL_UNITS,
  QUANTITIES,
  UNITS,
  canonicalUnitOf,
  isQuantity,
  parseUnit,
  toCanonical,
  unitFits,
  type CanonicalUnit,
  type Quantity,
  type Unit,
} from './units.js';
