import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { User } from '../users/entities/user.entity';
import { Vehicle } from '../vehicles/entities/vehicle.entity';
import { TrainingAttempt } from './entities/training-attempt.entity';
import { TrainingReview } from './entities/training-review.entity';
import { TrainingController } from './training.controller';
import { TrainingService } from './training.service';

// Students' narrated practice walk-arounds and their trainers' reviews; recordings through the global StorageModule.
@Module({
  imports: [TypeOrmModule.forFeature([TrainingAttempt, TrainingReview, Vehicle, User])],
  controllers: [TrainingController],
  providers: [TrainingService],
})
export class TrainingModule {}
