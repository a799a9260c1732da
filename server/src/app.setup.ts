import type { INestApplication } from '@nestjs/common';
import { DocumentBuilder, SwaggerModule } from '@nestjs/swagger';
import helmet from 'helmet';

export const API_PREFIX = 'api';

// Everything main.ts and the tests both need on top of AppModule: prefix, security headers, OpenAPI.
export function configureApp(app: INestApplication): INestApplication {
  app.setGlobalPrefix(API_PREFIX);
  app.use(
    helmet({
      contentSecurityPolicy: {
        useDefaults: true,
        directives: {
          defaultSrc: ["'self'"],
          // The reviewer's audio tools compile ffmpeg's WebAssembly; nothing else is evaluated.
          scriptSrc: ["'self'", "'wasm-unsafe-eval'"],
          // Tailwind and Headless UI set inline style attributes.
          styleSrc: ["'self'", "'unsafe-inline'"],
          imgSrc: ["'self'", 'data:', 'blob:'],
          // Voice notes play back from blob: URLs before upload.
          mediaSrc: ["'self'", 'data:', 'blob:'],
          workerSrc: ["'self'", 'blob:'],
          connectSrc: ["'self'"],
          fontSrc: ["'self'", 'data:'],
          objectSrc: ["'none'"],
          frameAncestors: ["'none'"],
          baseUri: ["'self'"],
          formAction: ["'self'"],
          // Off: the demo runs over plain http on a LAN address, where upgrading would break every request.
          upgradeInsecureRequests: null,
        },
      },
    }),
  );
  const document = SwaggerModule.createDocument(
    app,
    new DocumentBuilder()
      .setTitle('Yardcall API')
      .setDescription(
        'Walk-around inspections, vehicles and users. Every route but sign-in, invitations and health needs a bearer token.',
      )
      .setVersion('0.1.0')
      .addBearerAuth()
      .build(),
  );
  SwaggerModule.setup(`${API_PREFIX}/docs`, app, document, { jsonDocumentUrl: `${API_PREFIX}/docs-json` });
  return app;
}
