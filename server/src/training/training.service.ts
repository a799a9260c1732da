import { ConflictException, ForbiddenException, Inject, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import {
  DEFAULT_DISPLAY_SETTINGS,
  TRAINING_AUDIO_MAX_BYTES,
  scoreNarration,
  type Checklist,
  type CreateTrainingAttemptRequest,
  type FieldProblem,
  type FinishTrainingAttemptRequest,
  type PutTrainingReviewRequest,
  type PutTrainingSegmentsRequest,
  type TrainingAttemptListItem,
  type TrainingAttemptResponse,
  type TrainingAudioUpload,
  type TrainingProgress,
} from '@yardcall/shared';
import { DataSource, In, Repository, type EntityManager } from 'typeorm';
import type { AuthUser } from '../auth/auth-user';
import { ApiValidationException } from '../common/api-validation.exception';
import { isUniqueViolation } from '../common/database-errors';
import { checkUpload } from '../uploads/check-upload';
import { VOICE_NOTE_MEDIA, type MediaKind, type NoteAudioType } from '../uploads/media-types';
import type { ServedObject } from '../uploads/serve-object';
import { OBJECT_STORAGE, type ObjectStorage } from '../storage/object-storage';
import { User } from '../users/entities/user.entity';
import { Vehicle } from '../vehicles/entities/vehicle.entity';
import { ChecklistCache, checklistOfSnapshot, snapshotVehicles } from '../vehicles/vehicle-checklist';
import type { ListTrainingAttemptsQuery, TrainingProgressQuery } from './dto/training.dto';
import { TrainingAttempt } from './entities/training-attempt.entity';
import { TrainingReview } from './entities/training-review.entity';
import { orderedSegments, toAttemptListItem, toAttemptResponse, toProgressPoint } from './training-view';

// The same containers as voice notes, judged by content the same way; a whole walk-around is longer.
export const PRACTICE_AUDIO_MEDIA: MediaKind<NoteAudioType> = {
  ...VOICE_NOTE_MEDIA,
  label: 'a practice recording',
  maxBytes: TRAINING_AUDIO_MAX_BYTES,
};

const NOT_FOUND = 'No practice attempt with this id in your organisation.';
const NOT_A_STUDENT =
  'Only drivers marked as students do practice attempts: ask your administrator to mark you as a student.';
const FINISHED = 'This practice attempt is finished: start a new attempt to narrate again.';
const CLIENT_ID_INDEX = 'UQ_training_attempts_student_client';
const REVIEW_INDEX = 'UQ_training_reviews_attempt';
// Checklists are rebuilt from the stored snapshot, which never changes: keep the recent ones.
const CHECKLIST_CACHE_MAX = 200;
const LIST_LIMIT = 200;

@Injectable()
export class TrainingService {
  private readonly checklists = new ChecklistCache(CHECKLIST_CACHE_MAX);

  constructor(
    @InjectRepository(TrainingAttempt) private readonly attempts: Repository<TrainingAttempt>,
    @InjectRepository(TrainingReview) private readonly reviews: Repository<TrainingReview>,
    @InjectRepository(Vehicle) private readonly vehicles: Repository<Vehicle>,
    @InjectRepository(User) private readonly users: Repository<User>,
    private readonly dataSource: DataSource,
    @Inject(OBJECT_STORAGE) private readonly storage: ObjectStorage,
  ) {}

  async create(
    user: AuthUser,
    dto: CreateTrainingAttemptRequest,
  ): Promise<{ created: boolean; attempt: TrainingAttemptResponse }> {
    const existing = await this.attempts.findOneBy({ studentId: user.id, clientId: dto.clientId });
    if (existing) return { created: false, attempt: await this.assemble(existing) };
    const student = await this.users.findOne({
      select: { id: true, isStudent: true, settings: true },
      where: { id: user.id, organizationId: user.organizationId },
    });
    if (!student?.isStudent) throw new ForbiddenException(NOT_A_STUDENT);

    const snapshot = await snapshotVehicles(this.vehicles, user.organizationId, dto.vehicleIds);
    const locale = dto.locale ?? student.settings.locale ?? DEFAULT_DISPLAY_SETTINGS.locale;
    const checklist = checklistOfSnapshot(snapshot, 'practice', locale);
    let attempt: TrainingAttempt;
    try {
      attempt = await this.attempts.save(
        this.attempts.create({
          organizationId: user.organizationId,
          studentId: user.id,
          clientId: dto.clientId,
          kind: 'practice',
          status: 'recording',
          locale,
          vehicles: snapshot,
          startedAt: new Date(dto.startedAt),
          finishedAt: null,
          durationMs: null,
          segments: [],
          score: null,
          audioObjectKey: null,
          audioMimeType: null,
          audioSizeBytes: null,
          audioSha256: null,
          audioDurationMs: null,
        }),
      );
    } catch (error) {
      // Two tries of the same create raced: the first one won, answer with it.
      if (!isUniqueViolation(error, CLIENT_ID_INDEX)) throw error;
      const winner = await this.attempts.findOneByOrFail({ studentId: user.id, clientId: dto.clientId });
      return { created: false, attempt: await this.assemble(winner) };
    }
    this.checklists.remember(attempt.id, checklist);
    return { created: true, attempt: await this.assemble(attempt) };
  }

  // Segments are merged by number: a batch sent again writes the same rows.
  async putSegments(user: AuthUser, id: string, dto: PutTrainingSegmentsRequest): Promise<{ segmentCount: number }> {
    const problems: FieldProblem[] = [];
    const seen = new Set<number>();
    dto.segments.forEach((segment, index) => {
      if (segment.endMs < segment.startMs) {
        problems.push({ field: `segments.${index}.endMs`, message: 'A segment cannot end before it starts.' });
      }
      if (seen.has(segment.seq)) {
        problems.push({ field: `segments.${index}.seq`, message: `seq ${segment.seq} appears twice in this batch.` });
      }
      seen.add(segment.seq);
    });
    if (problems.length > 0) throw new ApiValidationException(problems);

    return this.dataSource.transaction(async (manager) => {
      const attempt = await this.ownAttempt(manager, user, id, true);
      const stored = new Map(attempt.segments.map((s) => [s.seq, s]));
      const changed = dto.segments.filter((s) => {
        const old = stored.get(s.seq);
        return !old || old.text !== s.text || old.startMs !== s.startMs || old.endMs !== s.endMs;
      });
      if (changed.length === 0) return { segmentCount: attempt.segments.length };
      if (attempt.status === 'finished') throw new ConflictException(FINISHED);
      for (const s of changed) stored.set(s.seq, { seq: s.seq, text: s.text, startMs: s.startMs, endMs: s.endMs });
      const segments = [...stored.values()].sort((a, b) => a.seq - b.seq);
      await manager.update(TrainingAttempt, { id: attempt.id }, { segments });
      return { segmentCount: segments.length };
    });
  }

  // One recording per attempt: the same file sent again answers the stored one.
  async addAudio(
    user: AuthUser,
    id: string,
    dto: TrainingAudioUpload,
    file: Express.Multer.File | undefined,
  ): Promise<{ created: boolean; attempt: TrainingAttemptResponse }> {
    const attempt = await this.ownAttempt(this.dataSource.manager, user, id, false);
    const checked = await checkUpload(file, PRACTICE_AUDIO_MEDIA);
    if (attempt.audioSha256) {
      if (attempt.audioSha256 !== checked.sha256) {
        throw new ConflictException(
          'This practice attempt already has its recording: start a new attempt for a new recording.',
        );
      }
      return { created: false, attempt: await this.assemble(attempt) };
    }
    // Named by its content: two uploads racing for one attempt never write to the same object, so the
    // loser cannot overwrite the winner's bytes (the same file writes the same bytes).
    const objectKey = `training/${attempt.id}/${checked.sha256}.${checked.extension}`;
    await this.storage.put(objectKey, checked.buffer, { contentType: checked.mimeType });
    const result = await this.attempts
      .createQueryBuilder()
      .update(TrainingAttempt)
      .set({
        audioObjectKey: objectKey,
        audioMimeType: checked.mimeType,
        audioSizeBytes: checked.buffer.length,
        audioSha256: checked.sha256,
        audioDurationMs: dto.durationMs,
      })
      .where('id = :id AND audio_sha256 IS NULL', { id: attempt.id })
      .execute();
    const saved = await this.attempts.findOneByOrFail({ id: attempt.id });
    if (!result.affected) {
      // Another upload raced in first; it stands if it is the same file, and this one's object goes.
      if (saved.audioSha256 !== checked.sha256) {
        await this.storage.delete(objectKey);
        throw new ConflictException('This practice attempt already has its recording.');
      }
      return { created: false, attempt: await this.assemble(saved) };
    }
    return { created: true, attempt: await this.assemble(saved) };
  }

  // The server scores the narration; finishing again answers the stored attempt.
  async finish(user: AuthUser, id: string, dto: FinishTrainingAttemptRequest): Promise<TrainingAttemptResponse> {
    const attempt = await this.dataSource.transaction(async (manager) => {
      const own = await this.ownAttempt(manager, user, id, true);
      if (own.status === 'finished') return own;
      const finishedAt = new Date(dto.finishedAt);
      if (finishedAt.getTime() < own.startedAt.getTime()) {
        throw new ApiValidationException([
          { field: 'finishedAt', message: 'An attempt cannot finish before it started.' },
        ]);
      }
      const score = scoreNarration(orderedSegments(own.segments), this.checklistOf(own));
      await manager.update(
        TrainingAttempt,
        { id: own.id },
        { status: 'finished', finishedAt, durationMs: dto.durationMs, score },
      );
      return manager.findOneByOrFail(TrainingAttempt, { id: own.id });
    });
    return this.assemble(attempt);
  }

  async list(user: AuthUser, query: ListTrainingAttemptsQuery): Promise<TrainingAttemptListItem[]> {
    const builder = this.attempts
      .createQueryBuilder('attempt')
      .innerJoin('attempt.student', 'student')
      .addSelect(['student.id', 'student.name'])
      .leftJoinAndMapOne('attempt.review', TrainingReview, 'review', 'review.attempt_id = attempt.id')
      .where('attempt.organization_id = :organizationId', { organizationId: user.organizationId });
    // Students see their own attempts; trainers every student's in the organisation.
    if (user.role !== 'trainer') builder.andWhere('attempt.student_id = :self', { self: user.id });
    else if (query.studentId) builder.andWhere('attempt.student_id = :studentId', { studentId: query.studentId });
    if (query.review === 'waiting') builder.andWhere("attempt.status = 'finished' AND review.id IS NULL");
    if (query.review === 'reviewed') builder.andWhere('review.id IS NOT NULL');
    const rows = await builder
      .orderBy('attempt.started_at', 'DESC')
      .addOrderBy('attempt.id', 'DESC')
      .limit(LIST_LIMIT)
      .getMany();
    return rows.map((row) =>
      toAttemptListItem(
        row,
        row.student?.name ?? '',
        (row as TrainingAttempt & { review?: TrainingReview }).review ?? null,
      ),
    );
  }

  async get(user: AuthUser, id: string): Promise<TrainingAttemptResponse> {
    return this.assemble(await this.readable(user, id));
  }

  async audio(user: AuthUser, id: string): Promise<ServedObject> {
    const attempt = await this.readable(user, id);
    if (!attempt.audioObjectKey || !attempt.audioMimeType || attempt.audioSizeBytes === null) {
      throw new NotFoundException('This practice attempt has no recording yet.');
    }
    return {
      objectKey: attempt.audioObjectKey,
      mimeType: attempt.audioMimeType,
      sizeBytes: attempt.audioSizeBytes,
      label: 'recording',
    };
  }

  async putReview(user: AuthUser, id: string, dto: PutTrainingReviewRequest): Promise<TrainingAttemptResponse> {
    const attempt = await this.readable(user, id);
    if (attempt.status !== 'finished') {
      throw new ConflictException('The student has not finished this attempt yet: review it once it is finished.');
    }
    const keys = new Set(this.checklistOf(attempt).items.map((item) => item.key));
    const problems: FieldProblem[] = [];
    const seen = new Set<string>();
    dto.marks.forEach((mark, index) => {
      if (!keys.has(mark.itemKey)) {
        problems.push({
          field: `marks.${index}.itemKey`,
          message: `${mark.itemKey} is not an item of this attempt's checklist.`,
        });
      } else if (seen.has(mark.itemKey)) {
        problems.push({
          field: `marks.${index}.itemKey`,
          message: `${mark.itemKey} is marked twice: mark each item once.`,
        });
      }
      seen.add(mark.itemKey);
    });
    if (problems.length > 0) throw new ApiValidationException(problems);
    const values = {
      organizationId: user.organizationId,
      attemptId: attempt.id,
      trainerId: user.id,
      marks: dto.marks.map((m) => ({ itemKey: m.itemKey, mark: m.mark, comment: m.comment?.trim() ?? '' })),
      grade: dto.grade,
      comment: dto.comment?.trim() ?? '',
      reviewedAt: new Date(),
    };
    await this.reviews
      .createQueryBuilder()
      .insert()
      .into(TrainingReview)
      .values(values)
      .orUpdate(['trainer_id', 'marks', 'grade', 'comment', 'reviewed_at', 'updated_at'], ['attempt_id'])
      .execute()
      .catch((error: unknown) => {
        if (isUniqueViolation(error, REVIEW_INDEX))
          throw new ConflictException('Another review was saved at the same moment: open the attempt again.');
        throw error;
      });
    return this.assemble(attempt);
  }

  async progress(user: AuthUser, query: TrainingProgressQuery): Promise<TrainingProgress> {
    let studentId = user.id;
    if (user.role === 'trainer') {
      if (!query.studentId) {
        throw new ApiValidationException([{ field: 'studentId', message: 'Choose the student: send ?studentId=.' }]);
      }
      studentId = query.studentId;
    } else if (query.studentId && query.studentId !== user.id) {
      throw new NotFoundException('No student with this id in your organisation.');
    }
    const student = await this.users.findOne({
      select: { id: true, name: true, isStudent: true },
      where: { id: studentId, organizationId: user.organizationId },
    });
    if (!student || (user.role === 'trainer' && !student.isStudent)) {
      throw new NotFoundException('No student with this id in your organisation.');
    }
    const attempts = await this.attempts.find({
      where: { organizationId: user.organizationId, studentId, status: 'finished' },
      order: { finishedAt: 'ASC', id: 'ASC' },
    });
    const reviews = attempts.length ? await this.reviews.findBy({ attemptId: In(attempts.map((a) => a.id)) }) : [];
    const byAttempt = new Map(reviews.map((r) => [r.attemptId, r]));
    return {
      student: { id: student.id, name: student.name },
      attempts: attempts.map((a) => toProgressPoint(a, byAttempt.get(a.id) ?? null)),
    };
  }

  // Trainers read every attempt of their organisation; a student only their own (404 for anyone else's).
  private async readable(user: AuthUser, id: string): Promise<TrainingAttempt> {
    const attempt = await this.attempts.findOneBy({ id, organizationId: user.organizationId });
    if (!attempt || (user.role !== 'trainer' && attempt.studentId !== user.id)) throw new NotFoundException(NOT_FOUND);
    return attempt;
  }

  private async ownAttempt(
    manager: EntityManager,
    user: AuthUser,
    id: string,
    lock: boolean,
  ): Promise<TrainingAttempt> {
    const attempt = await manager.findOne(TrainingAttempt, {
      where: { id, organizationId: user.organizationId, studentId: user.id },
      ...(lock ? { lock: { mode: 'pessimistic_write' as const } } : {}),
    });
    if (!attempt) throw new NotFoundException(NOT_FOUND);
    return attempt;
  }

  private checklistOf(attempt: TrainingAttempt): Checklist {
    return this.checklists.of(attempt).checklist;
  }

  private async assemble(attempt: TrainingAttempt): Promise<TrainingAttemptResponse> {
    const [student, review] = await Promise.all([
      this.users.findOne({ select: { id: true, name: true }, where: { id: attempt.studentId } }),
      this.reviews.findOne({ where: { attemptId: attempt.id }, relations: { trainer: true } }),
    ]);
    return toAttemptResponse(
      attempt,
      student?.name ?? '',
      this.checklistOf(attempt),
      review,
      review?.trainer?.name ?? '',
    );
  }
}
