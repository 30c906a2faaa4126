import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AuditModule } from '../audit/audit.module.js';
import { CircuitEntity } from '../circuits/circuit.entity.js';
import { CircuitsModule } from '../circuits/circuits.module.js';
import { MailModule } from '../mail/mail.module.js';
import { PartsModule } from '../parts/parts.module.js';
import { RulesModule } from '../rules/rules.module.js';
import { ShopsModule } from '../shops/shops.module.js';
import { StockModule } from '../stock/stock.module.js';
import { SupplierEntity } from '../suppliers/supplier.entity.js';
import { OrderLineEntity } from './order-line.entity.js';
import { OrderEntity } from './order.entity.js';
import { OrderReceiptEntity } from './order-receipt.entity.js';
import { OrderSourceEntity } from './order-source.entity.js';
import { OrdersController } from './orders.controller.js';
import { OrdersService } from './orders.service.js';

@Module({
  imports: [
    TypeOrmModule.forFeature([OrderEntity, OrderLineEntity, OrderSourceEntity, OrderReceiptEntity, CircuitEntity, SupplierEntity]),
    CircuitsModule,
    RulesModule,
    PartsModule,
    ShopsModule,
    StockModule,
    MailModule,
    AuditModule,
  ],
  controllers: [OrdersController],
  providers: [OrdersService],
})
export class OrdersModule {}
