// A small hand-built tractor walk-around (invented fleet), independent of the checklist generator's words.
import type { Checklist, ChecklistItem, Locale, WheelPosition } from '../checklist/index.js';
import { stopPerItem } from '../testing.js';

interface Draft {
  key: string;
  zone: string;
  title: { en: string; es: string };
  label: { en: string; es: string };
  category: ChecklistItem['category'];
  points?: { en: string[]; es: string[] };
  position?: WheelPosition;
  axle?: 'steer' | 'drive';
}

const steer = (side: 'left' | 'right'): WheelPosition => ({ unitIndex: 0, axleIndex: 0, side });
const drive = (side: 'left' | 'right', dual: 'inner' | 'outer'): WheelPosition => ({
  unitIndex: 0,
  axleIndex: 1,
  side,
  dual,
});

function wheelEnd(zone: string, side: 'left' | 'right'): Draft[] {
  const es = side === 'left' ? 'izquierda' : 'derecha';
  const drafts: Draft[] = [
    {
      key: `axle1.${side}.tire.condition`,
      zone,
      title: { en: 'Tire condition', es: 'Estado de la llanta' },
      label: { en: `Tractor, axle 1, ${side} tire`, es: `Tractor, eje 1, llanta ${es}` },
      category: 'tires',
      points: {
        en: ['no cuts or bulges', 'valve stem and cap in place'],
        es: ['sin cortes ni chichones', 'válvula y tapón en su lugar'],
      },
      position: steer(side),
      axle: 'steer',
    },
    {
      key: `axle1.${side}.tire.tread`,
      zone,
      title: { en: 'Tread depth', es: 'Profundidad del dibujo' },
      label: { en: `Tractor, axle 1, ${side} tire`, es: `Tractor, eje 1, llanta ${es}` },
      category: 'tires',
      points: { en: ['tread depth at least 4/32 in'], es: ['dibujo de al menos 4/32 de pulgada'] },
      position: steer(side),
      axle: 'steer',
    },
    {
      key: `axle1.${side}.lugs`,
      zone,
      title: { en: 'Lug nuts', es: 'Tuercas de la rueda' },
      label: { en: `Tractor, axle 1, ${side} wheel`, es: `Tractor, eje 1, rueda ${es}` },
      category: 'wheels',
      points: { en: ['none missing', 'no rust trails'], es: ['no falta ninguna', 'sin rastros de óxido'] },
      position: steer(side),
      axle: 'steer',
    },
    {
      key: `axle1.${side}.brake.chamber`,
      zone,
      title: { en: 'Brake chamber', es: 'Cámara de freno' },
      label: { en: `Tractor, axle 1, ${side} brake`, es: `Tractor, eje 1, freno ${es}` },
      category: 'brakes',
      points: { en: ['not cracked or leaking'], es: ['sin grietas ni fugas'] },
      position: steer(side),
      axle: 'steer',
    },
    {
      key: `axle1.${side}.brake.slack`,
      zone,
      title: { en: 'Slack adjuster and push rod', es: 'Ajustador de holgura y vástago' },
      label: { en: `Tractor, axle 1, ${side} brake`, es: `Tractor, eje 1, freno ${es}` },
      category: 'brakes',
      points: { en: ['not broken or loose'], es: ['no está roto ni flojo'] },
      position: steer(side),
      axle: 'steer',
    },
  ];
  for (const dual of ['outer', 'inner'] as const) {
    const esDual = dual === 'outer' ? 'exterior' : 'interior';
    drafts.push({
      key: `axle2.${side}.${dual}.tire.condition`,
      zone,
      title: { en: 'Tire condition', es: 'Estado de la llanta' },
      label: { en: `Tractor, axle 2, ${side} ${dual} tire`, es: `Tractor, eje 2, llanta ${esDual} ${es}` },
      category: 'tires',
      position: drive(side, dual),
      axle: 'drive',
    });
  }
  drafts.push({
    key: `axle2.${side}.air_bags`,
    zone,
    title: { en: 'Air bags', es: 'Bolsas de aire' },
    label: { en: `Tractor, axle 2, ${side} suspension`, es: `Tractor, eje 2, suspensión ${es}` },
    category: 'suspension',
    position: { unitIndex: 0, axleIndex: 1, side },
    axle: 'drive',
  });
  drafts.push({
    key: `${side}.mud_flap`,
    zone,
    title: { en: 'Mud flap', es: 'Lodera' },
    label: { en: `Tractor, ${side} side`, es: `Tractor, lado ${side === 'left' ? 'izquierdo' : 'derecho'}` },
    category: 'body',
  });
  return drafts;
}

const DRAFTS: Draft[] = [
  {
    key: 'front.headlamps',
    zone: 'front',
    title: { en: 'Headlamps', es: 'Faros' },
    label: { en: 'Tractor, front', es: 'Tractor, frente' },
    category: 'lights',
    points: { en: ['high and low beams work'], es: ['luz alta y baja funcionan'] },
  },
  {
    key: 'front.steering_box',
    zone: 'front',
    title: { en: 'Steering box', es: 'Caja de dirección' },
    label: { en: 'Tractor, engine compartment', es: 'Tractor, compartimiento del motor' },
    category: 'steering',
    points: { en: ['not leaking'], es: ['sin fugas'] },
  },
  ...wheelEnd('left_side', 'left'),
  {
    key: 'rear.tail',
    zone: 'rear',
    title: { en: 'Tail lamps', es: 'Luces traseras' },
    label: { en: 'Tractor, rear', es: 'Tractor, parte trasera' },
    category: 'lights',
  },
  ...wheelEnd('right_side', 'right'),
];

const ZONES = [
  { key: 'front', en: 'Front', es: 'Frente' },
  { key: 'left_side', en: 'Left side', es: 'Lado izquierdo' },
  { key: 'rear', en: 'Rear', es: 'Parte trasera' },
  { key: 'right_side', en: 'Right side', es: 'Lado derecho' },
];

export function handBuiltChecklist(locale: Locale): Checklist {
  const items = DRAFTS.map((draft) => {
    const item: ChecklistItem = {
      key: `u1.${draft.key}`,
      zone: draft.zone,
      // One stop per item: narration scoring walks items, not stops.
      stopKey: `u1.${draft.key}`,
      name: draft.title[locale],
      names: [draft.title[locale].toLocaleLowerCase()],
      unitIndex: 0,
      unitKind: 'tractor',
      category: draft.category,
      safety: ['brakes', 'tires', 'wheels', 'steering'].includes(draft.category),
      title: draft.title[locale],
      positionLabel: draft.label[locale],
      prompt: draft.title[locale],
      shortPrompt: draft.title[locale],
      expects: { type: 'check' },
      points: draft.points?.[locale] ?? [],
    };
    if (draft.position) item.position = draft.position;
    if (draft.axle) item.limitContext = { axle: draft.axle };
    return item;
  });
  return {
    kind: 'practice',
    locale,
    zones: ZONES.map((zone) => ({ key: zone.key, title: zone[locale] })),
    stops: stopPerItem(items),
    items,
  };
}

// Segments four seconds apart, three seconds long each.
export function spoken(...lines: string[]): { text: string; startMs: number; endMs: number }[] {
  return lines.map((text, index) => ({ text, startMs: index * 4000, endMs: index * 4000 + 3000 }));
}
