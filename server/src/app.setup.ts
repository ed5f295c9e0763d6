import type { INestApplication } from '@nestjs/common';
import { createValidationPipe } from './common/validation/validation.pipe.js';

/** What main.ts and the API tests both apply, so tests exercise the app as it runs. */
export function configureApp(app: INestApplication): INestApplication {
  app.setGlobalPrefix('api');
  app.useGlobalPipes(createValidationPipe());
  app.enableShutdownHooks();
  return app;
}
