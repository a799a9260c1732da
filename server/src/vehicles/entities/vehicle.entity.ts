import {
  VEHICLE_KINDS,
  VEHICLE_STATUSES,
  type VehicleConfig,
  type VehicleKind,
  type VehicleStatus,
} from '@yardcall/shared';
import { Column, Entity, Index } from 'typeorm';
import { EditableOrganizationOwned } from '../../organizations/entities/organization-owned';

// Unit numbers are unique per organisation whatever their case; the functional index lives in the migration.
@Index('UQ_vehicles_org_unit_number_lower', { synchronize: false })
@Entity({ name: 'vehicles' })
export class Vehicle extends EditableOrganizationOwned {
  @Column({ name: 'unit_number', type: 'varchar', length: 20 })
  unitNumber: string;

  @Column({ type: 'enum', enum: [...VEHICLE_KINDS], enumName: 'vehicle_kind' })
  kind: VehicleKind;

  @Column({ type: 'varchar', length: 17 })
  vin: string;

  @Column({ type: 'varchar', length: 12 })
  plate: string;

  @Column({ type: 'enum', enum: [...VEHICLE_STATUSES], enumName: 'vehicle_status', default: 'in_service' })
  status: VehicleStatus;

  @Column({ name: 'status_reason', type: 'text', nullable: true })
  statusReason: string | null;

  @Column({ name: 'status_since', type: 'timestamptz', default: () => 'now()' })
  statusSince: Date;

  @Column({ type: 'jsonb' })
  config: VehicleConfig;

  // Set when a supervisor or admin took the unit out of service by hand: their reason. The hold stays
  // until they lift it, whatever happens to the unit's defects.
  @Column({ name: 'manual_hold_reason', type: 'text', nullable: true })
  manualHoldReason: string | null;
}
