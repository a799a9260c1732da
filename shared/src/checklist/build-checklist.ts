// Builds the walk-around checklist for one vehicle or a combination, in the order a driver walks it.
import { applicableLimits } from '../limits/index.js';
import { canonicalUnitOf, type Quantity } from '../units/index.js';
import {
  VEHICLE_KINDS,
  isAirBraked,
  isPowerUnit,
  validateVehicleConfig,
  type AxleConfig,
  type FieldProblem,
  type VehicleKind,
} from '../vehicle/index.js';
import { listedChamberCode } from './chamber-code.js';
import {
  INSPECTION_KINDS,
  LOCALES,
  SAFETY_CATEGORIES,
  ZONE_KEYS,
  type Checklist,
  type ChecklistItem,
  type ChecklistVehicle,
  type InspectionKind,
  type ItemCategory,
  type Locale,
  type MeasurementContext,
  type ZoneKey,
} from './types.js';
import { fillTemplate, formatMeasure, verdictWords } from './measure-words.js';
import { capitalise, itemNames, renderStops, stopKey, stopKindOf, type StopPlace } from './stops.js';
import { checklistWords, type AreaWordId, type ChecklistWords, type ItemWordId, type PartWordId } from './words.js';

// A checklist cannot be built from this input; problems name the vehicle fields at fault.
export class ChecklistError extends Error {
  readonly problems: FieldProblem[];

  constructor(message: string, problems: FieldProblem[] = []) {
    super(message);
    this.name = 'ChecklistError';
    this.problems = problems;
  }
}

// Which inspection kinds an item belongs to. Post-trip keeps the parts 49 CFR 396.11(a)(1) names;
// en-route is a short walk-around: tires, wheels, lights, coupling and how the brakes felt.
type Scope = 'full' | 'post' | 'route' | 'route_only';

const KINDS_OF_SCOPE: Record<Scope, readonly InspectionKind[]> = {
  full: ['pre_trip', 'practice'],
  post: ['pre_trip', 'practice', 'post_trip'],
  route: ['pre_trip', 'practice', 'post_trip', 'en_route'],
  route_only: ['en_route'],
};

type Side = 'left' | 'right';
type Dual = 'inner' | 'outer';

interface Draft {
  key: string;
  zone: ZoneKey;
  unitIndex: number;
  id: ItemWordId;
  category: ItemCategory;
  scope: Scope;
  area?: AreaWordId;
  // Left, right or rear of the unit, for items placed by area.
  placement?: 'left' | 'right' | 'rear';
  wheel?: { axleIndex: number; side: Side; dual?: Dual; part: PartWordId };
  measure?: { quantity: Quantity; context: MeasurementContext };
}

// Lamps by kind of unit (49 CFR 393.11, Table 1).
const POWER_UNIT_FRONT_LAMPS: readonly ItemWordId[] = [
  'lights.headlamps',
  'lights.front_turn',
  'lights.front_clearance',
  'lights.hazard',
];
const SIDE_LAMPS: readonly ItemWordId[] = ['lights.side_markers', 'lights.side_reflectors'];
const TRACTOR_REAR_LAMPS: readonly ItemWordId[] = [
  'lights.tail',
  'lights.stop',
  'lights.rear_turn',
  'lights.rear_reflectors',
  'lights.plate',
  'lights.backup',
];
// From memory: Table 1 also asks trucks and buses 80 in or wider for rear clearance and identification lamps.
const TRUCK_REAR_LAMPS: readonly ItemWordId[] = ['lights.rear_clearance', ...TRACTOR_REAR_LAMPS];
// Trailers 80 in or wider (393.11(b)); front clearance lamps from memory of Table 1.
const TRAILER_REAR_LAMPS: readonly ItemWordId[] = [
  'lights.rear_clearance',
  'lights.tail',
  'lights.stop',
  'lights.rear_turn',
  'lights.rear_reflectors',
  'lights.plate',
];

const SUSPENSION_ITEMS: readonly ItemWordId[] = [
  'suspension.springs',
  'suspension.mounts',
  'suspension.ubolts',
  'suspension.air_bags',
  'suspension.shocks',
];

const FIFTH_WHEEL_ITEMS: readonly ItemWordId[] = [
  'coupling.mounting',
  'coupling.slider',
  'coupling.gap',
  'coupling.kingpin',
  'coupling.jaws',
  'coupling.release_arm',
];

// A power unit and up to three trailers: the most units one walk-around covers (our own bound).
export const MAX_UNITS = 4;

class ChecklistBuilder {
  readonly items: ChecklistItem[] = [];
  // Each item's word id and stop, for grouping the stops once the items are in walk order.
  readonly placed = new Map<string, { id: ItemWordId; place: StopPlace }>();
  private readonly words: ChecklistWords;
  readonly unitLabels: string[];
  private readonly combination: 'single' | 'combination';
  // Many wheel ends share a limit: say each one once per build.
  private readonly limitTexts = new Map<string, string | undefined>();

  constructor(
    private readonly vehicles: readonly ChecklistVehicle[],
    private readonly kind: InspectionKind,
    private readonly locale: Locale,
  ) {
    this.words = checklistWords(locale);
    this.combination = vehicles.length > 1 ? 'combination' : 'single';
    // "Trailer" alone, or "Trailer 1" and "Trailer 2" when the combination has two.
    const counts = new Map<VehicleKind, number>();
    for (const vehicle of vehicles) counts.set(vehicle.kind, (counts.get(vehicle.kind) ?? 0) + 1);
    const seen = new Map<VehicleKind, number>();
    this.unitLabels = vehicles.map((vehicle) => {
      const n = (seen.get(vehicle.kind) ?? 0) + 1;
      seen.set(vehicle.kind, n);
      const name = this.words.units[vehicle.kind];
      return (counts.get(vehicle.kind) ?? 0) > 1 ? fillTemplate(this.words.unitNumbered, { unit: name, n }) : name;
    });
  }

  build(): void {
    const first = this.vehicles[0];
    if (first && isPowerUnit(first.kind)) this.powerUnit(0);
    this.vehicles.forEach((vehicle, index) => {
      if (index > 0) this.coupling(index);
    });
    this.vehicles.forEach((vehicle, index) => {
      if (!isPowerUnit(vehicle.kind)) this.trailer(index);
    });
  }

  private add(draft: Draft): void {
    if (!KINDS_OF_SCOPE[draft.scope].includes(this.kind)) return;
    this.items.push(this.render(draft));
  }

  private unitKey(unitIndex: number): string {
    return `u${unitIndex + 1}`;
  }

  // An item placed by area of a unit, optionally on one side: "u1.left.fuel_tank".
  private areaItem(
    unitIndex: number,
    zone: ZoneKey,
    area: AreaWordId,
    id: ItemWordId,
    category: ItemCategory,
    scope: Scope,
    placement?: 'left' | 'right' | 'rear',
    measure?: Draft['measure'],
  ): void {
    const key = `${this.unitKey(unitIndex)}.${placement ? `${placement}.` : ''}${id}`;
    this.add({ key, zone, unitIndex, id, category, scope, area, placement, measure });
  }

  private powerUnit(unitIndex: number): void {
    const vehicle = this.vehicles[unitIndex] as ChecklistVehicle;
    const { config } = vehicle;
    const airBraked = config.axles.some((axle) => isAirBraked(axle.brake));

    // Front and engine compartment.
    const front = (area: AreaWordId, id: ItemWordId, category: ItemCategory, scope: Scope) =>
      this.areaItem(unitIndex, 'front', area, id, category, scope);
    front('engine', 'engine.oil', 'engine', 'full');
    front('engine', 'engine.coolant', 'engine', 'full');
    if (config.steering?.type === 'power') front('engine', 'engine.power_steering_fluid', 'steering', 'full');
    front('engine', 'engine.belts', 'engine', 'full');
    front('engine', 'engine.hoses', 'engine', 'full');
    front('engine', 'engine.wiring', 'engine', 'full');
    front('engine', 'steering.box', 'steering', 'post');
    front('engine', 'steering.linkage', 'steering', 'post');
    for (const lamp of POWER_UNIT_FRONT_LAMPS) front('front', lamp, 'lights', 'route');
    front('front', 'windshield', 'windshield', 'full');
    front('front', 'wiper_blades', 'windshield', 'full');
    front('front', 'mirrors', 'mirrors', 'post');

    // In the cab.
    const cab = (id: ItemWordId, category: ItemCategory, scope: Scope, measure?: Draft['measure']) =>
      this.areaItem(unitIndex, 'cab', 'cab', id, category, scope, undefined, measure);
    cab('cab.gauges', 'cab', 'full');
    cab('cab.wipers', 'windshield', 'post');
    cab('cab.horn', 'horn', 'post');
    cab('cab.heater', 'cab', 'full');
    cab('cab.seat_belt', 'cab', 'full');
    if (config.steering) {
      cab('steering.lash', 'steering', 'full', {
        quantity: 'steering_lash',
        context: { axle: 'steer', wheelDiameterIn: config.steering.wheelDiameterIn, steering: config.steering.type },
      });
    }
    cab('emergency.extinguisher', 'emergency', 'post');
    cab('emergency.triangles', 'emergency', 'post');
    cab('emergency.fuses', 'emergency', 'post');
    if (vehicle.kind === 'bus') cab('cab.emergency_exits', 'body', 'post');
    if (!airBraked) {
      cab('cab.parking_brake', 'brakes', 'post');
      cab('cab.service_brake', 'brakes', 'post');
    }
    cab('cab.brakes_feel', 'brakes', 'route_only');

    // Air-brake checks: leakage with the engine off, then fanning down, then build-up and the governor.
    if (airBraked) {
      const air = (id: ItemWordId, scope: Scope, measure?: Draft['measure']) =>
        this.areaItem(unitIndex, 'air_brakes', 'cab', id, 'air_system', scope, undefined, measure);
      const vehicleContext = this.combination;
      air('air.leak_released', 'full', {
        quantity: 'leak_rate',
        context: { brakesApplied: false, vehicle: vehicleContext },
      });
      air('air.leak_applied', 'full', {
        quantity: 'leak_rate',
        context: { brakesApplied: true, vehicle: vehicleContext },
      });
      air('air.low_air_warning', 'full', { quantity: 'air_pressure', context: { check: 'low_air_warning' } });
      air('air.spring_brakes', 'full', { quantity: 'air_pressure', context: { check: 'spring_brake' } });
      air('air.build_up', 'full');
      air('air.governor_cut_out', 'full', { quantity: 'air_pressure', context: { check: 'governor_cut_out' } });
      air('air.governor_cut_in', 'full', { quantity: 'air_pressure', context: { check: 'governor_cut_in' } });
      this.areaItem(unitIndex, 'air_brakes', 'cab', 'air.parking_brake', 'brakes', 'post');
      this.areaItem(unitIndex, 'air_brakes', 'cab', 'air.service_brake', 'brakes', 'post');
    }

    // Left side, front to back.
    const axles = config.axles;
    const left = (area: AreaWordId, id: ItemWordId, category: ItemCategory, scope: Scope, placement?: 'left') =>
      this.areaItem(unitIndex, 'left_side', area, id, category, scope, placement);
    left('left', 'door', 'body', 'full', 'left');
    for (const lamp of SIDE_LAMPS) left('left', lamp, 'lights', 'route', 'left');
    if (axles.length > 0) this.wheelEnd(unitIndex, 0, 'left', 'left_side');
    left('left', 'fuel_tank', 'fuel', 'full', 'left');
    left('left', 'battery_box', 'body', 'full', 'left');
    left('chassis', 'drive_shaft', 'frame', 'full');
    left('chassis', 'exhaust', 'exhaust', 'full');
    left('chassis', 'frame', 'frame', 'full');
    for (let a = 1; a < axles.length; a += 1) this.wheelEnd(unitIndex, a, 'left', 'left_side');
    left('left', 'mud_flap', 'body', 'full', 'left');

    // Rear.
    const rearLamps = vehicle.kind === 'tractor' ? TRACTOR_REAR_LAMPS : TRUCK_REAR_LAMPS;
    for (const lamp of rearLamps) this.areaItem(unitIndex, 'rear', 'rear', lamp, 'lights', 'route');
    if (vehicle.kind === 'straight_truck') this.areaItem(unitIndex, 'rear', 'rear', 'cargo_doors', 'body', 'full');

    // Right side, back to front.
    const right = (id: ItemWordId, category: ItemCategory, scope: Scope) =>
      this.areaItem(unitIndex, 'right_side', 'right', id, category, scope, 'right');
    right('mud_flap', 'body', 'full');
    for (let a = axles.length - 1; a >= 1; a -= 1) this.wheelEnd(unitIndex, a, 'right', 'right_side');
    right('fuel_tank', 'fuel', 'full');
    if (axles.length > 0) this.wheelEnd(unitIndex, 0, 'right', 'right_side');
    for (const lamp of [...SIDE_LAMPS].reverse()) right(lamp, 'lights', 'route');
    right('door', 'body', 'full');
  }

  // The connection between unit towedIndex and the unit ahead of it, keyed to the towed unit.
  private coupling(towedIndex: number): void {
    const towing = this.vehicles[towedIndex - 1] as ChecklistVehicle;
    const item = (id: ItemWordId) => this.areaItem(towedIndex, 'coupling', 'coupling', id, 'coupling', 'route');
    item('coupling.air_lines');
    item('coupling.electrical');
    // A tractor, or a trailer towing through a converter dolly, couples by fifth wheel and kingpin.
    if (towing.kind === 'tractor' || towing.kind === 'trailer') {
      for (const id of FIFTH_WHEEL_ITEMS) item(id);
    }
    item('coupling.landing_gear');
  }

  private trailer(unitIndex: number): void {
    const { config } = this.vehicles[unitIndex] as ChecklistVehicle;
    const item = (
      area: AreaWordId,
      id: ItemWordId,
      category: ItemCategory,
      scope: Scope,
      placement?: 'left' | 'right' | 'rear',
    ) => this.areaItem(unitIndex, 'trailer', area, id, category, scope, placement);
    item('front', 'lights.front_clearance', 'lights', 'route');
    item('front', 'header', 'body', 'full');
    for (const lamp of SIDE_LAMPS) item('left', lamp, 'lights', 'route', 'left');
    // Conspicuity sheeting on trailers built from December 1993 (393.11(b)).
    item('left', 'lights.conspicuity', 'lights', 'route', 'left');
    item('chassis', 'frame', 'frame', 'full');
    config.axles.forEach((_axle, a) => this.wheelEnd(unitIndex, a, 'left', 'trailer'));
    item('left', 'mud_flap', 'body', 'full', 'left');
    for (const lamp of TRAILER_REAR_LAMPS) item('rear', lamp, 'lights', 'route');
    item('rear', 'lights.conspicuity', 'lights', 'route', 'rear');
    item('rear', 'cargo_doors', 'body', 'full');
    item('right', 'mud_flap', 'body', 'full', 'right');
    for (let a = config.axles.length - 1; a >= 0; a -= 1) this.wheelEnd(unitIndex, a, 'right', 'trailer');
    item('right', 'lights.conspicuity', 'lights', 'route', 'right');
    for (const lamp of [...SIDE_LAMPS].reverse()) item('right', lamp, 'lights', 'route', 'right');
  }

  // Everything at one end of one axle: tires, wheel, brake and suspension, outside in.
  private wheelEnd(unitIndex: number, axleIndex: number, side: Side, zone: ZoneKey): void {
    const axle = (this.vehicles[unitIndex] as ChecklistVehicle).config.axles[axleIndex] as AxleConfig;
    const base = `${this.unitKey(unitIndex)}.axle${axleIndex + 1}.${side}`;
    const at = (
      id: ItemWordId,
      category: ItemCategory,
      scope: Scope,
      part: PartWordId,
      dual?: Dual,
      measure?: Draft['measure'],
    ) =>
      this.add({
        key: `${base}.${dual ? `${dual}.` : ''}${id}`,
        zone,
        unitIndex,
        id,
        category,
        scope,
        wheel: { axleIndex, side, dual, part },
        measure,
      });

    const tires: readonly (Dual | undefined)[] = axle.tires === 'dual' ? ['outer', 'inner'] : [undefined];
    for (const dual of tires) {
      at('tire.inflation', 'tires', 'route', 'tire', dual, {
        quantity: 'tire_pressure',
        context: { axle: axle.position, specPsi: axle.tire.coldInflationPsi, sidewallMaxPsi: axle.tire.sidewallMaxPsi },
      });
      at('tire.condition', 'tires', 'route', 'tire', dual);
      at('tire.tread', 'tires', 'full', 'tire', dual, { quantity: 'tread_depth', context: { axle: axle.position } });
      at('rim', 'wheels', 'post', 'wheel', dual);
    }
    at('lugs', 'wheels', 'route', 'wheel');
    at('hub', 'wheels', 'route', 'wheel');
    if (axle.tires === 'dual') at('duals', 'tires', 'post', 'duals');

    if (isAirBraked(axle.brake) && axle.chamber) {
      const chamber = listedChamberCode(axle.chamber);
      at('brake.chamber', 'brakes', 'post', 'brake');
      at('brake.hoses', 'brakes', 'post', 'brake');
      at('brake.slack', 'brakes', 'post', 'brake');
      // A chamber 393.47(e) does not list is judged against its own rated stroke: a check, not a measure.
      const stroke = chamber
        ? { quantity: 'pushrod_stroke' as const, context: { axle: axle.position, brake: axle.brake, chamber } }
        : undefined;
      at('brake.stroke', 'brakes', 'full', 'brake', undefined, stroke);
      at('brake.lining', 'brakes', 'full', 'brake', undefined, {
        quantity: 'lining_thickness',
        context: { axle: axle.position, brake: axle.brake },
      });
    } else {
      at('brake.hydraulic_lines', 'brakes', 'post', 'brake');
      at('brake.lining', 'brakes', 'full', 'brake', undefined, {
        quantity: 'lining_thickness',
        context: { axle: axle.position, brake: axle.brake },
      });
    }
    for (const id of SUSPENSION_ITEMS) at(id, 'suspension', 'full', 'suspension');
  }

  private limitText(measure: NonNullable<Draft['measure']>): string | undefined {
    const { quantity, context } = measure;
    const cacheKey = `${quantity}|${context.axle}|${context.brake}|${context.chamber}|${context.specPsi}|${context.sidewallMaxPsi}|${context.wheelDiameterIn}|${context.steering}|${context.check}|${context.brakesApplied}|${context.vehicle}`;
    if (this.limitTexts.has(cacheKey)) return this.limitTexts.get(cacheKey);
    const first = applicableLimits(quantity, context)[0];
    const text = first ? formatMeasure(first.limit, canonicalUnitOf(quantity), this.locale) : undefined;
    this.limitTexts.set(cacheKey, text);
    return text;
  }

  private stopPlace(draft: Draft): StopPlace {
    const kind = stopKindOf(draft.id, {
      trailerZone: draft.zone === 'trailer',
      placement: draft.placement,
      dual: draft.wheel?.dual !== undefined,
    });
    const place: StopPlace = { kind, unitKey: this.unitKey(draft.unitIndex) };
    const side = draft.wheel?.side ?? (draft.placement === 'rear' ? undefined : draft.placement);
    if (side && 'sides' in this.words.stops.kinds[kind]) place.side = side;
    if (draft.wheel) place.axleIndex = draft.wheel.axleIndex;
    return place;
  }

  private render(draft: Draft): ChecklistItem {
    const words = this.words;
    const itemWords = words.items[draft.id];
    const unit = this.unitLabels[draft.unitIndex] as string;
    let positionLabel: string;
    let where: string;
    if (draft.wheel) {
      const part = words.parts[draft.wheel.part];
      const axle = draft.wheel.axleIndex + 1;
      const sideWord = part[draft.wheel.side];
      const dual = draft.wheel.dual ? part[draft.wheel.dual] : '';
      positionLabel = fillTemplate(draft.wheel.dual ? words.positions.axleDual : words.positions.axleSide, {
        unit,
        axle,
        side: sideWord,
        dual,
        part: part.name,
      });
      where = fillTemplate(draft.wheel.dual ? words.positions.whereDual : words.positions.whereSide, {
        axle,
        side: sideWord,
        dual,
      });
    } else {
      positionLabel = fillTemplate(words.positions.area, { unit, area: words.areas[draft.area ?? 'front'] });
      where = positionLabel;
    }
    let limit: string | undefined;
    // 393.47(e)(2): an unlisted actuator may not pass 80 % of the rated stroke marked on it.
    if (draft.id === 'brake.stroke' && !draft.measure) limit = verdictWords(this.locale).verdicts.unlistedStrokeLimit;
    if (draft.measure) limit = this.limitText(draft.measure);
    const values = { position: positionLabel, where, limit };
    const vehicle = this.vehicles[draft.unitIndex] as ChecklistVehicle;
    const place = this.stopPlace(draft);
    this.placed.set(draft.key, { id: draft.id, place });
    const item: ChecklistItem = {
      key: draft.key,
      zone: draft.zone,
      stopKey: stopKey(place),
      ...itemNames(itemWords, draft.wheel?.dual, words.stops),
      unitIndex: draft.unitIndex,
      unitKind: vehicle.kind,
      category: draft.category,
      safety: SAFETY_CATEGORIES.includes(draft.category),
      title: itemWords.title,
      positionLabel,
      prompt: fillTemplate(itemWords.prompt, values),
      shortPrompt: capitalise(fillTemplate(itemWords.short, values)),
      expects: draft.measure ? { type: 'measure', quantity: draft.measure.quantity } : { type: 'check' },
      points: itemWords.points.map((point) => fillTemplate(point, values)),
    };
    if (draft.wheel) {
      item.position = { unitIndex: draft.unitIndex, axleIndex: draft.wheel.axleIndex, side: draft.wheel.side };
      if (draft.wheel.dual) item.position.dual = draft.wheel.dual;
    }
    if (draft.measure) item.limitContext = { ...draft.measure.context };
    return item;
  }
}

function validateInput(vehicles: readonly ChecklistVehicle[], kind: InspectionKind, locale: Locale): void {
  if (!(INSPECTION_KINDS as readonly unknown[]).includes(kind)) {
    throw new ChecklistError(`Unknown inspection kind "${String(kind)}". Use one of: ${INSPECTION_KINDS.join(', ')}.`);
  }
  if (!(LOCALES as readonly unknown[]).includes(locale)) {
    throw new ChecklistError(`Unknown locale "${String(locale)}". Use one of: ${LOCALES.join(', ')}.`);
  }
  // Callers pass data from the network: check the shape, whatever the static type says.
  const given: unknown = vehicles;
  if (!Array.isArray(given) || vehicles.length === 0 || vehicles.length > MAX_UNITS) {
    throw new ChecklistError(`Give 1 to ${MAX_UNITS} vehicles: the power unit first, then its trailers.`);
  }
  vehicles.forEach((vehicle: ChecklistVehicle | undefined, index) => {
    const name = `Vehicle ${index + 1}${vehicle?.unitNumber ? ` (unit ${vehicle.unitNumber})` : ''}`;
    if (!vehicle || !(VEHICLE_KINDS as readonly unknown[]).includes(vehicle.kind)) {
      throw new ChecklistError(`${name} has no valid kind. Use one of: ${VEHICLE_KINDS.join(', ')}.`);
    }
    if (index > 0 && isPowerUnit(vehicle.kind)) {
      throw new ChecklistError(
        `${name} is a ${vehicle.kind}: only the first vehicle of a combination may be a power unit.`,
      );
    }
    const problems = validateVehicleConfig(vehicle.kind, vehicle.config);
    if (problems.length > 0) {
      throw new ChecklistError(
        `${name} has an invalid configuration: ${problems.map((p) => `${p.field}: ${p.message}`).join(' ')}`,
        problems,
      );
    }
  });
}

export function buildChecklist(vehicles: readonly ChecklistVehicle[], kind: InspectionKind, locale: Locale): Checklist {
  validateInput(vehicles, kind, locale);
  const builder = new ChecklistBuilder(vehicles, kind, locale);
  builder.build();
  const words = checklistWords(locale);
  const used = new Set(builder.items.map((item) => item.zone));
  const zones = ZONE_KEYS.filter((zone) => used.has(zone)).map((zone) => ({ key: zone, title: words.zones[zone] }));
  // Items come out in route order; sort by zone only in case a later unit adds to an earlier zone.
  const order = new Map<string, number>(ZONE_KEYS.map((zone, index) => [zone, index]));
  const items = builder.items
    .map((item, index) => ({ item, index }))
    .sort((a, b) => (order.get(a.item.zone) ?? 0) - (order.get(b.item.zone) ?? 0) || a.index - b.index)
    .map(({ item }) => item);
  const placed = items.map((item) => ({
    item,
    ...(builder.placed.get(item.key) as { id: ItemWordId; place: StopPlace }),
  }));
  const stops = renderStops(placed, words, builder.unitLabels);
  return { kind, locale, zones, stops, items };
}
