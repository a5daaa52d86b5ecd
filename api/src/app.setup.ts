import type { NestExpressApplication } from '@nestjs/platform-express';
import { JSON_BODY_LIMIT_BYTES } from './common/body-limit';
import { createSpaMiddleware } from './common/spa';
import { ApiExceptionFilter } from './common/api-exception.filter';
import { setupOpenApi } from './common/openapi';
import { createRequestLogger } from './common/request-logger';
import { createSecurityHeaders } from './common/security-headers';
import { createValidationPipe } from './common/validation';
import type { AppConfig } from './config/app-config';
import { APP_CONFIG } from './config/config.module';
import { API_VERSION } from './config/version';

/** Every route of the API lives under this prefix; everything else is the PWA. */
export const API_PREFIX = 'api';

/**
 * Everything `main.ts` sets up around the modules — logging, security headers, CORS, the /api prefix,
 * validation, the error shape, OpenAPI and the PWA — in one place, so e2e tests run the same app.
 * Call before `app.init()` / `app.listen()`.
 */
export function configureApp(app: NestExpressApplication): NestExpressApplication {
  const config = app.get<AppConfig>(APP_CONFIG);
  // Order matters: the request id must exist before anything can fail.
  app.use(createRequestLogger(config.logLevel));
  app.use(createSecurityHeaders());
  app.useBodyParser('json', { limit: JSON_BODY_LIMIT_BYTES });
  app.enableCors({
    origin: config.corsOrigins,
    methods: ['GET', 'HEAD', 'POST', 'PATCH', 'PUT', 'DELETE'],
    allowedHeaders: ['Authorization', 'Content-Type', 'Content-Range', 'X-Request-Id'],
    exposedHeaders: ['X-Request-Id', 'Retry-After'],
    maxAge: 600,
  });
  app.setGlobalPrefix(API_PREFIX);
  app.useGlobalPipes(createValidationPipe());
  app.useGlobalFilters(new ApiExceptionFilter());
  setupOpenApi(app, API_VERSION);
  app.use(createSpaMiddleware(config.pwaDist, `/${API_PREFIX}`));
  app.enableShutdownHooks();
  return app;
}
