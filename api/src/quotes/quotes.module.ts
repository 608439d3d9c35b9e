import { Module } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { JwtModule } from '@nestjs/jwt';
import { TypeOrmModule } from '@nestjs/typeorm';
import { CatalogModule } from '../catalog/catalog.module';
import { AppConfigService } from '../config/app-config';
import { FitReportsModule } from '../fit-reports/fit-reports.module';
import { LaborOperationsModule } from '../labor-operations/labor-operations.module';
import { PartsModule } from '../parts/parts.module';
import { ProjectsModule } from '../projects/projects.module';
import { ShopsModule } from '../shops/shops.module';
import { UsersModule } from '../users/users.module';
import { WorkOrdersModule } from '../work-orders/work-orders.module';
import { QuoteLinksService } from './quote-links.service';
import { QuoteNotification } from './quote-notification.entity';
import { QuotePdfService } from './quote-pdf.service';
import { QuoteRevision } from './quote-revision.entity';
import { QuoteSettings } from './quote-settings.entity';
import { QuoteSettingsService } from './quote-settings.service';
import { Quote } from './quote.entity';
import { ProjectQuotesController, QuoteLinksController, QuoteSettingsController, QuotesController } from './quotes.controller';
import { QuotesService } from './quotes.service';

@Module({
  imports: [
    TypeOrmModule.forFeature([Quote, QuoteRevision, QuoteSettings, QuoteNotification]),
    // Quote links have their own key, derived from the app secret, so a sign-in token is never a quote link or back.
    JwtModule.registerAsync({
      inject: [ConfigService],
      useFactory: (config: AppConfigService) => ({
        secret: `${config.get('JWT_SECRET', { infer: true })}:quote-links`,
        signOptions: { algorithm: 'HS256' },
        verifyOptions: { algorithms: ['HS256'] },
      }),
    }),
    ProjectsModule,
    FitReportsModule,
    LaborOperationsModule,
    PartsModule,
    CatalogModule,
    ShopsModule,
    UsersModule,
    WorkOrdersModule,
  ],
  controllers: [ProjectQuotesController, QuotesController, QuoteLinksController, QuoteSettingsController],
  providers: [QuotesService, QuoteSettingsService, QuoteLinksService, QuotePdfService],
  exports: [QuotesService],
})
export class QuotesModule {}
