import { Module } from '@nestjs/common';
import { APP_GUARD } from '@nestjs/core';
import { ServeStaticModule } from '@nestjs/serve-static';
import { ThrottlerGuard, ThrottlerModule } from '@nestjs/throttler';
import { TypeOrmModule } from '@nestjs/typeorm';
import { LoggerModule } from 'nestjs-pino';
import { existsSync } from 'node:fs';
import { AuthModule } from './auth/auth.module';
import { CompaniesModule } from './companies/companies.module';
import { CustomersModule } from './customers/customers.module';
import { JwtAuthGuard } from './common/guards/jwt-auth.guard';
import { RolesGuard } from './common/guards/roles.guard';
import { TenancyModule } from './common/tenancy/tenancy.module';
import { loggerParams } from './common/logging/logger-params';
import { AppConfig } from './config/app-config';
import { AppConfigModule } from './config/app-config.module';
import { dataSourceOptions } from './database/data-source-options';
import { EstimatesModule } from './estimates/estimates.module';
import { HealthModule } from './health/health.module';
import { CrewsModule } from './crews/crews.module';
import { InvitesModule } from './invites/invites.module';
import { ChangeOrdersModule } from './change-orders/change-orders.module';
import { InvoicesModule } from './invoices/invoices.module';
import { JobsModule } from './jobs/jobs.module';
import { PhotosModule } from './photos/photos.module';
import { MailModule } from './mail/mail.module';
import { PaymentsModule } from './payments/payments.module';
import { QuotesModule } from './quotes/quotes.module';
import { PriceBookModule } from './price-book/price-book.module';
import { PricedTakeoffsModule } from './priced-takeoffs/priced-takeoffs.module';
import { clientStaticFiles } from './quote-page-host/client-static-files';
import { clientDistDir, QuotePageHostModule } from './quote-page-host/quote-page-host.module';
import { TakeoffModule } from './takeoff/takeoff.module';
import { UsersModule } from './users/users.module';

@Module({
  imports: [
    AppConfigModule,
    LoggerModule.forRootAsync({ inject: [AppConfig], useFactory: loggerParams }),
    TypeOrmModule.forRootAsync({
      inject: [AppConfig],
      useFactory: (config: AppConfig) => dataSourceOptions(config.database),
    }),
    // A coarse flood guard, counted in each instance's memory: behind a load balancer it allows up to
    // the limit per instance, which is fine for its purpose. The limits that must hold across
    // instances and restarts (failed sign-ins, wrong quote-link tokens) are counted in PostgreSQL.
    // Per address, so behind a proxy TRUST_PROXY must be on or every caller shares the proxy's address.
    ThrottlerModule.forRootAsync({
      inject: [AppConfig],
      useFactory: (config: AppConfig) => ({
        throttlers: [{ name: 'per-ip', ttl: 60_000, limit: config.rateLimitPerMinute }],
      }),
    }),
    TenancyModule,
    AuthModule,
    CompaniesModule,
    UsersModule,
    InvitesModule,
    HealthModule,
    TakeoffModule,
    PriceBookModule,
    PricedTakeoffsModule,
    EstimatesModule,
    CustomersModule,
    MailModule,
    PaymentsModule,
    QuotesModule,
    CrewsModule,
    JobsModule,
    PhotosModule,
    InvoicesModule,
    ChangeOrdersModule,
    // The built client, served at `/` when it exists (npm start builds it; tests and `npm run dev` don't).
    // `/q/<token>` is the homeowner's quote page, quote.html, served by QuotePageHostModule.
    ServeStaticModule.forRootAsync({
      inject: [AppConfig],
      useFactory: (config: AppConfig) => {
        const rootPath = clientDistDir(config);
        return existsSync(rootPath) ? [clientStaticFiles(rootPath)] : [];
      },
    }),
    QuotePageHostModule,
  ],
  providers: [
    { provide: APP_GUARD, useClass: ThrottlerGuard },
    { provide: APP_GUARD, useClass: JwtAuthGuard },
    { provide: APP_GUARD, useClass: RolesGuard },
  ],
})
export class AppModule {}
