import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { QuotesModule } from '../quotes/quotes.module';
import { WorkOrdersModule } from '../work-orders/work-orders.module';
import { DepositPayment, PaymentEvent } from './deposit-payment.entity';
import { DepositsService } from './deposits.service';
import { PaymentsController } from './payments.controller';
import { PaymentsService } from './payments.service';

@Module({
  imports: [TypeOrmModule.forFeature([DepositPayment, PaymentEvent]), QuotesModule, WorkOrdersModule],
  controllers: [PaymentsController],
  providers: [PaymentsService, DepositsService],
})
export class PaymentsModule {}
