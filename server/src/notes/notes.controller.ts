import { Get, Inject, Req, Res, StreamableFile } from '@nestjs/common';
import { ApiOkResponse, ApiOperation, ApiPartialContentResponse, ApiProduces } from '@nestjs/swagger';
import { NOTE_AUDIO_TYPES, PHOTO_TYPES } from '@yardcall/shared';
import type { Request, Response } from 'express';
import { ApiErrors, SignedInController } from '../common/api-docs';
import type { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../auth/decorators/current-user.decorator';
import { UuidParam } from '../common/uuid-param';
import { OBJECT_STORAGE, type ObjectStorage } from '../storage/object-storage';
import { serveObject } from '../uploads/serve-object';
import { NotesService } from './notes.service';

@SignedInController('', 'notes')
export class NotesController {
  constructor(
    private readonly notes: NotesService,
    @Inject(OBJECT_STORAGE) private readonly storage: ObjectStorage,
  ) {}

  @Get('notes/:id/audio')
  @ApiOperation({ summary: "A voice note's audio for anyone in its organisation, with HTTP Range support." })
  @ApiProduces(...NOTE_AUDIO_TYPES)
  @ApiOkResponse({ description: 'The whole recording.' })
  @ApiPartialContentResponse({ description: 'The byte range asked for, with Content-Range.' })
  @ApiErrors({ rangeNotSatisfiable: 'The range lies outside the recording.', notFound: true })
  async noteAudio(
    @CurrentUser() user: AuthUser,
    @UuidParam('id') id: string,
    @Req() request: Request,
    @Res({ passthrough: true }) response: Response,
  ): Promise<StreamableFile> {
    return serveObject(this.storage, request, response, await this.notes.voiceNoteAudio(user, id));
  }

  @Get('photos/:id')
  @ApiOperation({ summary: 'A photo for anyone in its organisation, with HTTP Range support.' })
  @ApiProduces(...PHOTO_TYPES)
  @ApiOkResponse({ description: 'The image.' })
  @ApiErrors({ notFound: true })
  async photo(
    @CurrentUser() user: AuthUser,
    @UuidParam('id') id: string,
    @Req() request: Request,
    @Res({ passthrough: true }) response: Response,
  ): Promise<StreamableFile> {
    return serveObject(this.storage, request, response, await this.notes.photoImage(user, id));
  }
}
