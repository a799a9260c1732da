import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { Inspection } from '../../inspections/entities/inspection.entity';
import { Organization } from '../../organizations/entities/organization.entity';

// A driver's recording at one checklist item; the audio itself lives in ObjectStorage under objectKey.
@Index('UQ_voice_notes_inspection_client', ['inspectionId', 'clientId'], { unique: true })
@Entity({ name: 'voice_notes' })
export class VoiceNote {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'organization_id', type: 'uuid' })
  organizationId: string;

  @ManyToOne(() => Organization, { onDelete: 'RESTRICT', nullable: false })
  @JoinColumn({ name: 'organization_id' })
  organization?: Organization;

  @Column({ name: 'inspection_id', type: 'uuid' })
  inspectionId: string;

  @ManyToOne(() => Inspection, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'inspection_id' })
  inspection?: Inspection;

  @Column({ name: 'item_key', type: 'varchar', length: 160 })
  itemKey: string;

  // Made by the client, so a retried upload finds the note it already made.
  @Column({ name: 'client_id', type: 'varchar', length: 64 })
  clientId: string;

  @Column({ name: 'object_key', type: 'varchar', length: 512 })
  objectKey: string;

  // The type found in the file's content, not the one the client claimed.
  @Column({ name: 'mime_type', type: 'varchar', length: 40 })
  mimeType: string;

  @Column({ name: 'duration_ms', type: 'integer' })
  durationMs: number;

  @Column({ name: 'size_bytes', type: 'integer' })
  sizeBytes: number;

  @Column({ type: 'char', length: 64 })
  sha256: string;

  // What the speech engine heard while the note was recorded, if anything.
  @Column({ type: 'text', nullable: true })
  heard: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
