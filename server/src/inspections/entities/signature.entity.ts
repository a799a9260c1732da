import { SIGNATURE_ROLES, type SignatureRole } from '@yardcall/shared';
import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { Defect } from '../../defects/entities/defect.entity';
import { User } from '../../users/entities/user.entity';
import { InspectionRow } from './inspection-row';

// Electronic signatures and what each signer certified (49 CFR 390.32 allows electronic records).
@Index('IDX_signatures_inspection', ['inspectionId', 'signedAt'])
@Index('IDX_signatures_defect', ['defectId'])
@Entity({ name: 'signatures' })
export class Signature extends InspectionRow {
  // Set for a mechanic's certification of one defect.
  @Column({ name: 'defect_id', type: 'uuid', nullable: true })
  defectId: string | null;

  @ManyToOne(() => Defect, { onDelete: 'CASCADE', nullable: true })
  @JoinColumn({ name: 'defect_id' })
  defect?: Defect | null;

  @Column({ type: 'enum', enum: [...SIGNATURE_ROLES], enumName: 'signature_role' })
  role: SignatureRole;

  @Column({ name: 'signer_id', type: 'uuid' })
  signerId: string;

  @ManyToOne(() => User, { onDelete: 'RESTRICT', nullable: false })
  @JoinColumn({ name: 'signer_id' })
  signer?: User;

  // The name as typed by the signer.
  @Column({ type: 'varchar', length: 120 })
  name: string;

  // An SVG path or a PNG data URL.
  @Column({ type: 'text', nullable: true })
  drawing: string | null;

  @Column({ type: 'text' })
  statement: string;

  @Column({ name: 'signed_at', type: 'timestamptz' })
  signedAt: Date;
}
