// The code a limit row and an item's context use for a brake chamber, e.g. "type-30-long".
import type { BrakeChamber } from '../vehicle/index.js';
import { CHAMBER_CODES, type ChamberCode } from './types.js';

// The code of a chamber 393.47(e) lists, or undefined for one it does not (e.g. a long-stroke type 9).
export function listedChamberCode(chamber: BrakeChamber): ChamberCode | undefined {
  const code = `type-${chamber.size}${chamber.stroke === 'long' ? '-long' : ''}${chamber.ratedStroke3In ? '-3in' : ''}`;
  return (CHAMBER_CODES as readonly string[]).includes(code) ? (code as ChamberCode) : undefined;
}

export function chamberCode(chamber: BrakeChamber): ChamberCode {
  const code = listedChamberCode(chamber);
  if (!code) {
    const name = `type-${chamber.size}${chamber.stroke === 'long' ? '-long' : ''}${chamber.ratedStroke3In ? '-3in' : ''}`;
    // 49 CFR 393.47(e) lists no such chamber (e.g. a long-stroke type 36).
    throw new RangeError(`No push-rod stroke limit is published for a ${name} chamber.`);
  }
  return code;
}
