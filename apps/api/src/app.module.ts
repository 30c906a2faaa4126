import { Module, type DynamicModule } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { LoggerModule } from 'nestjs-pino';
import { AuditModule } from './audit/audit.module.js';
import { AuthModule } from './auth/auth.module.js';
import { BuildsModule } from './builds/builds.module.js';
import { CircuitsModule } from './circuits/circuits.module.js';
import { loggerOptions } from './common/logging/logger-options.js';
import { AppConfigModule } from './config/app-config.module.js';
import { AppConfigService } from './config/app-config.service.js';
import { databaseOptions } from './database/database-options.js';
import { HealthModule } from './health/health.module.js';
import { MailModule } from './mail/mail.module.js';
import { OrdersModule } from './orders/orders.module.js';
import { NotificationsModule } from './notifications/notifications.module.js';
import { PartsModule } from './parts/parts.module.js';
import { PriceListsModule } from './price-lists/price-lists.module.js';
import { ReferenceModule } from './reference/reference.module.js';
import { ReviewsModule } from './reviews/reviews.module.js';
import { RulesModule } from './rules/rules.module.js';
import { ShopRulesModule } from './shop-rules/shop-rules.module.js';
import { ShopsModule } from './shops/shops.module.js';
import { SpreadsheetsModule } from './spreadsheets/spreadsheets.module.js';
import { StockModule } from './stock/stock.module.js';
import { SuppliersModule } from './suppliers/suppliers.module.js';
import { UploadsModule } from './uploads/uploads.module.js';
import { UsersModule } from './users/users.module.js';

export interface AppModuleOptions {
  /** Environment overrides (tests); everything else comes from process.env. */
  env?: Record<string, string>;
}

@Module({})
export class AppModule {
  static forRoot(options: AppModuleOptions = {}): DynamicModule {
    return {
      module: AppModule,
      imports: [
        AppConfigModule.forRoot(options.env),
        LoggerModule.forRootAsync({
          inject: [AppConfigService],
          useFactory: (config: AppConfigService) => loggerOptions(config.get('LOG_LEVEL')),
        }),
        TypeOrmModule.forRootAsync({
          inject: [AppConfigService],
          useFactory: (config: AppConfigService) => databaseOptions(config.get('DATABASE_URL')),
        }),
        ShopsModule,
        UsersModule,
        AuthModule,
        HealthModule,
        SuppliersModule,
        PartsModule,
        ShopRulesModule,
        ReferenceModule,
        RulesModule,
        BuildsModule,
        CircuitsModule,
        AuditModule,
        NotificationsModule,
        ReviewsModule,
        UploadsModule,
        MailModule,
        StockModule,
        SpreadsheetsModule,
        OrdersModule,
        PriceListsModule,
      ],
    };
  }
}
