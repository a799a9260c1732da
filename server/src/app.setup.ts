import type { NestExpressApplication } from '@nestjs/platform-express';
import { DocumentBuilder, SwaggerModule } from '@nestjs/swagger';
import compression from 'compression';
import type { NextFunction, Request, Response } from 'express';
import helmet from 'helmet';
import { configureBodyParsers } from './common/request-limits';

export const API_PREFIX = 'api';

// Everything main.ts and the tests both need on top of AppModule: prefix, security headers, OpenAPI.
export function configureApp(app: NestExpressApplication): NestExpressApplication {
  app.setGlobalPrefix(API_PREFIX);
  // A TLS-terminating proxy on the same machine may say the request came over https (and from whom).
  app.set('trust proxy', 'loopback');
  app.use((request: Request, response: Response, next: NextFunction) => {
    if (request.secure) response.setHeader('Strict-Transport-Security', 'max-age=31536000; includeSubDomains');
    // API answers hold a signed-in user's data: never kept by a browser or a proxy. Routes that serve
    // files set their own.
    if (request.path.startsWith(`/${API_PREFIX}/`)) response.setHeader('Cache-Control', 'no-store');
    next();
  });
  // Text answers gzipped (the app's JavaScript, CSS and HTML, the API's JSON): a phone on a slow
  // network loads the app in a third of the bytes. Audio, images and PDFs are left as they are.
  app.use(compression());
  configureBodyParsers(app);
  app.use(
    helmet({
      // Sent below, and only over TLS: over plain http (the demo on a LAN) it would be ignored or wrong.
      strictTransportSecurity: false,
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
