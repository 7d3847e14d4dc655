import 'reflect-metadata';
import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { Logger } from 'nestjs-pino';
import { AppModule } from './app.module';
import { configureApp, NEST_APP_OPTIONS } from './app.setup';
import { AppConfig } from './config/app-config';

async function bootstrap(): Promise<void> {
  const app = await NestFactory.create<NestExpressApplication>(AppModule, {
    ...NEST_APP_OPTIONS,
    bufferLogs: true,
  });
  configureApp(app);
  const config = app.get(AppConfig);
  await app.listen(config.port, config.host);
  // Through the logger, so standard output stays one JSON object per line.
  app
    .get(Logger)
    .log(
      `Pondwright listens on http://${config.host}:${config.port} (API under /api, docs at /api/docs)`,
      'Server',
    );
}

bootstrap().catch((error: unknown) => {
  console.error('[server] failed to start:', error instanceof Error ? error.message : error);
  process.exit(1);
});
