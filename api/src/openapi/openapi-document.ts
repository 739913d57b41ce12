// The OpenAPI document of the API: served at /api/docs and the source the client's types are
// generated from (`npm run api:types` writes pwa/src/lib/api-types.ts). Every route describes
// its 2xx answer with a response class from its domain's dto/*-response.dto.ts
// (openapi-document.spec.ts fails on a route that does not).
import type { INestApplication } from '@nestjs/common';
import { DocumentBuilder, SwaggerModule, type OpenAPIObject } from '@nestjs/swagger';
import { createApp } from '../app.factory.js';
import { loadConfig } from '../config/config.js';

export function buildOpenApiDocument(app: INestApplication): OpenAPIObject {
  const info = new DocumentBuilder()
    .setTitle('Plumbline API')
    .setDescription('Fieldwork projects, quota cells, interviews, balance and benchmarks')
    .setVersion('0.1.0')
    .addBearerAuth()
    .build();
  return SwaggerModule.createDocument(app, info);
}

/**
 * The document of the whole app, built without a server or a database: the app is created
 * (which opens no connection) but never listens or initialises, and is closed again.
 */
export async function openApiDocumentOfApp(): Promise<OpenAPIObject> {
  const config = loadConfig({
    DATABASE_URL: 'postgres://document-only@127.0.0.1:1/none',
    JWT_SECRET: 'only-for-building-the-openapi-document',
    SMTP_URL: 'smtp://127.0.0.1:1',
    RUN_JOBS: 'false',
    LOG_LEVEL: 'silent',
  });
  const app = await createApp(config);
  try {
    return buildOpenApiDocument(app);
  } finally {
    await app.close();
  }
}
