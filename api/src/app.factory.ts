import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { SwaggerModule } from '@nestjs/swagger';
import express from 'express';
import helmet from 'helmet';
import { Logger } from 'nestjs-pino';
import type { DestinationStream } from 'pino';
import { AppModule } from './app.module.js';
import { bodyErrorHandler } from './common/middleware/body-errors.js';
import { bodyShape } from './common/middleware/body-shape.js';
import { hsts } from './common/middleware/hsts.js';
import { pwaFiles } from './common/middleware/pwa-files.js';
import { readBulkhead } from './common/middleware/read-bulkhead.js';
import { createValidationPipe } from './common/validation.js';
import { buildOpenApiDocument } from './openapi/openapi-document.js';
import type { AppConfig } from './config/config.js';

/** Builds the whole application; main.ts and the end-to-end tests share it. */
export async function createApp(config: AppConfig, logStream?: DestinationStream): Promise<NestExpressApplication> {
  const app = await NestFactory.create<NestExpressApplication>(AppModule.forRoot(config, logStream), {
    bodyParser: false,
    bufferLogs: true,
  });
  app.useLogger(app.get(Logger));
  // Off unless TRUST_PROXY names the proxies in front (config/trust-proxy.ts).
  app.set('trust proxy', config.trustProxy);
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          'default-src': ["'self'"],
          'script-src': ["'self'"],
          'style-src': ["'self'", "'unsafe-inline'"],
          'img-src': ["'self'", 'data:'],
          'font-src': ["'self'"],
          'connect-src': ["'self'"],
          'worker-src': ["'self'"],
          'manifest-src': ["'self'"],
          // Served over plain HTTP on a LAN too: never rewrite requests to https.
          'upgrade-insecure-requests': null,
        },
      },
      // Sent by common/middleware/hsts.ts, and only over HTTPS.
      strictTransportSecurity: false,
    }),
  );
  app.use(hsts(config.tlsInFront));
  if (config.pwaDist) app.use(pwaFiles(config.pwaDist));
  // Four reads at a time keep both cores busy while a sync never waits behind a crowd of polls.
  app.use(readBulkhead(4));
  app.use(express.json({ limit: config.bodyLimit }));
  app.use(bodyErrorHandler);
  // Deep or wide bodies are refused before validation walks them.
  app.use(bodyShape);
  app.setGlobalPrefix('api');
  app.useGlobalPipes(createValidationPipe());
  app.enableShutdownHooks();

  // The OpenAPI page and document at /api/docs (API_DOCS=false leaves them out).
  if (config.apiDocs) SwaggerModule.setup('api/docs', app, () => buildOpenApiDocument(app));
  return app;
}
