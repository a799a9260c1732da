import { Module } from '@nestjs/common';
import { ReportsService } from './reports.service';

// Draws an inspection's PDF; InspectionsModule serves it at /inspections/:id/report.pdf.
@Module({
  providers: [ReportsService],
  exports: [ReportsService],
})
export class ReportsModule {}
