import {
  INSPECTION_KINDS,
  INSPECTION_STATUSES,
  type InspectionKind,
  type InspectionStatus,
  type Locale,
  type ReadingRule,
} from '@yardcall/shared';
import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { EditableOrganizationOwned } from '../../organizations/entities/organization-owned';
import { User } from '../../users/entities/user.entity';
import type { VehicleSnapshot } from '../../vehicles/vehicle-checklist';

// The list's keyset indexes sort newest first; their DESC columns live in the migration only.
@Index('IDX_inspections_org_started', { synchronize: false })
@Index('IDX_inspections_org_driver_started', { synchronize: false })
@Index('IDX_inspections_org_kind_started', { synchronize: false })
@Index('IDX_inspections_org_submitted', { synchronize: false })
@Index('IDX_inspections_org_defects_started', { synchronize: false })
@Index('IDX_inspections_org_rushed_started', { synchronize: false })
@Index('IDX_inspections_org_open_started', { synchronize: false })
@Index('UQ_inspections_driver_client', ['driverId', 'clientId'], { unique: true })
@Entity({ name: 'inspections' })
export class Inspection extends EditableOrganizationOwned {
  @Column({ name: 'driver_id', type: 'uuid' })
  driverId: string;

  @ManyToOne(() => User, { onDelete: 'RESTRICT', nullable: false })
  @JoinColumn({ name: 'driver_id' })
  driver?: User;

  @Column({ type: 'enum', enum: [...INSPECTION_KINDS], enumName: 'inspection_kind' })
  kind: InspectionKind;

  @Column({ type: 'enum', enum: [...INSPECTION_STATUSES], enumName: 'inspection_status', default: 'in_progress' })
  status: InspectionStatus;

  @Column({ type: 'varchar', length: 5 })
  locale: Locale;

  @Column({ name: 'client_id', type: 'varchar', length: 64 })
  clientId: string;

  @Column({ name: 'started_at', type: 'timestamptz' })
  startedAt: Date;

  @Column({ name: 'submitted_at', type: 'timestamptz', nullable: true })
  submittedAt: Date | null;

  @Column({ type: 'integer', nullable: true })
  odometer: number | null;

  @Column({ type: 'varchar', length: 200, nullable: true })
  location: string | null;

  @Column({ type: 'jsonb' })
  vehicles: VehicleSnapshot[];

  // The organisation's required readings when the walk-around began, so a later change rewrites no history.
  @Column({ name: 'required_readings', type: 'jsonb', default: [] })
  requiredReadings: ReadingRule[];

  @Column({ type: 'boolean', default: false })
  rushed: boolean;

  @Column({ name: 'defect_count', type: 'integer', default: 0 })
  defectCount: number;

  // Set at submit: a defect of this report was reported before on the same vehicle and item.
  @Column({ name: 'recurring_defect', type: 'boolean', default: false })
  recurringDefect: boolean;

  // Set at submit: from the start to the last answer.
  @Column({ name: 'duration_seconds', type: 'integer', nullable: true })
  durationSeconds: number | null;
}
