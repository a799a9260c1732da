import { Entity, Index } from 'typeorm';
import { InspectionUpload } from './inspection-upload';

// A photo of a defect at one checklist item.
@Index('UQ_photos_inspection_client', ['inspectionId', 'clientId'], { unique: true })
@Entity({ name: 'photos' })
export class Photo extends InspectionUpload {}
