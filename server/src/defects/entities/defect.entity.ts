import { DEFECT_STATUSES, type DefectStatus, type MeasurementValue, type ResultLimit } from '@yardcall/shared';
import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { Inspection } from '../../inspections/entities/inspection.entity';
import { EditableOrganizationOwned } from '../../organizations/entities/organization-owned';
import { Vehicle } from '../../vehicles/entities/vehicle.entity';

// A defect a submitted report listed, until a mechanic certifies it.
@Index('IDX_defects_org_status_created', ['organizationId', 'status', 'createdAt'])
@Index('IDX_defects_vehicle_status', ['vehicleId', 'status'])
@Index('IDX_defects_inspection', ['inspectionId'])
@Entity({ name: 'defects' })
export class Defect extends EditableOrganizationOwned {
  @Column({ name: 'inspection_id', type: 'uuid' })
  inspectionId: string;

  @ManyToOne(() => Inspection, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'inspection_id' })
  inspection?: Inspection;

  @Column({ name: 'vehicle_id', type: 'uuid' })
  vehicleId: string;

  @ManyToOne(() => Vehicle, { onDelete: 'RESTRICT', nullable: false })
  @JoinColumn({ name: 'vehicle_id' })
  vehicle?: Vehicle;

  @Column({ name: 'item_key', type: 'varchar', length: 160 })
  itemKey: string;

  @Column({ type: 'varchar', length: 200 })
  title: string;

  @Column({ name: 'position_label', type: 'varchar', length: 200 })
  positionLabel: string;

  // Blocks driving until repaired or certified as not needing repair (49 CFR 396.11(a)(3)).
  @Column({ type: 'boolean' })
  safety: boolean;

  @Column({ type: 'text', nullable: true })
  detail: string | null;

  @Column({ type: 'jsonb', nullable: true })
  measurement: MeasurementValue | null;

  @Column({ name: 'measurement_limit', type: 'jsonb', nullable: true })
  measurementLimit: ResultLimit | null;

  @Column({ type: 'enum', enum: [...DEFECT_STATUSES], enumName: 'defect_status', default: 'open' })
  status: DefectStatus;
}
