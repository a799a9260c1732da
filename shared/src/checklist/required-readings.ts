// Which measured checks must be answered with a number. By default none: a measured check answered
// "good" is a pass checked by eye, by hand or by a thumper. An organisation may require readings.
import type { Quantity } from '../units/index.js';
import type { ChecklistItem, ReadingRule } from './types.js';

// The air-brake checks that take a reading: air loss over a minute and the gauge pressures.
const AIR_BRAKE_QUANTITIES: readonly Quantity[] = ['leak_rate', 'air_pressure'];

function ruleCovers(rule: ReadingRule, quantity: Quantity, item: ChecklistItem): boolean {
  switch (rule) {
    case 'steer_tread_depth':
      return quantity === 'tread_depth' && item.limitContext?.axle === 'steer';
    case 'tread_depth':
      return quantity === 'tread_depth';
    case 'tire_pressure':
      return quantity === 'tire_pressure';
    case 'pushrod_stroke':
      return quantity === 'pushrod_stroke';
    case 'lining_thickness':
      return quantity === 'lining_thickness';
    case 'steering_lash':
      return quantity === 'steering_lash';
    case 'air_brake_test':
      return AIR_BRAKE_QUANTITIES.includes(quantity);
  }
}

// True when the organisation's rules require a number for this item; "no gauge" still answers it.
export function isReadingRequired(item: ChecklistItem, rules: readonly ReadingRule[]): boolean {
  if (item.expects.type !== 'measure') return false;
  const { quantity } = item.expects;
  return rules.some((rule) => ruleCovers(rule, quantity, item));
}
