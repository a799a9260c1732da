import { Global, Module } from '@nestjs/common';
import { JobsService } from './jobs.service';

// Global: any feature may send or work jobs.
@Global()
@Module({
  providers: [JobsService],
  exports: [JobsService],
})
export class JobsModule {}
