import {
  Body,
  Controller,
  Get,
  HttpStatus,
  Inject,
  Post,
  Req,
  Res,
  StreamableFile,
  UploadedFile,
  UseInterceptors,
} from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiBody,
  ApiConflictResponse,
  ApiConsumes,
  ApiCreatedResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiOperation,
  ApiPartialContentResponse,
  ApiPayloadTooLargeResponse,
  ApiProduces,
  ApiResponse,
  ApiTags,
} from '@nestjs/swagger';
import { NOTE_AUDIO_TYPES, PHOTO_TYPES, type PhotoResponse, type VoiceNoteResponse } from '@yardcall/shared';
import type { Request, Response } from 'express';
import type { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../auth/decorators/current-user.decorator';
import { Roles } from '../auth/decorators/roles.decorator';
import { ApiErrorBodyDto } from '../common/dto/api-error-body.dto';
import { UuidParam } from '../common/uuid-param';
import { OBJECT_STORAGE, type ObjectStorage } from '../storage/object-storage';
import { PhotoResponseDto, PhotoUploadDto, VoiceNoteResponseDto, VoiceNoteUploadDto } from './dto/upload.dto';
import { PHOTO_MEDIA, VOICE_NOTE_MEDIA } from '../uploads/media-types';
import { NotesService, type UploadResult } from './notes.service';
import { serveObject } from '../uploads/serve-object';
import { formatBytes, multipartBody, UploadInterceptor } from '../uploads/upload.interceptor';

const ITEM_FIELDS = { itemKey: { type: 'string' }, clientId: { type: 'string' } };

// 201 for a new upload, 200 when the same clientId had already stored it.
function answer<T>(response: Response, result: UploadResult<T>): T {
  response.status(result.created ? HttpStatus.CREATED : HttpStatus.OK);
  return result.record;
}

@ApiTags('notes')
@ApiBearerAuth()
@Controller()
export class NotesController {
  constructor(
    private readonly notes: NotesService,
    @Inject(OBJECT_STORAGE) private readonly storage: ObjectStorage,
  ) {}

  @Post('inspections/:id/notes')
  @Roles('driver')
  @UseInterceptors(UploadInterceptor(VOICE_NOTE_MEDIA))
  @ApiOperation({
    summary: `Add a voice note at a checklist item: the inspection's driver, while it is in progress. The audio is judged by its content (${VOICE_NOTE_MEDIA.acceptedNames}, at most ${formatBytes(VOICE_NOTE_MEDIA.maxBytes)}). Sent again with the same clientId, it answers the stored note.`,
  })
  @ApiConsumes('multipart/form-data')
  @ApiBody(
    multipartBody({ ...ITEM_FIELDS, durationMs: { type: 'integer' }, heard: { type: 'string' } }, [
      'itemKey',
      'clientId',
      'durationMs',
    ]),
  )
  @ApiCreatedResponse({ type: VoiceNoteResponseDto, description: 'Stored; 200 with the same body when sent again.' })
  @ApiBadRequestResponse({ type: ApiErrorBodyDto, description: 'Empty, not audio, or a field is wrong.' })
  @ApiPayloadTooLargeResponse({ type: ApiErrorBodyDto })
  @ApiNotFoundResponse({ type: ApiErrorBodyDto, description: "No such inspection of the caller's own." })
  @ApiConflictResponse({ type: ApiErrorBodyDto, description: 'Submitted already, or the clientId names another file.' })
  async addNote(
    @CurrentUser() user: AuthUser,
    @UuidParam('id') id: string,
    @Body() body: VoiceNoteUploadDto,
    @UploadedFile() file: Express.Multer.File | undefined,
    @Res({ passthrough: true }) response: Response,
  ): Promise<VoiceNoteResponse> {
    return answer(response, await this.notes.addVoiceNote(user, id, body, file));
  }

  @Get('notes/:id/audio')
  @ApiOperation({ summary: "A voice note's audio for anyone in its organisation, with HTTP Range support." })
  @ApiProduces(...NOTE_AUDIO_TYPES)
  @ApiOkResponse({ description: 'The whole recording.' })
  @ApiPartialContentResponse({ description: 'The byte range asked for, with Content-Range.' })
  @ApiResponse({ status: 416, type: ApiErrorBodyDto, description: 'The range lies outside the recording.' })
  @ApiNotFoundResponse({ type: ApiErrorBodyDto })
  async noteAudio(
    @CurrentUser() user: AuthUser,
    @UuidParam('id') id: string,
    @Req() request: Request,
    @Res({ passthrough: true }) response: Response,
  ): Promise<StreamableFile> {
    return serveObject(this.storage, request, response, await this.notes.voiceNoteAudio(user, id));
  }

  @Post('inspections/:id/photos')
  @Roles('driver')
  @UseInterceptors(UploadInterceptor(PHOTO_MEDIA))
  @ApiOperation({
    summary: `Add a photo at a checklist item: the inspection's driver, while it is in progress. The image is judged by its content (${PHOTO_MEDIA.acceptedNames}, at most ${formatBytes(PHOTO_MEDIA.maxBytes)}). Sent again with the same clientId, it answers the stored photo.`,
  })
  @ApiConsumes('multipart/form-data')
  @ApiBody(multipartBody(ITEM_FIELDS, ['itemKey', 'clientId']))
  @ApiCreatedResponse({ type: PhotoResponseDto, description: 'Stored; 200 with the same body when sent again.' })
  @ApiBadRequestResponse({ type: ApiErrorBodyDto, description: 'Empty, not an image we take, or a field is wrong.' })
  @ApiPayloadTooLargeResponse({ type: ApiErrorBodyDto })
  @ApiNotFoundResponse({ type: ApiErrorBodyDto, description: "No such inspection of the caller's own." })
  @ApiConflictResponse({ type: ApiErrorBodyDto, description: 'Submitted already, or the clientId names another file.' })
  async addPhoto(
    @CurrentUser() user: AuthUser,
    @UuidParam('id') id: string,
    @Body() body: PhotoUploadDto,
    @UploadedFile() file: Express.Multer.File | undefined,
    @Res({ passthrough: true }) response: Response,
  ): Promise<PhotoResponse> {
    return answer(response, await this.notes.addPhoto(user, id, body, file));
  }

  @Get('photos/:id')
  @ApiOperation({ summary: 'A photo for anyone in its organisation, with HTTP Range support.' })
  @ApiProduces(...PHOTO_TYPES)
  @ApiOkResponse({ description: 'The image.' })
  @ApiNotFoundResponse({ type: ApiErrorBodyDto })
  async photo(
    @CurrentUser() user: AuthUser,
    @UuidParam('id') id: string,
    @Req() request: Request,
    @Res({ passthrough: true }) response: Response,
  ): Promise<StreamableFile> {
    return serveObject(this.storage, request, response, await this.notes.photoImage(user, id));
  }
}
