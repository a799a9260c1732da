import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { DefectsModule } from '../defects/defects.module';
import { User } from '../users/entities/user.entity';
import { Vehicle } from '../vehicles/entities/vehicle.entity';
import { AcknowledgementsService } from './acknowledgements.service';
import { InspectionVehicle } from './entities/inspection-vehicle.entity';
import { Inspection } from './entities/inspection.entity';
import { ItemResult } from './entities/item-result.entity';
import { Signature } from './entities/signature.entity';
import { InspectionAttachmentsRegistry } from './inspection-attachments';
import { InspectionsController, VehicleAcknowledgementsController } from './inspections.controller';
import { InspectionsService } from './inspections.service';
import { InspectionChecklists } from './inspection-checklists';
import { InspectionListService } from './inspection-list.service';
import { InspectionResultsService } from './inspection-results.service';

@Module({
  imports: [
    TypeOrmModule.forFeature([Inspection, InspectionVehicle, ItemResult, Signature, Vehicle, User]),
    DefectsModule,
  ],
  controllers: [InspectionsController, VehicleAcknowledgementsController],
  providers: [
    InspectionsService,
    InspectionResultsService,
    InspectionListService,
    InspectionChecklists,
    AcknowledgementsService,
    InspectionAttachmentsRegistry,
  ],
  // Notes and photos register with the registry and check access through InspectionsService.findEditable/findReadable.
  exports: [InspectionsService, InspectionAttachmentsRegistry],
})
export class InspectionsModule {}
