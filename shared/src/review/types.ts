import type { CertificationAction, RushedReason } from '../summary/index.js';

// One stretch of the walk-around spent in one zone, in the order walked. Going back to a zone
// starts a new visit, so the list is the route as the driver walked it.
export interface ZoneVisit {
  zone: string;
  title: string;
  firstAnsweredAt: string;
  lastAnsweredAt: string;
  // Time credited to this visit: each answer counts the time since the answer before it (or since the
  // start for the first answer), so the visits add up to the whole walk-around.
  seconds: number;
  answerCount: number;
}

// Why a walk-around was flagged as rushed (the rule itself lives in ../summary: RUSHED_RULE).
// Pace is judged per stop: one answer covers a stop's items.
export interface RushedFlag {
  reasons: RushedReason[];
  // Items answered, and the stops they belong to.
  answeredCount: number;
  answeredStopCount: number;
  secondsPerStop: number | null;
  medianGapSeconds: number | null;
  minimumSecondsPerStop: number;
  minimumMedianGapSeconds: number;
}

export type EarlierDefectState = 'open' | CertificationAction;

// A defect reported before on the same vehicle and the same item (the unit's position in the
// combination aside).
export interface EarlierDefect {
  inspectionId: string;
  defectId: string;
  vehicleId: string;
  // Item key as that inspection had it (its unit index may differ).
  itemKey: string;
  reportedAt: string;
  state: EarlierDefectState;
  // When a mechanic last certified it; null while open.
  certifiedAt: string | null;
}

export interface CurrentDefect {
  vehicleId: string;
  itemKey: string;
  title: string;
  positionLabel: string;
}

export interface RecurringDefect extends CurrentDefect {
  // The latest earlier report of the same item on the same vehicle.
  earlier: EarlierDefect;
  // How many earlier reports within the window (or still open).
  earlierCount: number;
}

export interface ReviewFlags {
  // Null when the walk-around was not rushed.
  rushed: RushedFlag | null;
  recurring: RecurringDefect[];
}
