import { Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { AppModule } from './app.module';
import { configureApp } from './app.setup';
import type { AppEnv } from './config/env.validation';

async function bootstrap(): Promise<void> {
  // abortOnError false: a boot error (e.g. a bad environment variable) rejects instead of aborting the process.
  const app = await NestFactory.create<NestExpressApplication>(AppModule, { abortOnError: false });
  configureApp(app);
  // SIGINT/SIGTERM run the destroy hooks: the database pool and the SMTP catcher close.
  app.enableShutdownHooks();
  const config = app.get<ConfigService<AppEnv, true>>(ConfigService);
  const host = config.get('HOST', { infer: true });
  const port = config.get('PORT', { infer: true });
  await app.listen(port, host);
  new Logger('Yardcall').log(`Listening on ${await app.getUrl()} (API under /api, docs at /api/docs).`);
}

bootstrap().catch((error: unknown) => {
  // Config errors are sentences naming the variable; print them without a stack.
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
