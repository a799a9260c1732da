import { Get, Res, StreamableFile } from '@nestjs/common';
import { ApiOkResponse, ApiOperation, ApiProduces } from '@nestjs/swagger';
import type { Response } from 'express';
import { ApiErrors, SignedInController } from '../common/api-docs';
import type { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../auth/decorators/current-user.decorator';
import { UuidParam } from '../common/uuid-param';
import { ReportsService } from '../reports/reports.service';
import { InspectionsService } from './inspections.service';

// The PDF of an inspection: InspectionsService finds one the caller may read, ReportsService draws it
// (tagged "reports" in the API document, as it always was).
@SignedInController('inspections', 'reports')
export class InspectionReportController {
  constructor(
    private readonly inspections: InspectionsService,
    private readonly reports: ReportsService,
  ) {}

  @Get(':id/report.pdf')
  @ApiOperation({
    // The operation id this route had before it moved here: the API document stays the same.
    operationId: 'ReportsController_report',
    summary:
      'The inspection report as PDF: vehicles, driver, times, every defect with its measurement and limit, repairs and signatures.',
  })
  @ApiProduces('application/pdf')
  @ApiOkResponse({ description: 'The PDF.' })
  @ApiErrors({ notFound: true })
  async report(
    @CurrentUser() user: AuthUser,
    @UuidParam('id') id: string,
    @Res({ passthrough: true }) response: Response,
  ): Promise<StreamableFile> {
    const { pdf, filename } = await this.reports.render(user, await this.inspections.get(user, id));
    // A report changes when repairs or the next driver's signature are added: never cache it.
    response.setHeader('Cache-Control', 'no-store');
    return new StreamableFile(pdf, {
      type: 'application/pdf',
      length: pdf.length,
      disposition: `inline; filename="${filename}"`,
    });
  }
}
