import {
  Body,
  Get,
  HttpCode,
  HttpStatus,
  Inject,
  Post,
  Put,
  Query,
  Req,
  Res,
  StreamableFile,
  UploadedFile,
} from '@nestjs/common';
import {
  ApiCreatedResponse,
  ApiOkResponse,
  ApiOperation,
  ApiPartialContentResponse,
  ApiProduces,
} from '@nestjs/swagger';
import {
  NOTE_AUDIO_TYPES,
  type PutTrainingSegmentsResponse,
  type TrainingAttemptListItem,
  type TrainingAttemptResponse,
  type TrainingProgress,
} from '@yardcall/shared';
import type { Request, Response } from 'express';
import { ApiErrors, SignedInController } from '../common/api-docs';
import type { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../auth/decorators/current-user.decorator';
import { Roles } from '../auth/decorators/roles.decorator';
import { UuidParam } from '../common/uuid-param';
import { serveObject } from '../uploads/serve-object';
import { formatBytes, UploadRoute } from '../uploads/upload.interceptor';
import { OBJECT_STORAGE, type ObjectStorage } from '../storage/object-storage';
import {
  CreateTrainingAttemptDto,
  FinishTrainingAttemptDto,
  ListTrainingAttemptsQuery,
  PutTrainingReviewDto,
  PutTrainingSegmentsDto,
  TrainingAudioUploadDto,
  TrainingProgressQuery,
} from './dto/training.dto';
import { PRACTICE_AUDIO_MEDIA, TrainingService } from './training.service';
import { answerIdempotentCreate } from '../common/idempotent-status';

const STUDENT_ONLY = 'A driver marked as a student, on their own attempt.';

@SignedInController('training')
export class TrainingController {
  constructor(
    private readonly training: TrainingService,
    @Inject(OBJECT_STORAGE) private readonly storage: ObjectStorage,
  ) {}

  @Post('attempts')
  @Roles('driver')
  @ApiOperation({
    summary: `Start a narrated practice walk-around. ${STUDENT_ONLY} Sent again with the same clientId, it answers the stored attempt (200).`,
  })
  @ApiCreatedResponse({ description: 'The new attempt; 200 with the same body when sent again.' })
  @ApiErrors({
    badRequest: true,
    forbidden: 'The driver is not marked as a student.',
    notFound: 'A vehicle is not in your organisation.',
  })
  async create(
    @CurrentUser() user: AuthUser,
    @Body() body: CreateTrainingAttemptDto,
    @Res({ passthrough: true }) response: Response,
  ): Promise<TrainingAttemptResponse> {
    const { created, attempt } = await this.training.create(user, body);
    answerIdempotentCreate(response, created);
    return attempt;
  }

  @Put('attempts/:id/segments')
  @Roles('driver')
  @ApiOperation({
    summary: `Add what the recogniser heard, in batches; segments are merged by seq, so a batch sent again changes nothing. ${STUDENT_ONLY}`,
  })
  @ApiOkResponse({ description: 'How many segments the attempt now holds.' })
  @ApiErrors({ badRequest: true, notFound: true, conflict: 'The attempt is finished and the batch changes it.' })
  putSegments(
    @CurrentUser() user: AuthUser,
    @UuidParam('id') id: string,
    @Body() body: PutTrainingSegmentsDto,
  ): Promise<PutTrainingSegmentsResponse> {
    return this.training.putSegments(user, id, body);
  }

  @Post('attempts/:id/audio')
  @Roles('driver')
  @UploadRoute(PRACTICE_AUDIO_MEDIA, { durationMs: { type: 'integer' } }, ['durationMs'])
  @ApiOperation({
    summary: `Add the attempt's recording. ${STUDENT_ONLY} Judged by its content (${PRACTICE_AUDIO_MEDIA.acceptedNames}, at most ${formatBytes(PRACTICE_AUDIO_MEDIA.maxBytes)}); the same file sent again answers 200.`,
  })
  @ApiCreatedResponse({ description: 'Stored; 200 with the same body when sent again.' })
  @ApiErrors({
    badRequest: 'Empty, not audio, or a field is wrong.',
    notFound: true,
    conflict: 'The attempt already has another recording.',
  })
  async addAudio(
    @CurrentUser() user: AuthUser,
    @UuidParam('id') id: string,
    @Body() body: TrainingAudioUploadDto,
    @UploadedFile() file: Express.Multer.File | undefined,
    @Res({ passthrough: true }) response: Response,
  ): Promise<TrainingAttemptResponse> {
    const { created, attempt } = await this.training.addAudio(user, id, body, file);
    answerIdempotentCreate(response, created);
    return attempt;
  }

  @Post('attempts/:id/finish')
  @Roles('driver')
  @HttpCode(HttpStatus.OK)
  @ApiOperation({
    summary: `Finish the attempt: the server scores the narration against the checklist (any score a client sends is refused). ${STUDENT_ONLY} Finishing again answers the stored attempt.`,
  })
  @ApiOkResponse({ description: 'The finished attempt with its score.' })
  @ApiErrors({ badRequest: true, notFound: true })
  finish(
    @CurrentUser() user: AuthUser,
    @UuidParam('id') id: string,
    @Body() body: FinishTrainingAttemptDto,
  ): Promise<TrainingAttemptResponse> {
    return this.training.finish(user, id, body);
  }

  @Get('attempts')
  @Roles('trainer', 'driver')
  @ApiOperation({ summary: "Practice attempts, newest first: a trainer sees every student's, a student their own." })
  @ApiOkResponse({ description: 'At most 200 attempts.' })
  list(@CurrentUser() user: AuthUser, @Query() query: ListTrainingAttemptsQuery): Promise<TrainingAttemptListItem[]> {
    return this.training.list(user, query);
  }

  @Get('attempts/:id')
  @Roles('trainer', 'driver')
  @ApiOperation({
    summary: 'One attempt with its checklist, segments, score and review: a trainer, or the student who made it.',
  })
  @ApiOkResponse({ description: 'The attempt.' })
  @ApiErrors({ notFound: true })
  get(@CurrentUser() user: AuthUser, @UuidParam('id') id: string): Promise<TrainingAttemptResponse> {
    return this.training.get(user, id);
  }

  @Get('attempts/:id/audio')
  @Roles('trainer', 'driver')
  @ApiOperation({ summary: "The attempt's recording with HTTP Range support: a trainer, or the student who made it." })
  @ApiProduces(...NOTE_AUDIO_TYPES)
  @ApiOkResponse({ description: 'The whole recording.' })
  @ApiPartialContentResponse({ description: 'The byte range asked for, with Content-Range.' })
  @ApiErrors({ rangeNotSatisfiable: 'The range lies outside the recording.', notFound: true })
  async audio(
    @CurrentUser() user: AuthUser,
    @UuidParam('id') id: string,
    @Req() request: Request,
    @Res({ passthrough: true }) response: Response,
  ): Promise<StreamableFile> {
    return serveObject(this.storage, request, response, await this.training.audio(user, id));
  }

  @Put('attempts/:id/review')
  @Roles('trainer')
  @ApiOperation({
    summary: 'Mark and comment each item, grade the attempt and comment it; saved again, it replaces the review.',
  })
  @ApiOkResponse({ description: 'The attempt with its review.' })
  @ApiErrors({ badRequest: true, notFound: true, conflict: 'The attempt is not finished yet.' })
  putReview(
    @CurrentUser() user: AuthUser,
    @UuidParam('id') id: string,
    @Body() body: PutTrainingReviewDto,
  ): Promise<TrainingAttemptResponse> {
    return this.training.putReview(user, id, body);
  }

  @Get('progress')
  @Roles('trainer', 'driver')
  @ApiOperation({ summary: "A student's finished attempts over time: a student their own, a trainer with ?studentId." })
  @ApiOkResponse({ description: 'Coverage and grade per finished attempt, oldest first.' })
  @ApiErrors({ badRequest: true, notFound: true })
  progress(@CurrentUser() user: AuthUser, @Query() query: TrainingProgressQuery): Promise<TrainingProgress> {
    return this.training.progress(user, query);
  }
}
