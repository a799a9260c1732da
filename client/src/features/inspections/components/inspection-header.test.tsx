import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { InspectionResponse, ReviewFlags } from '@yardcall/shared';
import { renderWithProviders } from '@/testing/render';
import { InspectionFlags } from './inspection-header';

// Only the fields the flags read.
function withFlags(flags: ReviewFlags): InspectionResponse {
  return { flags } as InspectionResponse;
}

describe('InspectionFlags', () => {
  it('says why a walk-around was rushed, with the figures and the expected minimums', () => {
    renderWithProviders(
      <InspectionFlags
        inspection={withFlags({
          rushed: {
            reasons: ['median_gap', 'total_duration'],
            answeredCount: 88,
            answeredStopCount: 21,
            secondsPerStop: 3.2,
            medianGapSeconds: 2.9,
            minimumSecondsPerStop: 7.5,
            minimumMedianGapSeconds: 5,
          },
          recurring: [],
        })}
      />,
    );
    const flag = screen.getByTestId('flag-rushed-detail');
    expect(flag).toHaveTextContent('Rushed walk-around');
    expect(flag).toHaveTextContent('Typical time between answers: 2.9 s; at least 5 s is expected.');
    expect(flag).toHaveTextContent(
      '3.2 s per stop over 21 answered stops (88 items); at least 7.5 s per stop is expected.',
    );
  });

  it('links a recurring defect to the earlier inspection that reported it', () => {
    renderWithProviders(
      <InspectionFlags
        inspection={withFlags({
          rushed: null,
          recurring: [
            {
              vehicleId: 'veh-1',
              itemKey: 'u0.axle0.left.tire.condition',
              title: 'Tire condition',
              positionLabel: 'Tractor, axle 1, left tire',
              earlierCount: 2,
              earlier: {
                inspectionId: 'insp-earlier',
                defectId: 'def-1',
                vehicleId: 'veh-1',
                itemKey: 'u0.axle0.left.tire.condition',
                reportedAt: '2026-11-20T07:00:00.000Z',
                state: 'repaired',
                certifiedAt: '2026-11-21T09:00:00.000Z',
              },
            },
          ],
        })}
      />,
    );
    expect(screen.getByTestId('flag-recurring-detail')).toHaveTextContent(
      'Recurring defect: Tire condition, Tractor, axle 1, left tire',
    );
    expect(screen.getByTestId('flag-recurring-detail')).toHaveTextContent('Reported 2 times before.');
    expect(screen.getByTestId('recurring-earlier-link')).toHaveAttribute(
      'href',
      '/supervisor/inspections/insp-earlier',
    );
    expect(screen.getByTestId('flag-recurring-detail')).toHaveTextContent('(repaired since)');
  });

  it('says plainly when nothing was flagged', () => {
    renderWithProviders(<InspectionFlags inspection={withFlags({ rushed: null, recurring: [] })} />);
    expect(screen.getByTestId('no-flags')).toHaveTextContent('Nothing flagged: not rushed, no recurring defect.');
  });
});
