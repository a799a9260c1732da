import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { InspectionsModule } from '../inspections/inspections.module';
import { Vehicle } from './entities/vehicle.entity';
import { VehicleAcknowledgementsController } from './vehicle-acknowledgements.controller';
import { VehiclesController } from './vehicles.controller';
import { VehiclesService } from './vehicles.service';

// Every /vehicles route; the pending acknowledgement comes from InspectionsModule.
@Module({
  imports: [TypeOrmModule.forFeature([Vehicle]), InspectionsModule],
  controllers: [VehiclesController, VehicleAcknowledgementsController],
  providers: [VehiclesService],
  exports: [VehiclesService],
})
export class VehiclesModule {}
