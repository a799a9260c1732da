import { TRAINING_GRADES, type TrainingGrade, type TrainingItemMark } from '@yardcall/shared';
import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { EditableOrganizationOwned } from '../../organizations/entities/organization-owned';
import { User } from '../../users/entities/user.entity';
import { TrainingAttempt } from './training-attempt.entity';

// A trainer's marks and comments on one attempt; saved again, it replaces the previous review.
@Index('UQ_training_reviews_attempt', ['attemptId'], { unique: true })
@Entity({ name: 'training_reviews' })
export class TrainingReview extends EditableOrganizationOwned {
  @Column({ name: 'attempt_id', type: 'uuid' })
  attemptId: string;

  @ManyToOne(() => TrainingAttempt, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'attempt_id' })
  attempt?: TrainingAttempt;

  @Column({ name: 'trainer_id', type: 'uuid' })
  trainerId: string;

  @ManyToOne(() => User, { onDelete: 'RESTRICT', nullable: false })
  @JoinColumn({ name: 'trainer_id' })
  trainer?: User;

  @Column({ type: 'jsonb' })
  marks: TrainingItemMark[];

  @Column({ type: 'enum', enum: [...TRAINING_GRADES], enumName: 'training_grade' })
  grade: TrainingGrade;

  @Column({ type: 'text' })
  comment: string;

  @Column({ name: 'reviewed_at', type: 'timestamptz' })
  reviewedAt: Date;
}
