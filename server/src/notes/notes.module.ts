import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { Inspection } from '../inspections/entities/inspection.entity';
import { Photo } from './entities/photo.entity';
import { VoiceNote } from './entities/voice-note.entity';
import { NotesController } from './notes.controller';
import { NotesService } from './notes.service';

// Voice notes and defect photos: kept here (files through the global StorageModule's ObjectStorage) and
// served under /notes and /photos. They are added through InspectionsModule's /inspections/:id routes.
@Module({
  imports: [TypeOrmModule.forFeature([VoiceNote, Photo, Inspection])],
  controllers: [NotesController],
  providers: [NotesService],
  exports: [NotesService],
})
export class NotesModule {}
