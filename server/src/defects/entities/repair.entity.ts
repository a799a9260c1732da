import { CERTIFICATION_ACTIONS, type CertificationAction } from '@yardcall/shared';
import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { User } from '../../users/entities/user.entity';
import { Defect } from './defect.entity';

// A mechanic's certification of one defect; the latest one is the defect's state.
@Index('IDX_repairs_defect', ['defectId', 'signedAt'])
@Entity({ name: 'repairs' })
export class Repair {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'defect_id', type: 'uuid' })
  defectId: string;

  @ManyToOne(() => Defect, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'defect_id' })
  defect?: Defect;

  @Column({ type: 'enum', enum: [...CERTIFICATION_ACTIONS], enumName: 'repair_action' })
  action: CertificationAction;

  @Column({ type: 'text' })
  note: string;

  @Column({ name: 'deferred_until', type: 'timestamptz', nullable: true })
  deferredUntil: Date | null;

  @Column({ name: 'mechanic_id', type: 'uuid' })
  mechanicId: string;

  @ManyToOne(() => User, { onDelete: 'RESTRICT', nullable: false })
  @JoinColumn({ name: 'mechanic_id' })
  mechanic?: User;

  @Column({ name: 'signed_at', type: 'timestamptz' })
  signedAt: Date;
}
