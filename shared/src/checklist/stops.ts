// Stops: the places a driver stops at and checks several items together, as the trade walks them
// (a wheel end's tires, rims, lug nuts and hub; its brake; its suspension). One prompt per stop says
// the position once and names what to check there.
import { fillTemplate } from './measure-words.js';
import type { ChecklistItem, ChecklistStop } from './types.js';
import type { ChecklistWords, ItemWordId } from './words.js';

export type StopKindId = keyof ChecklistWords['stops']['kinds'];

type Side = 'left' | 'right';
type Dual = 'inner' | 'outer';

// Where one item is checked: the kind of stop, and the side and axle when the stop has them.
export interface StopPlace {
  kind: StopKindId;
  unitKey: string;
  side?: Side;
  axleIndex?: number;
}

// Which stop each item is checked at. Frame, front clearance lamps and reflective sheeting depend on
// where they are and are settled by the builder (see stopKindOf).
const STOP_OF: Record<ItemWordId, StopKindId> = {
  'engine.oil': 'engine',
  'engine.coolant': 'engine',
  'engine.power_steering_fluid': 'engine',
  'engine.belts': 'engine',
  'engine.hoses': 'engine',
  'engine.wiring': 'engine',
  'steering.box': 'steering',
  'steering.linkage': 'steering',
  'steering.lash': 'steering_wheel',
  windshield: 'glass',
  wiper_blades: 'glass',
  mirrors: 'glass',
  'lights.headlamps': 'front_lamps',
  'lights.front_turn': 'front_lamps',
  'lights.front_clearance': 'front_lamps',
  'lights.hazard': 'front_lamps',
  'lights.side_markers': 'side',
  'lights.side_reflectors': 'side',
  'lights.conspicuity': 'side',
  'lights.tail': 'rear_lamps',
  'lights.stop': 'rear_lamps',
  'lights.rear_turn': 'rear_lamps',
  'lights.rear_reflectors': 'rear_lamps',
  'lights.plate': 'rear_lamps',
  'lights.backup': 'rear_lamps',
  'lights.rear_clearance': 'rear_lamps',
  'cab.gauges': 'cab',
  'cab.wipers': 'cab',
  'cab.horn': 'cab',
  'cab.heater': 'cab',
  'cab.seat_belt': 'cab',
  // After the emergency equipment in the walk: a stop of their own keeps the item order.
  'cab.parking_brake': 'brake_tests',
  'cab.service_brake': 'brake_tests',
  'cab.brakes_feel': 'brakes_feel',
  'cab.emergency_exits': 'emergency',
  'emergency.extinguisher': 'emergency',
  'emergency.triangles': 'emergency',
  'emergency.fuses': 'emergency',
  'air.leak_released': 'air_leakage',
  'air.leak_applied': 'air_leakage',
  'air.low_air_warning': 'fanning_down',
  'air.spring_brakes': 'fanning_down',
  'air.build_up': 'compressor',
  'air.governor_cut_out': 'compressor',
  'air.governor_cut_in': 'compressor',
  'air.parking_brake': 'brake_tests',
  'air.service_brake': 'brake_tests',
  door: 'side',
  fuel_tank: 'tank',
  battery_box: 'tank',
  drive_shaft: 'underneath',
  exhaust: 'underneath',
  frame: 'underneath',
  mud_flap: 'mud_flap',
  cargo_doors: 'cargo_doors',
  header: 'trailer_front',
  'tire.inflation': 'wheel',
  'tire.condition': 'wheel',
  'tire.tread': 'wheel',
  rim: 'wheel',
  lugs: 'wheel',
  hub: 'wheel',
  duals: 'wheel',
  'brake.chamber': 'brake',
  'brake.hoses': 'brake',
  'brake.hydraulic_lines': 'brake',
  'brake.slack': 'brake',
  'brake.stroke': 'brake',
  'brake.lining': 'brake',
  'suspension.springs': 'suspension',
  'suspension.mounts': 'suspension',
  'suspension.ubolts': 'suspension',
  'suspension.air_bags': 'suspension',
  'suspension.shocks': 'suspension',
  'coupling.air_lines': 'coupling_lines',
  'coupling.electrical': 'coupling_lines',
  'coupling.mounting': 'fifth_wheel',
  'coupling.slider': 'fifth_wheel',
  'coupling.gap': 'fifth_wheel',
  'coupling.kingpin': 'fifth_wheel',
  'coupling.jaws': 'fifth_wheel',
  'coupling.release_arm': 'fifth_wheel',
  'coupling.landing_gear': 'landing_gear',
};

// The stop kind of an item, given where on the unit it is.
export function stopKindOf(
  id: ItemWordId,
  where: { trailerZone: boolean; placement?: 'left' | 'right' | 'rear'; dual: boolean },
): StopKindId {
  if (id === 'lights.front_clearance' && where.trailerZone) return 'trailer_front';
  if (id === 'lights.conspicuity' && where.placement === 'rear') return 'rear_lamps';
  const kind = STOP_OF[id];
  return kind === 'wheel' && where.dual ? 'duals' : kind;
}

const WHEEL_END_KINDS: Partial<Record<StopKindId, string>> = {
  wheel: 'wheel',
  duals: 'wheel',
  brake: 'brake',
  suspension: 'suspension',
};

// Stable and locale-independent: "u1.engine", "u1.left.tank", "u1.axle1.left.wheel".
export function stopKey(place: StopPlace): string {
  const wheelEnd = WHEEL_END_KINDS[place.kind];
  if (wheelEnd && place.side && place.axleIndex !== undefined) {
    return `${place.unitKey}.axle${place.axleIndex + 1}.${place.side}.${wheelEnd}`;
  }
  return place.side ? `${place.unitKey}.${place.side}.${place.kind}` : `${place.unitKey}.${place.kind}`;
}

// Upper-cases the first letter, past an opening "¿" or "¡".
export function capitalise(text: string): string {
  const at = text.startsWith('¿') || text.startsWith('¡') ? 1 : 0;
  return text.slice(0, at) + text.charAt(at).toLocaleUpperCase() + text.slice(at + 1);
}

// "a, b and c", with the locale's word for "and" (Spanish says "e" before an i sound).
function joinList(parts: readonly string[], words: ChecklistWords['stops']): string {
  if (parts.length <= 1) return parts.join('');
  const last = parts[parts.length - 1] as string;
  const and = /^h?i(?![aeiouáéíóú])/i.test(last) ? words.andBeforeI : words.and;
  return `${parts.slice(0, -1).join(words.comma)}${and}${last}`;
}

// What the stop prompt calls an item and the words a driver may point at it with. A name with
// "{dual}" gets each word for its tire ("outer", "outside") and also the bare word, which the other
// tire of the pair shares, so "the tire" asks which and "the inner rim" does not.
function namesOf(
  itemWords: { name: string; names: readonly string[] },
  dual: Dual | undefined,
  words: ChecklistWords['stops'],
): { name: string; names: readonly string[] } {
  const qualifiers = dual ? words.duals[dual] : [];
  const name = fillTemplate(itemWords.name, { dual: qualifiers[0] ?? '' });
  const names = new Set<string>();
  for (const template of itemWords.names) {
    if (template.includes('{dual}')) {
      for (const qualifier of qualifiers) names.add(fillTemplate(template, { dual: qualifier }));
    }
    names.add(fillTemplate(template, { dual: '' }));
  }
  return { name, names: [...names] };
}

// The names depend only on the words and the tire, not on where the wheel is: work them out once.
const namesCache = new WeakMap<object, Map<Dual | 'single', { name: string; names: readonly string[] }>>();

export function itemNames(
  itemWords: { name: string; names: readonly string[] },
  dual: Dual | undefined,
  words: ChecklistWords['stops'],
): { name: string; names: string[] } {
  let byDual = namesCache.get(itemWords);
  if (!byDual) {
    byDual = new Map();
    namesCache.set(itemWords, byDual);
  }
  let named = byDual.get(dual ?? 'single');
  if (!named) {
    named = namesOf(itemWords, dual, words);
    byDual.set(dual ?? 'single', named);
  }
  // A copy per item: a caller that edits one item's names must not change another's.
  return { name: named.name, names: [...named.names] };
}

interface PlacedItem {
  item: ChecklistItem;
  id: ItemWordId;
  place: StopPlace;
}

// Groups items, already in walk order, into their stops. A stop's items must be contiguous.
export function renderStops(
  placed: readonly PlacedItem[],
  words: ChecklistWords,
  unitLabels: readonly string[],
): ChecklistStop[] {
  const stops: ChecklistStop[] = [];
  const seen = new Set<string>();
  let start = 0;
  while (start < placed.length) {
    const first = placed[start] as PlacedItem;
    let end = start + 1;
    while (end < placed.length && (placed[end] as PlacedItem).item.stopKey === first.item.stopKey) end += 1;
    if (seen.has(first.item.stopKey)) {
      throw new Error(`Stop ${first.item.stopKey} is split: its items must follow one another.`);
    }
    seen.add(first.item.stopKey);
    const group = placed.slice(start, end);
    const previous = stops[stops.length - 1];
    // The unit is said when it changes or a new zone starts; otherwise the position alone.
    const sayUnit = !previous || previous.unitIndex !== first.item.unitIndex || previous.zone !== first.item.zone;
    stops.push(renderStop(group, words, unitLabels[first.item.unitIndex] as string, sayUnit));
    start = end;
  }
  return stops;
}

function renderStop(
  group: readonly PlacedItem[],
  words: ChecklistWords,
  unit: string,
  sayUnit: boolean,
): ChecklistStop {
  const first = group[0] as PlacedItem;
  const { place } = first;
  const kindWords = words.stops.kinds[place.kind];
  const listWords: Readonly<Record<string, string | undefined>> = kindWords.list;
  // The two tires of a dual pair share their words: each is said once.
  const ids = [...new Set(group.map((entry) => entry.id))];
  const list = ids.map((id) => {
    const text = listWords[id];
    if (text === undefined) throw new Error(`The "${place.kind}" stop has no word for ${id}.`);
    return text;
  });
  const sides = 'sides' in kindWords ? kindWords.sides : undefined;
  const values = {
    axle: place.axleIndex !== undefined ? place.axleIndex + 1 : undefined,
    side: place.side && sides ? sides[place.side] : undefined,
    list: joinList(list, words.stops),
  };
  const placeText = fillTemplate(kindWords.place, values);
  const said = fillTemplate(kindWords.prompt, { ...values, place: placeText });
  return {
    key: first.item.stopKey,
    zone: first.item.zone,
    unitIndex: first.item.unitIndex,
    label: capitalise(fillTemplate(words.stops.withUnit, { unit, place: placeText })),
    prompt: capitalise(sayUnit ? fillTemplate(words.stops.withUnit, { unit, place: said }) : said),
    shortPrompt: capitalise(fillTemplate(words.stops.ask, { place: placeText })),
    itemKeys: group.map((entry) => entry.item.key),
  };
}
