import {
  TRAINING_ATTEMPT_STATUSES,
  type Locale,
  type NarrationScore,
  type NarrationSegment,
  type TrainingAttemptKind,
  type TrainingAttemptStatus,
} from '@yardcall/shared';
import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { EditableOrganizationOwned } from '../../organizations/entities/organization-owned';
import { User } from '../../users/entities/user.entity';
import type { VehicleSnapshot } from '../../vehicles/vehicle-checklist';

// A segment as stored: its sequence number keeps a batch sent twice from adding it twice.
export interface StoredSegment extends NarrationSegment {
  seq: number;
}

// A student's narrated practice walk-around: its recording, what the recogniser heard and the server's score.
@Index('UQ_training_attempts_student_client', ['studentId', 'clientId'], { unique: true })
@Index('IDX_training_attempts_org_started', ['organizationId', 'startedAt'])
@Entity({ name: 'training_attempts' })
export class TrainingAttempt extends EditableOrganizationOwned {
  @Column({ name: 'student_id', type: 'uuid' })
  studentId: string;

  @ManyToOne(() => User, { onDelete: 'RESTRICT', nullable: false })
  @JoinColumn({ name: 'student_id' })
  student?: User;

  @Column({ name: 'client_id', type: 'varchar', length: 64 })
  clientId: string;

  @Column({ type: 'varchar', length: 16, default: 'practice' })
  kind: TrainingAttemptKind;

  @Column({
    type: 'enum',
    enum: [...TRAINING_ATTEMPT_STATUSES],
    enumName: 'training_attempt_status',
    default: 'recording',
  })
  status: TrainingAttemptStatus;

  @Column({ type: 'varchar', length: 5 })
  locale: Locale;

  // The vehicles as configured when the attempt began: the checklist is rebuilt from this.
  @Column({ type: 'jsonb' })
  vehicles: VehicleSnapshot[];

  @Column({ name: 'started_at', type: 'timestamptz' })
  startedAt: Date;

  @Column({ name: 'finished_at', type: 'timestamptz', nullable: true })
  finishedAt: Date | null;

  @Column({ name: 'duration_ms', type: 'integer', nullable: true })
  durationMs: number | null;

  @Column({ type: 'jsonb' })
  segments: StoredSegment[];

  // Computed by the server when the attempt is finished.
  @Column({ type: 'jsonb', nullable: true })
  score: NarrationScore | null;

  @Column({ name: 'audio_object_key', type: 'varchar', length: 300, nullable: true })
  audioObjectKey: string | null;

  @Column({ name: 'audio_mime_type', type: 'varchar', length: 60, nullable: true })
  audioMimeType: string | null;

  @Column({ name: 'audio_size_bytes', type: 'integer', nullable: true })
  audioSizeBytes: number | null;

  @Column({ name: 'audio_sha256', type: 'char', length: 64, nullable: true })
  audioSha256: string | null;

  @Column({ name: 'audio_duration_ms', type: 'integer', nullable: true })
  audioDurationMs: number | null;
}
