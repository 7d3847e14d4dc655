import { RequestMethod } from '@nestjs/common';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { DocumentBuilder, SwaggerModule } from '@nestjs/swagger';
import cookieParser from 'cookie-parser';
import { json, raw } from 'express';
import helmet from 'helmet';
import { Logger } from 'nestjs-pino';
import { compressAnswers } from './common/http/compress-answers';
import { ApiExceptionFilter } from './common/filters/api-exception.filter';
import { createValidationPipe } from './common/validation/validation-pipe';
import { AppConfig } from './config/app-config';
import { QUOTE_PAGE_ROUTE } from './quote-page-host/quote-page-host.module';

const PRICE_BOOK_IMPORT_PATH = '/api/price-book/import';
/** The payment webhook's signature is over the exact bytes sent, so its body stays raw. */
const PAYMENT_WEBHOOK_PATH = '/api/payments/webhook';

/** Nest's own body parser stays off: configureApp installs one whose errors keep the API's error shape. */
export const NEST_APP_OPTIONS = { bodyParser: false } as const;

/** Everything the running server and the tests configure the same way. */
export function configureApp(app: NestExpressApplication): void {
  const config = app.get(AppConfig);
  app.useLogger(app.get(Logger));
  // The quote page is served beside the API, not under it; naming it here puts it under the request
  // logger (and its request id), which Nest mounts on the prefix and on the routes excluded from it.
  app.setGlobalPrefix('api', { exclude: [{ path: QUOTE_PAGE_ROUTE, method: RequestMethod.GET }] });
  app.set('trust proxy', config.trustProxy ? 1 : false);
  app.disable('x-powered-by');
  // CORS for the app's own origin only (security review: no policy was set). The app and its API
  // share an origin, so browsers need none; naming PUBLIC_APP_URL keeps a split deployment working,
  // and any other origin's preflight or request gets no Access-Control-Allow-Origin, so its pages
  // cannot read an answer, signed in or not.
  app.enableCors({
    origin: [new URL(config.publicAppUrl).origin],
    credentials: true,
    methods: ['GET', 'HEAD', 'POST', 'PUT', 'PATCH', 'DELETE'],
    maxAge: 600,
  });
  const errors = new ApiExceptionFilter();
  // Nest's own body parser is off (see createApp) so that parse errors reach our error shape.
  // A price-book CSV import is the one larger body: a full book (5,000 materials) runs to a few MB.
  app.use(PRICE_BOOK_IMPORT_PATH, json({ limit: '5mb' }));
  app.use(PAYMENT_WEBHOOK_PATH, raw({ type: () => true, limit: '1mb' }));
  app.use(json({ limit: '1mb' }));
  app.use(errors.middleware);
  app.use(cookieParser());
  app.use(compressAnswers());
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          defaultSrc: ["'self'"],
          scriptSrc: ["'self'"],
          // Mantine writes component styles at run time.
          styleSrc: ["'self'", "'unsafe-inline'"],
          imgSrc: ["'self'", 'data:', 'blob:'],
          fontSrc: ["'self'", 'data:'],
          connectSrc: ["'self'"],
          frameAncestors: ["'none'"],
          objectSrc: ["'none'"],
          baseUri: ["'self'"],
          formAction: ["'self'"],
          upgradeInsecureRequests: config.isProduction ? [] : null,
        },
      },
      hsts: config.isProduction,
      referrerPolicy: { policy: 'no-referrer' },
    }),
  );
  app.useGlobalPipes(createValidationPipe());
  app.useGlobalFilters(errors);
  app.enableShutdownHooks();

  const document = SwaggerModule.createDocument(
    app,
    new DocumentBuilder()
      .setTitle('Pondwright API')
      .setDescription('Estimating, quoting and job costing for pond and water-feature contractors.')
      .setVersion('0.1.0')
      .addBearerAuth()
      .build(),
  );
  SwaggerModule.setup('api/docs', app, document, { jsonDocumentUrl: 'api/docs/openapi.json' });
}
