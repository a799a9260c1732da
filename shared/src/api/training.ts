// The HTTP contract of practice walk-arounds narrated by students and their trainers' reviews.
import type { Checklist, Locale } from '../checklist/index.js';
import type { CoverageCounts, NarrationScore, NarrationSegment, NarrationStatus } from '../narration/index.js';
import type { InspectionVehicle, PersonRef } from './inspections.js';

// Only practice walk-arounds are narrated; the kind is kept so a later kind needs no new shape.
export const TRAINING_ATTEMPT_KINDS = ['practice'] as const;
export type TrainingAttemptKind = (typeof TRAINING_ATTEMPT_KINDS)[number];

// recording: the student is narrating and sending segments; finished: scored by the server.
export const TRAINING_ATTEMPT_STATUSES = ['recording', 'finished'] as const;
export type TrainingAttemptStatus = (typeof TRAINING_ATTEMPT_STATUSES)[number];

// The trainer's overall judgement of one attempt.
export const TRAINING_GRADES = ['pass', 'needs_practice', 'fail'] as const;
export type TrainingGrade = (typeof TRAINING_GRADES)[number];

// A trainer marks each item as the scorer does: named, partly named or missed.
export const TRAINING_ITEM_MARKS = ['named', 'partly', 'missed'] as const satisfies readonly NarrationStatus[];
export type TrainingItemMarkValue = (typeof TRAINING_ITEM_MARKS)[number];

// Our own limits: a walk-around narrated at 24 kbps Opus is about 180 KB a minute, so 25 MB is over two hours.
export const TRAINING_AUDIO_MAX_BYTES = 25 * 1024 * 1024;
export const TRAINING_SEGMENTS_MAX = 5000;
export const TRAINING_SEGMENT_TEXT_MAX = 2000;
export const TRAINING_COMMENT_MAX = 2000;

export interface CreateTrainingAttemptRequest {
  // Made by the client, so a retried create returns the same attempt.
  clientId: string;
  // Power unit first, then trailer(s).
  vehicleIds: string[];
  startedAt: string;
  locale?: Locale;
}

// One recogniser segment; `seq` numbers it within the attempt, so a batch sent again changes nothing.
export interface TrainingSegmentUpsert extends NarrationSegment {
  seq: number;
}

export interface PutTrainingSegmentsRequest {
  segments: TrainingSegmentUpsert[];
}

export interface PutTrainingSegmentsResponse {
  segmentCount: number;
}

// The text field sent with the recording as multipart/form-data, beside the file.
export interface TrainingAudioUpload {
  durationMs: number;
}

export interface FinishTrainingAttemptRequest {
  finishedAt: string;
  durationMs: number;
}

export interface TrainingAudioRef {
  mimeType: string;
  sizeBytes: number;
  durationMs: number;
  sha256: string;
  // Streams the recording with Range support.
  audioUrl: string;
}

export interface TrainingItemMark {
  itemKey: string;
  mark: TrainingItemMarkValue;
  comment: string;
}

export interface TrainingReview {
  trainer: PersonRef;
  marks: TrainingItemMark[];
  grade: TrainingGrade;
  comment: string;
  reviewedAt: string;
}

export interface TrainingItemMarkInput {
  itemKey: string;
  mark: TrainingItemMarkValue;
  comment?: string;
}

export interface PutTrainingReviewRequest {
  marks: TrainingItemMarkInput[];
  grade: TrainingGrade;
  comment?: string;
}

export interface TrainingAttemptListItem {
  id: string;
  clientId: string;
  kind: TrainingAttemptKind;
  status: TrainingAttemptStatus;
  student: PersonRef;
  vehicles: InspectionVehicle[];
  locale: Locale;
  startedAt: string;
  finishedAt: string | null;
  durationMs: number | null;
  // The server's score, once finished.
  coverage: CoverageCounts | null;
  grade: TrainingGrade | null;
  reviewedAt: string | null;
}

export interface TrainingAttemptResponse extends TrainingAttemptListItem {
  checklist: Checklist;
  // Sorted by start time.
  segments: NarrationSegment[];
  audio: TrainingAudioRef | null;
  // Computed by the server with scoreNarration against the rebuilt checklist; never taken from a client.
  score: NarrationScore | null;
  review: TrainingReview | null;
}

export interface TrainingProgressPoint {
  attemptId: string;
  // When the attempt was finished.
  date: string;
  // Items named, in percent of the checklist (0-100, whole numbers).
  coveragePercent: number;
  // Named plus half of partly named, in percent.
  creditPercent: number;
  grade: TrainingGrade | null;
}

export interface TrainingProgress {
  student: PersonRef;
  // Finished attempts, oldest first.
  attempts: TrainingProgressPoint[];
}
