import type {
  NarrationSegment,
  TrainingAttemptListItem,
  TrainingAttemptResponse,
  TrainingProgressPoint,
  TrainingReview as TrainingReviewResponse,
  Checklist,
} from '@yardcall/shared';
import { toVehicleRefs } from '../inspections/inspection-view';
import type { StoredSegment, TrainingAttempt } from './entities/training-attempt.entity';
import type { TrainingReview } from './entities/training-review.entity';

export function audioPath(attemptId: string): string {
  return `/api/training/attempts/${attemptId}/audio`;
}

// Sorted by start time (then by number), as the scorer reads them.
export function orderedSegments(segments: readonly StoredSegment[]): NarrationSegment[] {
  return [...segments]
    .sort((a, b) => a.startMs - b.startMs || a.seq - b.seq)
    .map(({ text, startMs, endMs }) => ({ text, startMs, endMs }));
}

export function toAttemptListItem(
  attempt: TrainingAttempt,
  studentName: string,
  review: TrainingReview | null,
): TrainingAttemptListItem {
  return {
    id: attempt.id,
    clientId: attempt.clientId,
    kind: attempt.kind,
    status: attempt.status,
    student: { id: attempt.studentId, name: studentName },
    vehicles: toVehicleRefs(attempt.vehicles),
    locale: attempt.locale,
    startedAt: attempt.startedAt.toISOString(),
    finishedAt: attempt.finishedAt?.toISOString() ?? null,
    durationMs: attempt.durationMs,
    coverage: attempt.score?.overall ?? null,
    grade: review?.grade ?? null,
    reviewedAt: review?.reviewedAt.toISOString() ?? null,
  };
}

export function toReviewResponse(review: TrainingReview, trainerName: string): TrainingReviewResponse {
  return {
    trainer: { id: review.trainerId, name: trainerName },
    marks: review.marks,
    grade: review.grade,
    comment: review.comment,
    reviewedAt: review.reviewedAt.toISOString(),
  };
}

export function toAttemptResponse(
  attempt: TrainingAttempt,
  studentName: string,
  checklist: Checklist,
  review: TrainingReview | null,
  trainerName: string,
): TrainingAttemptResponse {
  return {
    ...toAttemptListItem(attempt, studentName, review),
    checklist,
    segments: orderedSegments(attempt.segments),
    audio:
      attempt.audioObjectKey && attempt.audioMimeType && attempt.audioSizeBytes !== null && attempt.audioSha256
        ? {
            mimeType: attempt.audioMimeType,
            sizeBytes: attempt.audioSizeBytes,
            durationMs: attempt.audioDurationMs ?? 0,
            sha256: attempt.audioSha256,
            audioUrl: audioPath(attempt.id),
          }
        : null,
    score: attempt.score,
    review: review ? toReviewResponse(review, trainerName) : null,
  };
}

function percent(fraction: number): number {
  return Math.round(fraction * 100);
}

export function toProgressPoint(attempt: TrainingAttempt, review: TrainingReview | null): TrainingProgressPoint {
  const overall = attempt.score?.overall;
  return {
    attemptId: attempt.id,
    date: (attempt.finishedAt ?? attempt.startedAt).toISOString(),
    coveragePercent: overall ? percent(overall.namedFraction) : 0,
    creditPercent: overall ? percent(overall.creditFraction) : 0,
    grade: review?.grade ?? null,
  };
}
