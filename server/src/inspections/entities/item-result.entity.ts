import {
  ANSWERS,
  NO_READING_REASONS,
  VERDICTS,
  type Answer,
  type NoReadingReason,
  type Quantity,
  type SpotFix,
  type Verdict,
} from '@yardcall/shared';
import { Column, Entity, Index } from 'typeorm';
import { InspectionRow } from './inspection-row';

// One answer per checklist item (the latest); the measurement is stored in its canonical unit with the
// verdict and limit the server worked out, whatever the client said.
@Index('UQ_item_results_inspection_item', ['inspectionId', 'itemKey'], { unique: true })
@Index('UQ_item_results_inspection_client', ['inspectionId', 'clientId'], { unique: true })
@Entity({ name: 'item_results' })
export class ItemResult extends InspectionRow {
  @Column({ name: 'item_key', type: 'varchar', length: 160 })
  itemKey: string;

  @Column({ name: 'client_id', type: 'varchar', length: 64 })
  clientId: string;

  @Column({ type: 'enum', enum: [...ANSWERS], enumName: 'item_answer' })
  answer: Answer;

  @Column({ name: 'measurement_quantity', type: 'varchar', length: 32, nullable: true })
  measurementQuantity: Quantity | null;

  @Column({ name: 'measurement_value', type: 'double precision', nullable: true })
  measurementValue: number | null;

  @Column({ name: 'measurement_unit', type: 'varchar', length: 16, nullable: true })
  measurementUnit: string | null;

  @Column({ type: 'enum', enum: [...VERDICTS], enumName: 'item_verdict', nullable: true })
  verdict: Verdict | null;

  @Column({ name: 'limit_value', type: 'double precision', nullable: true })
  limitValue: number | null;

  @Column({ name: 'limit_unit', type: 'varchar', length: 16, nullable: true })
  limitUnit: string | null;

  @Column({ name: 'limit_source', type: 'varchar', length: 120, nullable: true })
  limitSource: string | null;

  // Set by the server on a measured check passed without a value, from the inspection's required readings.
  @Column({
    name: 'no_reading',
    type: 'enum',
    enum: [...NO_READING_REASONS],
    enumName: 'item_no_reading',
    nullable: true,
  })
  noReading: NoReadingReason | null;

  // A defect corrected on the spot: its new reading in the canonical unit, judged by the server.
  @Column({ type: 'jsonb', nullable: true })
  fixed: SpotFix | null;

  @Column({ type: 'text', nullable: true })
  detail: string | null;

  @Column({ type: 'text', nullable: true })
  heard: string | null;

  @Column({ type: 'real', nullable: true })
  confidence: number | null;

  @Column({ name: 'answered_at', type: 'timestamptz' })
  answeredAt: Date;

  // The server's own clock when this answer was stored (answeredAt is the phone's).
  @Column({ name: 'received_at', type: 'timestamptz', default: () => 'now()' })
  receivedAt: Date;
}
