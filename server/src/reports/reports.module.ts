import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { Signature } from '../inspections/entities/signature.entity';
import { InspectionsModule } from '../inspections/inspections.module';
import { Organization } from '../organizations/entities/organization.entity';
import { Vehicle } from '../vehicles/entities/vehicle.entity';
import { ReportsController } from './reports.controller';
import { ReportsService } from './reports.service';

@Module({
  imports: [TypeOrmModule.forFeature([Organization, Vehicle, Signature]), InspectionsModule],
  controllers: [ReportsController],
  providers: [ReportsService],
})
export class ReportsModule {}
