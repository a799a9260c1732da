import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

@Entity({ name: 'organizations' })
export class Organization {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  // How long inspection records are kept; never below 3 (49 CFR 396.11(a)(4)), checked by the service.
  @Column({ name: 'retention_months', type: 'integer', default: 3 })
  retentionMonths: number;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
