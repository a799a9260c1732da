import { Global, Module } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { AppEnv } from '../config/env.validation';
import { LocalObjectStorage } from './local-object-storage';
import { OBJECT_STORAGE, type ObjectStorage } from './object-storage';
import { createS3Client, S3ObjectStorage } from './s3-object-storage';

// The configured ObjectStorage for every module that keeps files (voice notes, photos).
@Global()
@Module({
  providers: [
    {
      provide: OBJECT_STORAGE,
      inject: [ConfigService],
      useFactory: async (config: ConfigService<AppEnv, true>): Promise<ObjectStorage> => {
        const settings = config.get('STORAGE', { infer: true });
        if (settings.driver === 's3') return new S3ObjectStorage(createS3Client(settings), settings.bucket);
        const local = new LocalObjectStorage(settings.dir);
        await local.ensureRoot();
        return local;
      },
    },
  ],
  exports: [OBJECT_STORAGE],
})
export class StorageModule {}
