import { Column, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { Inspection } from './inspection.entity';

// The columns of a row that is part of one inspection and goes with it (an answer, a signature); each
// entity's table keeps them (TypeORM's concrete-table inheritance), as if each declared them.
export abstract class InspectionRow {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'inspection_id', type: 'uuid' })
  inspectionId: string;

  @ManyToOne(() => Inspection, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'inspection_id' })
  inspection?: Inspection;
}
