import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { Signature } from '../inspections/entities/signature.entity';
import { Organization } from '../organizations/entities/organization.entity';
import { Vehicle } from '../vehicles/entities/vehicle.entity';
import { ReportsService } from './reports.service';

// Draws an inspection's PDF; InspectionsModule serves it at /inspections/:id/report.pdf.
@Module({
  imports: [TypeOrmModule.forFeature([Organization, Vehicle, Signature])],
  providers: [ReportsService],
  exports: [ReportsService],
})
export class ReportsModule {}
