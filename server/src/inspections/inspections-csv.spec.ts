import type { InspectionListItem } from '@yardcall/shared';
import { csvHeader, csvRows, safeCell } from './inspections-csv';

const item: InspectionListItem = {
  id: '0b6f3c1e-4a5d-4f7e-9c2b-8d1e2f3a4b5c',
  kind: 'pre_trip',
  status: 'submitted',
  startedAt: '2026-11-30T06:00:00.000Z',
  submittedAt: '2026-11-30T06:20:00.000Z',
  driver: { id: 'd', name: 'Reyes, "Tommy" Ñúñez' },
  vehicles: [
    { id: 'a', unitNumber: 'KV-214', kind: 'tractor' },
    { id: 'b', unitNumber: 'KV-T9', kind: 'trailer' },
  ],
  defectCount: 2,
  rushed: true,
  recurringDefect: false,
  durationSeconds: 1230,
};

describe('inspections CSV', () => {
  it('names the columns of the supervisor table', () => {
    expect(csvHeader()).toBe(
      'date,units,driver,kind,status,duration_minutes,defects,rushed,recurring,inspection_id\r\n',
    );
  });

  it('quotes commas and doubles quotes (RFC 4180)', () => {
    expect(csvRows([item])).toBe(
      '2026-11-30T06:00:00.000Z,KV-214 + KV-T9,"Reyes, ""Tommy"" Ñúñez",pre_trip,submitted,20.5,2,yes,no,0b6f3c1e-4a5d-4f7e-9c2b-8d1e2f3a4b5c\r\n',
    );
  });

  it('keeps a cell that looks like a formula as text', () => {
    expect(safeCell('=HYPERLINK("x")')).toBe('\'=HYPERLINK("x")');
    expect(safeCell('-12')).toBe("'-12");
    expect(safeCell('KV-214')).toBe('KV-214');
  });

  it('leaves the duration empty while unknown', () => {
    expect(csvRows([{ ...item, durationSeconds: null }])).toContain(',submitted,,2,');
  });
});
