import { CreateFoundation1764633600000 } from './1764633600000-CreateFoundation';
import { CreateInspections1764700000000 } from './1764700000000-CreateInspections';
import { CreateNotesAndPhotos1764800000000 } from './1764800000000-CreateNotesAndPhotos';
import { FleetReviewRetention1764900000000 } from './1764900000000-FleetReviewRetention';
import { CreateTraining1764950000000 } from './1764950000000-CreateTraining';
import { ReadingsAndSpotFixes1765200000000 } from './1765200000000-ReadingsAndSpotFixes';
import { HoldsTimesAndZones1765300000000 } from './1765300000000-HoldsTimesAndZones';

// Every migration in order, passed as classes; add new ones at the end.
export const MIGRATIONS = [
  CreateFoundation1764633600000,
  CreateInspections1764700000000,
  CreateNotesAndPhotos1764800000000,
  FleetReviewRetention1764900000000,
  CreateTraining1764950000000,
  ReadingsAndSpotFixes1765200000000,
  HoldsTimesAndZones1765300000000,
];
