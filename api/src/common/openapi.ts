import type { INestApplication } from '@nestjs/common';
import { DocumentBuilder, SwaggerModule } from '@nestjs/swagger';

/** Where the docs live: the UI at /api/docs, the JSON at /api/docs-json. */
export const OPENAPI_PATH = 'api/docs';

/** Builds the OpenAPI document from the controllers and serves it with Swagger UI. */
export function setupOpenApi(app: INestApplication, version: string): void {
  const document = SwaggerModule.createDocument(
    app,
    new DocumentBuilder()
      .setTitle('Siteband API')
      .setDescription(
        'Accounts, sign-in and the field data of Siteband. Every route needs `Authorization: Bearer <accessToken>` ' +
          'except sign-in, refresh and health. Errors share one shape (ErrorResponseDto).',
      )
      .setVersion(version)
      .addBearerAuth({ type: 'http', scheme: 'bearer', bearerFormat: 'JWT' })
      .build(),
  );
  SwaggerModule.setup(OPENAPI_PATH, app, document, { customSiteTitle: 'Siteband API' });
}
