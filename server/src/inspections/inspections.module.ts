import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { DefectsModule } from '../defects/defects.module';
import { NotesModule } from '../notes/notes.module';
import { ReportsModule } from '../reports/reports.module';
import { User } from '../users/entities/user.entity';
import { Vehicle } from '../vehicles/entities/vehicle.entity';
import { AcknowledgementsService } from './acknowledgements.service';
import { InspectionVehicle } from './entities/inspection-vehicle.entity';
import { Inspection } from './entities/inspection.entity';
import { ItemResult } from './entities/item-result.entity';
import { Signature } from './entities/signature.entity';
import { InspectionAttachmentsController } from './inspection-attachments.controller';
import { InspectionChecklists } from './inspection-checklists';
import { InspectionListService } from './inspection-list.service';
import { InspectionReportController } from './inspection-report.controller';
import { InspectionResultsService } from './inspection-results.service';
import { InspectionsController } from './inspections.controller';
import { InspectionsService } from './inspections.service';

// Every /inspections route. Notes and photos are kept by NotesModule, defects opened by DefectsModule,
// the PDF drawn by ReportsModule; none of them imports this module.
@Module({
  imports: [
    TypeOrmModule.forFeature([Inspection, InspectionVehicle, ItemResult, Signature, Vehicle, User]),
    DefectsModule,
    NotesModule,
    ReportsModule,
  ],
  controllers: [InspectionsController, InspectionAttachmentsController, InspectionReportController],
  providers: [
    InspectionsService,
    InspectionResultsService,
    InspectionListService,
    InspectionChecklists,
    AcknowledgementsService,
  ],
  // The next driver's acknowledgement is also asked for under /vehicles (VehiclesModule).
  exports: [AcknowledgementsService],
})
export class InspectionsModule {}
