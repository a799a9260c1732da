// The HTTP contract of walk-arounds, their results, voice notes, defects and signatures.
import type {
  Answer,
  Checklist,
  InspectionKind,
  ItemResult,
  Locale,
  MeasurementValue,
  NoReadingReason,
  ReadingRule,
  SpotFix,
  Verdict,
} from '../checklist/index.js';
import type { ReviewFlags, ZoneVisit } from '../review/index.js';
import type { CertificationAction, InspectionSummary } from '../summary/index.js';
import type { VehicleKind } from '../vehicle/index.js';

export const INSPECTION_STATUSES = ['in_progress', 'submitted'] as const;
export type InspectionStatus = (typeof INSPECTION_STATUSES)[number];

export const DEFECT_STATUSES = ['open', 'repaired', 'no_repair_needed', 'deferred'] as const;
export type DefectStatus = (typeof DEFECT_STATUSES)[number];

export const SIGNATURE_ROLES = ['driver', 'mechanic', 'next_driver'] as const;
export type SignatureRole = (typeof SIGNATURE_ROLES)[number];

// Voice notes: the browser records Opus in WebM or Ogg, or AAC/Opus in MP4.
export const NOTE_AUDIO_TYPES = ['audio/webm', 'audio/ogg', 'audio/mp4', 'audio/mpeg', 'audio/wav'] as const;
export const NOTE_MAX_BYTES = 10 * 1024 * 1024;
export const PHOTO_TYPES = ['image/jpeg', 'image/png', 'image/webp'] as const;
export const PHOTO_MAX_BYTES = 8 * 1024 * 1024;

export interface CreateInspectionRequest {
  // Power unit first, then trailer(s).
  vehicleIds: string[];
  kind: InspectionKind;
  startedAt: string;
  location?: string;
  locale?: Locale;
  // Made by the client, so a retried create returns the same inspection.
  clientId: string;
}

export interface InspectionVehicle {
  id: string;
  unitNumber: string;
  kind: VehicleKind;
}

export interface PersonRef {
  id: string;
  name: string;
}

// The client's `verdict` is informative only: the server re-evaluates.
export interface ResultUpsert extends ItemResult {
  clientId: string;
}

export interface PutResultsRequest {
  results: ResultUpsert[];
}

export interface ResultLimit {
  value: number;
  unit: string;
  source: string;
}

export interface ItemResultResponse {
  id: string;
  clientId: string;
  itemKey: string;
  answer: Answer;
  // Canonical unit, as the server evaluated it.
  measurement: MeasurementValue | null;
  verdict: Verdict | null;
  limit: ResultLimit | null;
  // A measured check passed without a value: the server's word, from the inspection's required readings.
  noReading: NoReadingReason | null;
  // A defect corrected on the spot; its new reading in the canonical unit with the server's verdict.
  fixed: SpotFix | null;
  detail: string | null;
  heard: string | null;
  confidence: number | null;
  answeredAt: string;
}

export interface PutResultsResponse {
  results: ItemResultResponse[];
}

// The text fields sent with a photo or a voice note as multipart/form-data, beside the file.
export interface PhotoUpload {
  itemKey: string;
  clientId: string;
}

export interface VoiceNoteUpload extends PhotoUpload {
  durationMs: number;
  heard?: string;
}

export interface VoiceNoteResponse {
  id: string;
  clientId: string;
  itemKey: string;
  heard: string | null;
  durationMs: number;
  mimeType: string;
  sizeBytes: number;
  sha256: string;
  createdAt: string;
  // Streams the audio with Range support.
  audioUrl: string;
}

export interface PhotoResponse {
  id: string;
  clientId: string;
  itemKey: string;
  mimeType: string;
  sizeBytes: number;
  createdAt: string;
  url: string;
}

export interface SignatureInput {
  // The typed name.
  name: string;
  // The drawn signature as an SVG path or a PNG data URL.
  drawing?: string;
}

export interface SignatureResponse {
  id: string;
  role: SignatureRole;
  signer: PersonRef;
  name: string;
  // What the signer certified, in words.
  statement: string;
  signedAt: string;
  hasDrawing: boolean;
}

export interface RepairResponse {
  action: CertificationAction;
  note: string;
  deferredUntil: string | null;
  mechanic: PersonRef;
  signedAt: string;
}

export interface DefectResponse {
  id: string;
  inspectionId: string;
  vehicle: InspectionVehicle;
  itemKey: string;
  title: string;
  positionLabel: string;
  safety: boolean;
  detail: string | null;
  measurement: MeasurementValue | null;
  limit: ResultLimit | null;
  status: DefectStatus;
  createdAt: string;
  repair: RepairResponse | null;
}

export interface InspectionListItem {
  id: string;
  kind: InspectionKind;
  status: InspectionStatus;
  startedAt: string;
  submittedAt: string | null;
  driver: PersonRef;
  vehicles: InspectionVehicle[];
  defectCount: number;
  rushed: boolean;
  // A defect of this report was reported on the same vehicle and item before (see ../review).
  recurringDefect: boolean;
  // From the start to the last answer; null while nothing is answered or in progress.
  durationSeconds: number | null;
}

export interface InspectionPage {
  items: InspectionListItem[];
  // Pass as `cursor` for the next page; null on the last.
  nextCursor: string | null;
}

export interface InspectionResponse extends InspectionListItem {
  clientId: string;
  locale: Locale;
  location: string | null;
  odometer: number | null;
  checklist: Checklist;
  // The organisation's required readings when the walk-around began: a later change rewrites no history.
  requiredReadings: ReadingRule[];
  results: ItemResultResponse[];
  notes: VoiceNoteResponse[];
  photos: PhotoResponse[];
  defects: DefectResponse[];
  signatures: SignatureResponse[];
  summary: InspectionSummary;
  // The route as zones in the order walked.
  timeline: ZoneVisit[];
  flags: ReviewFlags;
}

export interface SubmitInspectionRequest {
  signature: SignatureInput;
  odometer?: number;
  // When the driver signed on the phone (ISO 8601); a report signed with no signal arrives later.
  // The server keeps it on the driver's signature and its own clock's arrival time as submittedAt.
  signedAt?: string;
}

export interface AcknowledgeRequest {
  signature: SignatureInput;
}

export interface RepairRequest {
  action: CertificationAction;
  note: string;
  // Required when deferring.
  deferredUntil?: string;
  signature: SignatureInput;
}

// What a driver must review before the next pre-trip of a vehicle (396.13).
export interface PendingAcknowledgement {
  inspectionId: string;
  vehicle: InspectionVehicle;
  submittedAt: string;
  driver: PersonRef;
  defects: DefectResponse[];
}
