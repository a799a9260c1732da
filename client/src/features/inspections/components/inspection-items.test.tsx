import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type {
  ChecklistItem,
  InspectionResponse,
  InspectionSummary,
  ItemResultResponse,
  PassedWithoutReading,
  SpotFixedDefect,
} from '@yardcall/shared';
import { renderWithProviders } from '@/testing/render';
import { FixedOnTheSpot } from './fixed-on-the-spot';
import { InspectionItems } from './inspection-items';

function item(key: string, stopKey: string, title: string, measured: boolean): ChecklistItem {
  return {
    key,
    zone: 'left_side',
    stopKey,
    name: title.toLowerCase(),
    names: [title.toLowerCase()],
    unitIndex: 0,
    unitKind: 'tractor',
    category: 'tires',
    safety: true,
    title,
    positionLabel: 'Tractor, axle 1, left tire',
    prompt: title,
    shortPrompt: title,
    expects: measured ? { type: 'measure', quantity: 'tire_pressure' } : { type: 'check' },
    points: [],
  };
}

function result(itemKey: string, extra: Partial<ItemResultResponse> = {}): ItemResultResponse {
  return {
    id: `r-${itemKey}`,
    clientId: `c-${itemKey}`,
    itemKey,
    answer: 'pass',
    measurement: null,
    verdict: null,
    limit: null,
    noReading: null,
    fixed: null,
    detail: null,
    heard: null,
    confidence: null,
    answeredAt: '2026-11-03T06:10:00.000Z',
    ...extra,
  };
}

const ITEMS = [
  item('u0.axle0.left.tire.pressure', 'u0.axle0.left.wheel', 'Tire inflation', true),
  item('u0.axle0.left.tire.tread', 'u0.axle0.left.wheel', 'Tread depth', true),
  item('u0.axle0.left.hub', 'u0.axle0.left.wheel', 'Hub', false),
  item('u0.axle0.left.brake.chamber', 'u0.axle0.left.brake', 'Brake chamber', false),
];

type SummaryLists = Pick<InspectionSummary, 'fixedOnTheSpot' | 'checkedWithoutReading' | 'noGauge'>;
const NOTHING: SummaryLists = { fixedOnTheSpot: [], checkedWithoutReading: [], noGauge: [] };

// Only the fields the answers read.
function inspection(results: ItemResultResponse[], summary: Partial<SummaryLists> = {}): InspectionResponse {
  return {
    summary: { ...NOTHING, ...summary },
    checklist: {
      kind: 'pre_trip',
      locale: 'en',
      zones: [{ key: 'left_side', title: 'Left side' }],
      stops: [
        {
          key: 'u0.axle0.left.wheel',
          zone: 'left_side',
          unitIndex: 0,
          label: 'Tractor, axle 1, left wheel',
          prompt: '',
          shortPrompt: '',
          itemKeys: ITEMS.slice(0, 3).map((i) => i.key),
        },
        {
          key: 'u0.axle0.left.brake',
          zone: 'left_side',
          unitIndex: 0,
          label: 'Tractor, axle 1, left brake',
          prompt: '',
          shortPrompt: '',
          itemKeys: [ITEMS[3]!.key],
        },
      ],
      items: ITEMS,
    },
    results,
    notes: [],
    defects: [],
  } as unknown as InspectionResponse;
}

const FIXED_TIRE = result('u0.axle0.left.tire.pressure', {
  answer: 'defect',
  measurement: { quantity: 'tire_pressure', value: 88, unit: 'psi' },
  verdict: 'out_of_limit',
  detail: 'low',
  fixed: {
    action: 'added air at the yard line',
    measurement: { quantity: 'tire_pressure', value: 101, unit: 'psi' },
    verdict: 'ok',
    at: '2026-11-03T06:12:00.000Z',
  },
});

// What the shared summary makes of FIXED_TIRE.
const FIXED_SUMMARY: SpotFixedDefect = {
  itemKey: FIXED_TIRE.itemKey,
  zone: 'left_side',
  title: 'Tire inflation',
  positionLabel: 'Tractor, axle 1, left tire',
  category: 'tires',
  safety: true,
  reasons: ['reported', 'out_of_limit'],
  detail: 'low',
  measurement: { quantity: 'tire_pressure', value: 88, unit: 'psi' },
  verdict: 'out_of_limit',
  answeredAt: FIXED_TIRE.answeredAt,
  action: 'added air at the yard line',
  newMeasurement: { quantity: 'tire_pressure', value: 101, unit: 'psi' },
  newVerdict: 'ok',
  fixedAt: '2026-11-03T06:12:00.000Z',
};

function passed(itemKey: string, reason: PassedWithoutReading['reason']): PassedWithoutReading {
  return { itemKey, zone: 'left_side', title: '', positionLabel: '', safety: true, reason };
}

describe('InspectionItems', () => {
  it('groups the answers by stop, the stop label as a sub-heading under its zone', () => {
    renderWithProviders(<InspectionItems inspection={inspection([])} onPlayNote={() => undefined} />);
    const stops = screen.getAllByTestId('item-stop');
    expect(stops.map((s) => within(s).getByRole('heading', { level: 4 }).textContent)).toEqual([
      'Tractor, axle 1, left wheel',
      'Tractor, axle 1, left brake',
    ]);
    expect(
      within(stops[0]!)
        .getAllByTestId('inspection-item')
        .map((row) => row.dataset.itemKey),
    ).toEqual(ITEMS.slice(0, 3).map((i) => i.key));
    expect(within(stops[1]!).getAllByTestId('inspection-item')).toHaveLength(1);
    expect(screen.getByRole('heading', { level: 3, name: 'Left side' })).toBeInTheDocument();
  });

  it('says which measured checks were passed without a reading and which had no gauge though required', () => {
    renderWithProviders(
      <InspectionItems
        inspection={inspection(
          [
            result('u0.axle0.left.tire.pressure', { noReading: 'no_gauge' }),
            result('u0.axle0.left.tire.tread', { noReading: 'visual' }),
            result('u0.axle0.left.hub'),
          ],
          {
            noGauge: [passed('u0.axle0.left.tire.pressure', 'no_gauge')],
            checkedWithoutReading: [passed('u0.axle0.left.tire.tread', 'visual')],
          },
        )}
        onPlayNote={() => undefined}
      />,
    );
    expect(within(rowOf('u0.axle0.left.tire.pressure')).getByTestId('item-no-reading')).toHaveTextContent(
      'No gauge (reading required)',
    );
    expect(within(rowOf('u0.axle0.left.tire.tread')).getByTestId('item-no-reading')).toHaveTextContent(
      'Checked without a reading',
    );
    expect(within(rowOf('u0.axle0.left.hub')).queryByTestId('item-no-reading')).toBeNull();
    expect(screen.getByTestId('without-reading-count')).toHaveTextContent(
      'Measured checks passed without a reading: 1 checked without a reading, 1 with no gauge (reading required).',
    );
  });

  it('shows a defect fixed on the spot as fixed, with what was done and the new reading, not as needing attention', () => {
    renderWithProviders(
      <InspectionItems
        inspection={inspection([FIXED_TIRE], { fixedOnTheSpot: [FIXED_SUMMARY] })}
        onPlayNote={() => undefined}
      />,
    );
    const tire = rowOf('u0.axle0.left.tire.pressure');
    expect(tire).toHaveAttribute('data-trouble', 'false');
    expect(tire).toHaveTextContent('Fixed on the spot');
    expect(within(tire).getByTestId('item-fixed')).toHaveTextContent('What was done: added air at the yard line');
    expect(within(tire).getByTestId('item-fixed')).toHaveTextContent('New reading: 101 psi (Within limit)');
    expect(screen.getByText('No item has a defect or an out-of-limit value.')).toBeInTheDocument();
    expect(screen.queryByTestId('without-reading-count')).toBeNull();
  });

  it('keeps a defect needing attention when the summary does not count its fix', () => {
    renderWithProviders(<InspectionItems inspection={inspection([FIXED_TIRE])} onPlayNote={() => undefined} />);
    expect(rowOf('u0.axle0.left.tire.pressure')).toHaveAttribute('data-trouble', 'true');
    expect(screen.getByText(/1 item needs attention/)).toBeInTheDocument();
  });
});

describe('FixedOnTheSpot', () => {
  it('lists each fix apart from the defects: item, what was found, what was done and the new reading', () => {
    renderWithProviders(
      <FixedOnTheSpot
        inspection={inspection([FIXED_TIRE, result('u0.axle0.left.hub')], { fixedOnTheSpot: [FIXED_SUMMARY] })}
      />,
    );
    const fixes = screen.getAllByTestId('fix');
    expect(fixes).toHaveLength(1);
    expect(fixes[0]).toHaveTextContent('Tire inflation · Tractor, axle 1, left tire');
    expect(fixes[0]).toHaveTextContent('Reading found: 88 psi');
    expect(fixes[0]).toHaveTextContent('What was done: added air at the yard line');
    expect(fixes[0]).toHaveTextContent('New reading: 101 psi (Within limit)');
    expect(screen.getByText(/opened no shop defect/)).toBeInTheDocument();
  });

  it('says so when nothing was fixed on the spot', () => {
    renderWithProviders(<FixedOnTheSpot inspection={inspection([result('u0.axle0.left.hub')])} />);
    expect(screen.getByTestId('no-fixes')).toHaveTextContent('Nothing was fixed on the spot.');
  });
});

function rowOf(key: string): HTMLElement {
  const row = screen.getAllByTestId('inspection-item').find((el) => el.dataset.itemKey === key);
  if (!row) throw new Error(`No row for ${key}`);
  return row;
}
