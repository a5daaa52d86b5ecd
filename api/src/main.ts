import { ConsoleLogger } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { AppModule } from './app.module';
import { configureApp } from './app.setup';
import { ConfigError, loadConfig } from './config/app-config';

/** Starts the API and the PWA on one port. */
async function bootstrap(): Promise<void> {
  // Validate first, so a bad environment prints its problems instead of a Nest stack trace.
  let config;
  try {
    config = loadConfig(process.env);
  } catch (error) {
    if (error instanceof ConfigError) {
      console.error(error.message);
      process.exit(1);
    }
    throw error;
  }

  const app = await NestFactory.create<NestExpressApplication>(AppModule, {
    logger: new ConsoleLogger({ json: true, colors: false }),
    abortOnError: false,
  });
  configureApp(app);
  const host = process.env.HOST || '127.0.0.1';
  await app.listen(config.port, host);
  const logger = new ConsoleLogger('Bootstrap', { json: true, colors: false });
  logger.log(`Siteband API on http://${host}:${config.port}/api (docs at /api/docs, PWA from ${config.pwaDist})`);
  if (config.jwt.secretSource === 'file') logger.warn(`JWT_SECRET is unset: using the development secret in ${config.dataDir}/jwt-secret`);
}

bootstrap().catch((error: unknown) => {
  console.error('Siteband API failed to start:', error instanceof Error ? error.message : error);
  process.exit(1);
});
