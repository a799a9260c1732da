import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { DefectsController } from './defects.controller';
import { DefectsService } from './defects.service';
import { DemoOutbox } from './demo-outbox';
import { Defect } from './entities/defect.entity';
import { Repair } from './entities/repair.entity';
import { SafetyDefectAlerts } from './safety-defect-alerts';
import { MailModule } from '../mail/mail.module';

@Module({
  imports: [TypeOrmModule.forFeature([Defect, Repair]), MailModule],
  controllers: [DefectsController],
  providers: [DefectsService, SafetyDefectAlerts, DemoOutbox],
  // Inspections open a submitted report's defects through DefectsService.openFromReport.
  exports: [DefectsService],
})
export class DefectsModule {}
