import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { DefectsController } from './defects.controller';
import { DefectsService } from './defects.service';
import { Defect } from './entities/defect.entity';
import { Repair } from './entities/repair.entity';

@Module({
  imports: [TypeOrmModule.forFeature([Defect, Repair])],
  controllers: [DefectsController],
  providers: [DefectsService],
})
export class DefectsModule {}
