import { ValidationPipe, type INestApplication } from '@nestjs/common';
import { DocumentBuilder, SwaggerModule } from '@nestjs/swagger';
import { json, type NextFunction, type Request, type Response } from 'express';
import helmet from 'helmet';
import { Logger } from 'nestjs-pino';
import { validationPipeOptions } from './common/validation';
import { refuseNul } from './database/nul-guard';

/** Body-parser failures answered in the one error shape, naming the body as the field. */
function bodyErrors(err: { type?: string; status?: number } | undefined, _req: Request, res: Response, next: NextFunction): void {
  if (err?.type === 'entity.parse.failed') {
    res.status(400).json({ statusCode: 400, error: 'Bad Request', message: 'The request body is not valid JSON', errors: [{ field: 'body', message: 'is not valid JSON' }] });
  } else if (err?.type === 'entity.too.large') {
    res.status(413).json({ statusCode: 413, error: 'Payload Too Large', message: 'The request body is larger than 1 MB', errors: [{ field: 'body', message: 'is larger than 1 MB' }] });
  } else if (err?.type === 'charset.unsupported' || err?.type === 'encoding.unsupported') {
    res.status(415).json({ statusCode: 415, error: 'Unsupported Media Type', message: 'The request body must be UTF-8 JSON', errors: [{ field: 'body', message: 'must be UTF-8 JSON' }] });
  } else {
    next(err);
  }
}

/**
 * JSON nested deeper than any request here needs is refused before class-transformer recurses
 * through it (a few thousand levels overflow its stack: a 500). RFC 8259 §9 lets a parser limit
 * the depth of nesting.
 */
export const MAX_JSON_DEPTH = 32;

function nestedDeeperThan(value: unknown, max: number): boolean {
  const stack: Array<[unknown, number]> = [[value, 0]];
  while (stack.length > 0) {
    const [v, depth] = stack.pop()!;
    if (v === null || typeof v !== 'object') continue;
    if (depth >= max) return true;
    for (const child of Object.values(v)) stack.push([child, depth + 1]);
  }
  return false;
}

function bodyDepth(req: Request, res: Response, next: NextFunction): void {
  if (req.body !== null && typeof req.body === 'object' && nestedDeeperThan(req.body, MAX_JSON_DEPTH)) {
    res.status(400).json({ statusCode: 400, error: 'Bad Request', message: `The request body is nested more than ${MAX_JSON_DEPTH} levels deep`, errors: [{ field: 'body', message: `is nested more than ${MAX_JSON_DEPTH} levels deep` }] });
  } else {
    next();
  }
}

/**
 * Everything main.ts does to the app besides listening; e2e specs call it too.
 * The app must be created with `bodyParser: false`: JSON parsing is set up here.
 */
export function setupApp(app: INestApplication): INestApplication {
  app.useLogger(app.get(Logger));
  app.use(json({ limit: '1mb' }), bodyErrors, bodyDepth);
  app.use(refuseNul);
  app.setGlobalPrefix('api', { exclude: [] });
  app.use(
    helmet({
      contentSecurityPolicy: {
        useDefaults: true,
        directives: { 'img-src': ["'self'", 'data:', 'blob:'], 'style-src': ["'self'", "'unsafe-inline'"] },
      },
    }),
  );
  app.useGlobalPipes(new ValidationPipe(validationPipeOptions));
  const config = new DocumentBuilder()
    .setTitle('Causeway API')
    .setDescription('Fault codes, possible causes, fix paths, jobs, staged estimates and field reports.')
    .setVersion('0.1.0')
    .addBearerAuth()
    .build();
  const document = SwaggerModule.createDocument(app, config);
  SwaggerModule.setup('api/docs', app, document, { jsonDocumentUrl: 'api/docs/json' });
  app.enableShutdownHooks();
  return app;
}
