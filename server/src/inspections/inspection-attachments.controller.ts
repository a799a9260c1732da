import { Body, Post, Res, UploadedFile } from '@nestjs/common';
import { ApiCreatedResponse, ApiOperation } from '@nestjs/swagger';
import type { PhotoResponse, VoiceNoteResponse } from '@yardcall/shared';
import type { Response } from 'express';
import { ApiErrors, SignedInController } from '../common/api-docs';
import type { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../auth/decorators/current-user.decorator';
import { Roles } from '../auth/decorators/roles.decorator';
import { UuidParam } from '../common/uuid-param';
import { PhotoResponseDto, PhotoUploadDto, VoiceNoteResponseDto, VoiceNoteUploadDto } from '../notes/dto/upload.dto';
import { NotesService, type UploadResult } from '../notes/notes.service';
import { PHOTO_MEDIA, VOICE_NOTE_MEDIA } from '../uploads/media-types';
import { formatBytes, UploadRoute } from '../uploads/upload.interceptor';
import { InspectionsService } from './inspections.service';
import { answerIdempotentCreate } from '../common/idempotent-status';

const ITEM_FIELDS = { itemKey: { type: 'string' }, clientId: { type: 'string' } };

function answer<T>(response: Response, result: UploadResult<T>): T {
  answerIdempotentCreate(response, result.created);
  return result.record;
}

// Voice notes and photos added to a walk-around: the inspections module finds the caller's inspection,
// the notes module keeps the files (tagged "notes" in the API document, as they always were).
@SignedInController('inspections', 'notes')
export class InspectionAttachmentsController {
  constructor(
    private readonly inspections: InspectionsService,
    private readonly notes: NotesService,
  ) {}

  @Post(':id/notes')
  @Roles('driver')
  @UploadRoute(VOICE_NOTE_MEDIA, { ...ITEM_FIELDS, durationMs: { type: 'integer' }, heard: { type: 'string' } }, [
    'itemKey',
    'clientId',
    'durationMs',
  ])
  @ApiOperation({
    // The operation ids these routes had before they moved here: the API document stays the same.
    operationId: 'NotesController_addNote',
    summary: `Add a voice note at a checklist item: the inspection's driver, while it is in progress. The audio is judged by its content (${VOICE_NOTE_MEDIA.acceptedNames}, at most ${formatBytes(VOICE_NOTE_MEDIA.maxBytes)}). Sent again with the same clientId, it answers the stored note.`,
  })
  @ApiCreatedResponse({ type: VoiceNoteResponseDto, description: 'Stored; 200 with the same body when sent again.' })
  @ApiErrors({
    badRequest: 'Empty, not audio, or a field is wrong.',
    notFound: "No such inspection of the caller's own.",
    conflict: 'Submitted already, or the clientId names another file.',
  })
  async addNote(
    @CurrentUser() user: AuthUser,
    @UuidParam('id') id: string,
    @Body() body: VoiceNoteUploadDto,
    @UploadedFile() file: Express.Multer.File | undefined,
    @Res({ passthrough: true }) response: Response,
  ): Promise<VoiceNoteResponse> {
    return answer(
      response,
      await this.notes.addVoiceNote(await this.inspections.findAttachmentTarget(user, id), body, file),
    );
  }

  @Post(':id/photos')
  @Roles('driver')
  @UploadRoute(PHOTO_MEDIA, ITEM_FIELDS, ['itemKey', 'clientId'])
  @ApiOperation({
    operationId: 'NotesController_addPhoto',
    summary: `Add a photo at a checklist item: the inspection's driver, while it is in progress. The image is judged by its content (${PHOTO_MEDIA.acceptedNames}, at most ${formatBytes(PHOTO_MEDIA.maxBytes)}). Sent again with the same clientId, it answers the stored photo.`,
  })
  @ApiCreatedResponse({ type: PhotoResponseDto, description: 'Stored; 200 with the same body when sent again.' })
  @ApiErrors({
    badRequest: 'Empty, not an image we take, or a field is wrong.',
    notFound: "No such inspection of the caller's own.",
    conflict: 'Submitted already, or the clientId names another file.',
  })
  async addPhoto(
    @CurrentUser() user: AuthUser,
    @UuidParam('id') id: string,
    @Body() body: PhotoUploadDto,
    @UploadedFile() file: Express.Multer.File | undefined,
    @Res({ passthrough: true }) response: Response,
  ): Promise<PhotoResponse> {
    return answer(
      response,
      await this.notes.addPhoto(await this.inspections.findAttachmentTarget(user, id), body, file),
    );
  }
}
