import { Defect } from '../defects/entities/defect.entity';
import { Repair } from '../defects/entities/repair.entity';
import { InspectionVehicle } from '../inspections/entities/inspection-vehicle.entity';
import { Inspection } from '../inspections/entities/inspection.entity';
import { ItemResult } from '../inspections/entities/item-result.entity';
import { Signature } from '../inspections/entities/signature.entity';
import { Photo } from '../notes/entities/photo.entity';
import { VoiceNote } from '../notes/entities/voice-note.entity';
import { Organization } from '../organizations/entities/organization.entity';
import { TrainingAttempt } from '../training/entities/training-attempt.entity';
import { TrainingReview } from '../training/entities/training-review.entity';
import { Invitation } from '../users/entities/invitation.entity';
import { User } from '../users/entities/user.entity';
import { Vehicle } from '../vehicles/entities/vehicle.entity';

// Every entity, passed as classes (globs fail under Jest and after bundling).
export const ENTITIES = [
  Organization,
  User,
  Invitation,
  Vehicle,
  Inspection,
  InspectionVehicle,
  ItemResult,
  Defect,
  Repair,
  Signature,
  VoiceNote,
  Photo,
  TrainingAttempt,
  TrainingReview,
];
