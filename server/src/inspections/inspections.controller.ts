import { Body, Get, HttpCode, Post, Put, Query, Res } from '@nestjs/common';
import { ApiCreatedResponse, ApiOkResponse, ApiOperation, ApiProduces } from '@nestjs/swagger';
import { INSPECTION_CSV_COLUMNS, INSPECTION_CSV_MAX_ROWS } from '@yardcall/shared';
import type { InspectionPage, InspectionResponse, PutResultsResponse, SignatureResponse } from '@yardcall/shared';
import type { Response } from 'express';
import { ApiErrors, SignedInController } from '../common/api-docs';
import type { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../auth/decorators/current-user.decorator';
import { Roles } from '../auth/decorators/roles.decorator';
import { UuidParam } from '../common/uuid-param';
import { AcknowledgementsService } from './acknowledgements.service';
import {
  AcknowledgeDto,
  CreateInspectionDto,
  InspectionPageDto,
  InspectionResponseDto,
  ListInspectionsQuery,
  SubmitInspectionDto,
} from './dto/inspection.dto';
import { PutResultsDto, PutResultsResponseDto } from './dto/result.dto';
import { SignatureResponseDto } from './dto/signature.dto';
import { CSV_BOM, csvHeader, csvRows } from './inspections-csv';
import { InspectionListService } from './inspection-list.service';
import { InspectionResultsService } from './inspection-results.service';
import { InspectionsService } from './inspections.service';
import { answerIdempotentCreate } from '../common/idempotent-status';

@SignedInController('inspections')
export class InspectionsController {
  constructor(
    private readonly inspections: InspectionsService,
    private readonly results: InspectionResultsService,
    private readonly listing: InspectionListService,
    private readonly acknowledgements: AcknowledgementsService,
  ) {}

  @Post()
  @Roles('driver')
  @ApiOperation({
    summary:
      'Start a walk-around of a power unit and its trailers; answers the checklist the server built. A retry with the same clientId answers the same inspection (200).',
  })
  @ApiCreatedResponse({ type: InspectionResponseDto })
  @ApiOkResponse({ type: InspectionResponseDto, description: 'This clientId was already used: the same inspection.' })
  @ApiErrors({
    badRequest: 'Each wrong field is named; a wrong combination too.',
    notFound: true,
    conflict: 'The last report waits for the next driver’s review.',
  })
  async create(
    @CurrentUser() user: AuthUser,
    @Body() body: CreateInspectionDto,
    @Res({ passthrough: true }) response: Response,
  ): Promise<InspectionResponse> {
    const { created, inspection } = await this.inspections.create(user, body);
    answerIdempotentCreate(response, created);
    return inspection;
  }

  @Get()
  @ApiOperation({
    summary:
      'Inspections newest first unless sorted otherwise, one page at a time (cursor), with filters. Drivers see their own, trainers practice ones, the others all of the organisation.',
  })
  @ApiOkResponse({ type: InspectionPageDto })
  @ApiErrors({ badRequest: true })
  list(@CurrentUser() user: AuthUser, @Query() query: ListInspectionsQuery): Promise<InspectionPage> {
    return this.listing.list(user, query);
  }

  @Get('export.csv')
  @Roles('supervisor', 'admin')
  @ApiOperation({
    summary: `The list as CSV (UTF-8, RFC 4180) with the same filters and sort, up to ${INSPECTION_CSV_MAX_ROWS} rows; columns: ${INSPECTION_CSV_COLUMNS.join(', ')}.`,
  })
  @ApiProduces('text/csv')
  @ApiOkResponse({ description: 'An attachment: inspections-<date>.csv.' })
  @ApiErrors({ badRequest: true })
  async exportCsv(
    @CurrentUser() user: AuthUser,
    @Query() query: ListInspectionsQuery,
    @Res() response: Response,
  ): Promise<void> {
    const pages = this.listing.listAll(user, query, INSPECTION_CSV_MAX_ROWS);
    // The first page before any byte is sent, so a wrong filter still answers a plain 400.
    const first = await pages.next();
    const day = new Date().toISOString().slice(0, 10);
    response.status(200).set({
      'Content-Type': 'text/csv; charset=utf-8',
      'Content-Disposition': `attachment; filename="inspections-${day}.csv"`,
      'Cache-Control': 'no-store',
    });
    response.write(CSV_BOM + csvHeader());
    try {
      if (!first.done) response.write(csvRows(first.value));
      for await (const items of pages) response.write(csvRows(items));
      response.end();
    } catch {
      // Half a file must not pass for a whole one: break the connection.
      response.destroy();
    }
  }

  @Get(':id')
  @ApiOperation({ summary: 'One inspection: checklist, answers, notes, photos, defects, signatures and summary.' })
  @ApiOkResponse({ type: InspectionResponseDto })
  @ApiErrors({ notFound: true })
  get(@CurrentUser() user: AuthUser, @UuidParam('id') id: string): Promise<InspectionResponse> {
    return this.inspections.get(user, id);
  }

  @Put(':id/results')
  @Roles('driver')
  @ApiOperation({
    summary:
      'Store a batch of answers (idempotent on clientId; the latest answeredAt of an item wins). The server re-evaluates every measurement.',
  })
  @ApiOkResponse({ type: PutResultsResponseDto })
  @ApiErrors({
    badRequest: 'Item keys not on the checklist are named.',
    notFound: true,
    conflict: 'The report is submitted.',
  })
  async putResults(
    @CurrentUser() user: AuthUser,
    @UuidParam('id') id: string,
    @Body() body: PutResultsDto,
  ): Promise<PutResultsResponse> {
    return { results: await this.results.putResults(user, id, body) };
  }

  @Post(':id/submit')
  @Roles('driver')
  @HttpCode(200)
  @ApiOperation({
    summary:
      'Sign and submit the report: opens a defect per finding and takes vehicles with a safety defect out of service.',
  })
  @ApiOkResponse({ type: InspectionResponseDto })
  @ApiErrors({ badRequest: true, notFound: true, conflict: 'Already submitted.' })
  submit(
    @CurrentUser() user: AuthUser,
    @UuidParam('id') id: string,
    @Body() body: SubmitInspectionDto,
  ): Promise<InspectionResponse> {
    return this.inspections.submit(user, id, body);
  }

  @Post(':id/acknowledge')
  @Roles('driver')
  @ApiOperation({ summary: "The next driver's signature: they reviewed the report and its repair certifications." })
  @ApiCreatedResponse({ type: SignatureResponseDto })
  @ApiErrors({ badRequest: true, notFound: true, conflict: 'Nothing waits for an acknowledgement.' })
  acknowledge(
    @CurrentUser() user: AuthUser,
    @UuidParam('id') id: string,
    @Body() body: AcknowledgeDto,
  ): Promise<SignatureResponse> {
    return this.acknowledgements.acknowledge(user, id, body);
  }
}
