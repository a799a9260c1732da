import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { InspectionsModule } from '../inspections/inspections.module';
import { Photo } from './entities/photo.entity';
import { VoiceNote } from './entities/voice-note.entity';
import { NotesController } from './notes.controller';
import { NotesService } from './notes.service';

// Voice notes and defect photos; files through the global StorageModule's ObjectStorage.
@Module({
  imports: [TypeOrmModule.forFeature([VoiceNote, Photo]), InspectionsModule],
  controllers: [NotesController],
  providers: [NotesService],
  exports: [NotesService],
})
export class NotesModule {}
