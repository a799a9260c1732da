// The HTTP contract of the fleet board, the supervisor's inspection list, its CSV export and the
// organisation's record retention.
import type { InspectionKind } from '../checklist/index.js';
import type { VehicleKind, VehicleStatus } from '../vehicle/index.js';
import type { InspectionStatus, PersonRef } from './inspections.js';

// GET /api/fleet/board (supervisor, admin, mechanic): every vehicle of the organisation.
export interface FleetBoardDefect {
  defectId: string;
  title: string;
  positionLabel: string;
  inspectionId: string;
  reportedAt: string;
}

export interface FleetBoardInspection {
  id: string;
  kind: InspectionKind;
  submittedAt: string;
  driver: PersonRef;
}

export interface FleetBoardVehicle {
  id: string;
  unitNumber: string;
  kind: VehicleKind;
  status: VehicleStatus;
  // When the vehicle went out of service; null while it is in service.
  outOfServiceSince: string | null;
  // Why, in words: a hold put by hand (the supervisor's or admin's reason), then the open safety defects.
  statusReason: string | null;
  // Why it is out of service: its open safety defects, oldest first (empty when in service).
  openSafetyDefects: FleetBoardDefect[];
  // The last submitted inspection that covered it, or null.
  lastInspection: FleetBoardInspection | null;
  // Today in the organisation's time zone (see dayOfUse in review): its first pre-trip, and a post-trip
  // or en-route inspection with no pre-trip before it.
  today: {
    preTrip: FleetBoardInspection | null;
    usedWithoutPreTrip: FleetBoardInspection | null;
  };
}

export interface FleetBoard {
  // Out of service first, then by unit number.
  vehicles: FleetBoardVehicle[];
  inServiceCount: number;
  outOfServiceCount: number;
  generatedAt: string;
  // The day the board's "today" means (YYYY-MM-DD) and the organisation's IANA time zone it is read in.
  day: string;
  timeZone: string;
}

// GET /api/inspections and GET /api/inspections/export.csv take the same filters.
export const INSPECTION_SORT_FIELDS = ['startedAt', 'submittedAt'] as const;
export type InspectionSortField = (typeof INSPECTION_SORT_FIELDS)[number];
export const SORT_DIRECTIONS = ['asc', 'desc'] as const;
export type SortDirection = (typeof SORT_DIRECTIONS)[number];

export interface InspectionListFilters {
  // A unit the inspection covered (power unit or trailer).
  vehicleId?: string;
  driverId?: string;
  kind?: InspectionKind;
  status?: InspectionStatus;
  // ISO date or date-time: started at or after `from`, before `to` (a bare date `to` includes that day).
  from?: string;
  to?: string;
  hasDefects?: boolean;
  rushed?: boolean;
  // Default startedAt, desc (newest first). Sorting by submittedAt leaves out inspections in progress.
  sort?: InspectionSortField;
  order?: SortDirection;
}

export interface InspectionListQuery extends InspectionListFilters {
  cursor?: string;
  // 1 to 100, default 25.
  limit?: number;
}

// The CSV's columns, in order; the same as the supervisor's table.
export const INSPECTION_CSV_COLUMNS = [
  'date',
  'units',
  'driver',
  'kind',
  'status',
  'duration_minutes',
  'defects',
  'rushed',
  'recurring',
  'inspection_id',
] as const;
export type InspectionCsvColumn = (typeof INSPECTION_CSV_COLUMNS)[number];
// The export stops at this many rows; narrow the filters for more.
export const INSPECTION_CSV_MAX_ROWS = 50_000;

// Organisation record retention (admin).
export interface RetentionSettings {
  months: number;
  // Never below this: 49 CFR 396.11(a)(4) keeps reports, repair certifications and the next
  // driver's review three months from the date the report was prepared.
  minimumMonths: number;
  // Submitted inspections older than this may be removed now.
  cutoff: string;
}

export interface UpdateRetentionRequest {
  months: number;
}

export interface RetentionPurgeResult {
  cutoff: string;
  removed: {
    inspections: number;
    itemResults: number;
    voiceNotes: number;
    photos: number;
    defects: number;
    repairs: number;
    signatures: number;
    storedObjects: number;
  };
  // Old inspections kept because a defect of theirs is still open (live work).
  keptWithOpenDefects: number;
}
