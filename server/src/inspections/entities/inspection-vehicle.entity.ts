import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn } from 'typeorm';
import { Vehicle } from '../../vehicles/entities/vehicle.entity';
import { Inspection } from './inspection.entity';

// Which vehicles an inspection covers, in combination order (0 = power unit): backs the vehicle filter.
@Index('IDX_inspection_vehicles_vehicle', ['vehicleId', 'inspectionId'])
@Entity({ name: 'inspection_vehicles' })
export class InspectionVehicle {
  @PrimaryColumn({ name: 'inspection_id', type: 'uuid' })
  inspectionId: string;

  @ManyToOne(() => Inspection, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'inspection_id' })
  inspection?: Inspection;

  @PrimaryColumn({ type: 'smallint' })
  position: number;

  @Column({ name: 'vehicle_id', type: 'uuid' })
  vehicleId: string;

  @ManyToOne(() => Vehicle, { onDelete: 'RESTRICT', nullable: false })
  @JoinColumn({ name: 'vehicle_id' })
  vehicle?: Vehicle;
}
