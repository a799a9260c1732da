import { Column, JoinColumn, ManyToOne } from 'typeorm';
import { Inspection } from '../../inspections/entities/inspection.entity';
import { OrganizationOwned } from '../../organizations/entities/organization-owned';

// The columns a voice note and a photo share; the file itself lives in ObjectStorage under objectKey.
export abstract class InspectionUpload extends OrganizationOwned {
  @Column({ name: 'inspection_id', type: 'uuid' })
  inspectionId: string;

  @ManyToOne(() => Inspection, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'inspection_id' })
  inspection?: Inspection;

  @Column({ name: 'item_key', type: 'varchar', length: 160 })
  itemKey: string;

  // Made by the client, so a retried upload finds the record it already made.
  @Column({ name: 'client_id', type: 'varchar', length: 64 })
  clientId: string;

  @Column({ name: 'object_key', type: 'varchar', length: 512 })
  objectKey: string;

  // The type found in the file's content, not the one the client claimed.
  @Column({ name: 'mime_type', type: 'varchar', length: 40 })
  mimeType: string;

  @Column({ name: 'size_bytes', type: 'integer' })
  sizeBytes: number;

  @Column({ type: 'char', length: 64 })
  sha256: string;
}
