import type { ReadingRule } from '@yardcall/shared';
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

  // Readings every walk-around must take; by default none (checked against READING_RULES by the service).
  @Column({ name: 'required_readings', type: 'jsonb', default: [] })
  requiredReadings: ReadingRule[];

  // An IANA time zone name: the supervisor's days, the report PDF and the e-mails read times in it.
  @Column({ name: 'time_zone', type: 'varchar', length: 64, default: 'UTC' })
  timeZone: string;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
