import { Column, Entity, Index } from 'typeorm';
import { InspectionUpload } from './inspection-upload';

// A driver's recording at one checklist item.
@Index('UQ_voice_notes_inspection_client', ['inspectionId', 'clientId'], { unique: true })
@Entity({ name: 'voice_notes' })
export class VoiceNote extends InspectionUpload {
  @Column({ name: 'duration_ms', type: 'integer' })
  durationMs: number;

  // What the speech engine heard while the note was recorded, if anything.
  @Column({ type: 'text', nullable: true })
  heard: string | null;
}
