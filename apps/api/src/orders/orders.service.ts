import { Injectable } from '@nestjs/common';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import { buildOrderSheets, saleUnitLabel, type BomRow } from '@linesmith/routing';
import { createHash } from 'node:crypto';
import { In, MoreThan, type DataSource, type EntityManager, type Repository } from 'typeorm';
import { AuditService } from '../audit/audit.service.js';
import { ConflictError, NotFoundError, ValidationError } from '../common/errors/app-error.js';
import { isUniqueViolation } from '../common/errors/unique-violation.js';
import { CircuitRevisionsService } from '../circuits/circuit-revisions.service.js';
import { CircuitEntity } from '../circuits/circuit.entity.js';
import { MailService } from '../mail/mail.service.js';
import { ShopCatalogueService } from '../parts/shop-catalogue.service.js';
import { RulesService } from '../rules/rules.service.js';
import { ShopsService } from '../shops/shops.service.js';
import { approvedRevisionNumber } from '../spreadsheets/approved-revision.js';
import { safeFileName, workbookBuffer, XLSX_CONTENT_TYPE } from '../spreadsheets/spreadsheet.js';
import { StockService } from '../stock/stock.service.js';
import { SupplierEntity } from '../suppliers/supplier.entity.js';
import type { DraftOrdersResult, OrderDto, OrderSupplierDto, ReceiveOrderInput } from './dto/order.schemas.js';
import { OrderLineEntity } from './order-line.entity.js';
import { orderSheetWorkbook } from './order-sheet.workbook.js';
import { OrderEntity } from './order.entity.js';
import { OrderReceiptEntity } from './order-receipt.entity.js';
import { NO_SUPPLIER_KEY, OrderSourceEntity } from './order-source.entity.js';
import { toOrderDto } from './order.mapper.js';

const EPSILON = 1e-9;
/** Without an idempotency key, the same receipt of the same order within this window is a double submit. */
const UNKEYED_REPEAT_WINDOW_MS = 10_000;

/** Order-independent digest of a receipt's lines. */
function receiptLinesHash(input: ReceiveOrderInput): string {
  const canonical = [...input.lines].map((line) => `${line.orderLineId}=${line.quantity}`).sort().join(';');
  return createHash('sha256').update(canonical).digest('hex');
}

function supplierRef(supplier: SupplierEntity): OrderSupplierDto {
  return { id: supplier.id, name: supplier.name, email: supplier.email, accountNumber: supplier.accountNumber };
}

export interface OrderFile {
  fileName: string;
  body: Buffer;
}

/** Order sheets per supplier, drafted from approved circuits, sent by e-mail and booked in on delivery. */
@Injectable()
export class OrdersService {
  constructor(
    @InjectRepository(OrderEntity) private readonly orders: Repository<OrderEntity>,
    @InjectRepository(OrderLineEntity) private readonly orderLines: Repository<OrderLineEntity>,
    @InjectRepository(CircuitEntity) private readonly circuits: Repository<CircuitEntity>,
    @InjectRepository(SupplierEntity) private readonly suppliers: Repository<SupplierEntity>,
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly revisions: CircuitRevisionsService,
    private readonly rules: RulesService,
    private readonly catalogue: ShopCatalogueService,
    private readonly shops: ShopsService,
    private readonly stock: StockService,
    private readonly mail: MailService,
    private readonly audit: AuditService,
  ) {}

  /**
   * Sums the bills of materials of the circuits' approved revisions and writes one draft order per
   * supplier (DOMAIN §6): whole sale units, stock on hand taken off, the shop's tax rate.
   */
  async draft(shopId: string, actorId: string, circuitIds: string[]): Promise<DraftOrdersResult> {
    const circuits = await this.circuits.findBy({ shopId, id: In(circuitIds) });
    const missing = circuitIds.filter((id) => !circuits.some((circuit) => circuit.id === id));
    if (missing.length) throw new NotFoundError('A chosen circuit');
    const notApproved = circuits.filter((circuit) => circuit.status !== 'approved');
    if (notApproved.length) {
      throw new ValidationError(
        notApproved.map((circuit) => ({
          path: `circuitIds.${circuitIds.indexOf(circuit.id)}`,
          message: `“${circuit.name}” is ${circuit.status}; only approved circuits can be ordered.`,
        })),
        'Only approved circuits can be ordered.',
      );
    }
    const bomRows: BomRow[] = [];
    const sources: Array<{ circuit: CircuitEntity; revisionNumber: number }> = [];
    for (const circuit of circuits) {
      const approved = approvedRevisionNumber(await this.revisions.list(shopId, circuit.id));
      if (approved === undefined) throw new ConflictError(`“${circuit.name}” has no signed-off revision to order from.`);
      // The bill of materials the reviewer signed off, not one re-checked with today's rules and catalogue.
      const stored = await this.revisions.signedOffEvaluation(shopId, circuit.id, approved);
      const evaluation = stored ?? (await this.rules.evaluate(shopId, (await this.revisions.get(shopId, circuit.id, approved)).document));
      bomRows.push(...evaluation.bom.rows);
      sources.push({ circuit, revisionNumber: approved });
    }
    const [parts, shop] = await Promise.all([this.catalogue.partsOf(shopId), this.shops.getOwnShop(shopId)]);
    const stockByPart = new Map(parts.map((part) => [part.id, part.stockOnHand]));
    const result = buildOrderSheets(bomRows, parts, stockByPart, shop.taxRatePercent);
    const extras = { coveredByStock: result.coveredByStock, unorderable: result.unorderable };

    const earlier = await this.ordersDraftedFrom(shopId, sources);
    if (earlier) return { orders: earlier, ...extras, reused: true };
    let saved: string[];
    try {
      saved = await this.dataSource.transaction(async (manager) => {
        const repo = manager.getRepository(OrderEntity);
        const ids: string[] = [];
        for (const sheet of result.sheets) {
          const order = await repo.save(
            repo.create({
              shopId,
              supplierId: sheet.supplierId,
              status: 'draft',
              circuitIds: circuits.map((circuit) => circuit.id),
              taxRatePercent: shop.taxRatePercent,
              subtotalCents: sheet.subtotalCents,
              taxCents: sheet.taxCents,
              totalCents: sheet.totalCents,
              createdBy: actorId,
              sentAt: null,
            }),
          );
          const lines = manager.getRepository(OrderLineEntity);
          await lines.save(
            sheet.lines.map((line, position) =>
              lines.create({
                orderId: order.id,
                position,
                partId: line.partId,
                description: line.description,
                supplierPartNumber: line.supplierPartNumber,
                saleUnit: saleUnitLabel(line.saleUnit),
                quantity: line.quantity,
                unitPriceCents: line.unitPriceCents,
                lineTotalCents: line.lineTotalCents,
                receivedQuantity: 0,
              }),
            ),
          );
          await manager.getRepository(OrderSourceEntity).insert(
            sources.map(({ circuit, revisionNumber }) => ({
              orderId: order.id,
              shopId,
              circuitId: circuit.id,
              revisionNumber,
              supplierKey: sheet.supplierId ?? NO_SUPPLIER_KEY,
            })),
          );
          ids.push(order.id);
        }
        return ids;
      });
    } catch (error) {
      // A concurrent request drafted the same revisions first: answer its orders.
      if (!isUniqueViolation(error)) throw error;
      const winner = await this.ordersDraftedFrom(shopId, sources);
      if (!winner) throw error;
      return { orders: winner, ...extras, reused: true };
    }
    return { orders: await Promise.all(saved.map((id) => this.get(shopId, id))), ...extras, reused: false };
  }

  /**
   * The orders already drafted from exactly these circuit revisions (a repeated or concurrent
   * submit), or null when none is. Orders that cover only some of them, or more, are a 409 naming
   * the circuits already on order.
   */
  private async ordersDraftedFrom(shopId: string, sources: Array<{ circuit: CircuitEntity; revisionNumber: number }>): Promise<OrderDto[] | null> {
    const sourceRepo = this.dataSource.getRepository(OrderSourceEntity);
    const hits = await sourceRepo.find({
      where: sources.map(({ circuit, revisionNumber }) => ({ shopId, circuitId: circuit.id, revisionNumber })),
    });
    if (!hits.length) return null;
    const orderIds = [...new Set(hits.map((hit) => hit.orderId))];
    const covered = await sourceRepo.findBy({ shopId, orderId: In(orderIds) });
    const requested = new Set(sources.map(({ circuit }) => circuit.id));
    const coveredIds = new Set(covered.map((row) => row.circuitId));
    const same = coveredIds.size === requested.size && [...requested].every((id) => coveredIds.has(id));
    if (!same) {
      const names = sources.filter(({ circuit }) => coveredIds.has(circuit.id)).map(({ circuit }) => `“${circuit.name}”`);
      throw new ConflictError(
        `${names.join(', ')} ${names.length === 1 ? 'is' : 'are'} already on an order for this signed-off revision. ` +
          'Send or use that order, and order the other circuits on their own.',
      );
    }
    return Promise.all(orderIds.map((id) => this.get(shopId, id)));
  }

  async list(shopId: string): Promise<OrderDto[]> {
    const rows = await this.orders.find({ where: { shopId }, order: { createdAt: 'DESC', id: 'ASC' }, take: 500 });
    const lines = rows.length ? await this.orderLines.findBy({ orderId: In(rows.map((row) => row.id)) }) : [];
    const suppliers = await this.supplierRefs(shopId);
    return rows.map((row) =>
      toOrderDto(
        row,
        lines.filter((line) => line.orderId === row.id),
        row.supplierId ? (suppliers.get(row.supplierId) ?? null) : null,
      ),
    );
  }

  async get(shopId: string, orderId: string): Promise<OrderDto> {
    const order = await this.orders.findOneBy({ id: orderId, shopId });
    if (!order) throw new NotFoundError('The order');
    const [lines, supplier] = await Promise.all([
      this.orderLines.findBy({ orderId }),
      order.supplierId ? this.suppliers.findOneBy({ id: order.supplierId, shopId }) : null,
    ]);
    return toOrderDto(order, lines, supplier ? supplierRef(supplier) : null);
  }

  async exportSheet(shopId: string, orderId: string): Promise<OrderFile> {
    const order = await this.get(shopId, orderId);
    const [shop, supplier] = await Promise.all([
      this.shops.getOwnShop(shopId),
      order.supplierId ? this.suppliers.findOneBy({ id: order.supplierId, shopId }) : null,
    ]);
    const dateText = new Intl.DateTimeFormat('en-CA', { timeZone: shop.timezone, dateStyle: 'short' }).format(new Date(order.createdAt));
    const workbook = orderSheetWorkbook({
      order,
      shopName: shop.name,
      supplierName: supplier?.name ?? 'no supplier on file',
      accountNumber: supplier?.accountNumber ?? '',
      dateText,
    });
    return { fileName: safeFileName(`order-${supplier?.name ?? 'no-supplier'}-${dateText}.xlsx`), body: await workbookBuffer(workbook) };
  }

  /**
   * Claims the order (draft → sent, guarded by its version, so of two concurrent sends only one
   * e-mails), e-mails the order sheet to the supplier, then marks its circuits ordered (with an
   * `order` event in each circuit's audit trail). If the mail fails the order goes back to draft
   * and the error is answered (the outbox records the attempt).
   */
  async send(shopId: string, actorId: string, orderId: string): Promise<OrderDto> {
    const order = await this.get(shopId, orderId);
    if (order.status !== 'draft') throw new ConflictError(`This order was already ${order.status}.`, { current: order });
    const supplier = order.supplierId ? await this.suppliers.findOneBy({ id: order.supplierId, shopId }) : null;
    if (!supplier?.email) {
      throw new ValidationError([{ path: 'supplierId', message: 'The supplier has no e-mail address. Add one, or export the sheet instead.' }]);
    }
    const [file, shop] = await Promise.all([this.exportSheet(shopId, orderId), this.shops.getOwnShop(shopId)]);
    const claimedVersion = await this.claimForSending(shopId, orderId, order.version);
    try {
      await this.mail.send({
        shopId,
        to: supplier.email,
        subject: `Order from ${shop.name}${supplier.accountNumber ? ` (account ${supplier.accountNumber})` : ''}`,
        text: [
          `Hello ${supplier.name},`,
          '',
          `Please supply the parts on the attached order sheet (${order.lines.length} line(s)).`,
          supplier.accountNumber ? `Our account number: ${supplier.accountNumber}.` : '',
          '',
          `Thank you,`,
          shop.name,
        ]
          .filter((line, index, all) => line !== '' || all[index - 1] !== '')
          .join('\n'),
        attachments: [{ filename: file.fileName, content: file.body, contentType: XLSX_CONTENT_TYPE }],
      });
    } catch (error) {
      // Not sent after all: the order is a draft again (only if nothing moved it since the claim).
      await this.orders.update({ id: orderId, shopId, status: 'sent', version: claimedVersion }, { status: 'draft', sentAt: null });
      throw error;
    }
    await this.dataSource.transaction(async (manager) => {
      const circuits = manager.getRepository(CircuitEntity);
      const stillApproved = await circuits.findBy({ shopId, id: In(order.circuitIds), status: 'approved' });
      if (!stillApproved.length) return;
      await circuits.update({ shopId, id: In(stillApproved.map((circuit) => circuit.id)) }, { status: 'ordered' });
      for (const circuit of stillApproved) {
        await this.audit.record(manager, {
          shopId,
          circuitId: circuit.id,
          actorId,
          action: 'order',
          revisionNumber: approvedRevisionNumber(await this.revisions.list(shopId, circuit.id)) ?? null,
          details: { orderId, supplier: supplier.name },
        });
      }
    });
    return this.get(shopId, orderId);
  }

  /**
   * Marks a draft order sent in one guarded UPDATE (status draft and the version read), so a
   * second send of the same order finds nothing to claim and answers 409. Returns the new version.
   */
  private async claimForSending(shopId: string, orderId: string, version: number): Promise<number> {
    const result = await this.orders
      .createQueryBuilder()
      .update(OrderEntity)
      .set({ status: 'sent', sentAt: () => 'now()' })
      .where('id = :orderId AND shop_id = :shopId AND status = :draft AND version = :version', { orderId, shopId, draft: 'draft', version })
      .returning(['version'])
      .execute();
    const claimed = result.raw as Array<{ version: number }>;
    if (!claimed.length) throw new ConflictError('This order is being sent or was changed by someone else.', { current: await this.get(shopId, orderId) });
    return claimed[0]!.version;
  }

  /** Books delivered quantities into stock in one transaction; the order becomes partially or fully received. */
  async receive(shopId: string, actorId: string, orderId: string, input: ReceiveOrderInput, idempotencyKey?: string): Promise<OrderDto> {
    await this.dataSource.transaction(async (manager) => {
      const repo = manager.getRepository(OrderEntity);
      // The order row lock serialises every receipt of this order, so the repeat check below is exact.
      const order = await repo
        .createQueryBuilder('o')
        .where('o.id = :orderId AND o.shop_id = :shopId', { orderId, shopId })
        .setLock('pessimistic_write')
        .getOne();
      if (!order) throw new NotFoundError('The order');
      const linesHash = receiptLinesHash(input);
      if (await this.isRepeatedReceipt(manager, orderId, linesHash, idempotencyKey)) return;
      if (order.status === 'draft' || order.status === 'received') {
        throw new ConflictError(order.status === 'draft' ? 'Send the order before booking deliveries.' : 'This order is fully received.');
      }
      const lineRepo = manager.getRepository(OrderLineEntity);
      const lines = await lineRepo.findBy({ orderId });
      const issues: Array<{ path: string; message: string }> = [];
      const received = new Map<string, number>();
      input.lines.forEach((entry, index) => {
        const line = lines.find((candidate) => candidate.id === entry.orderLineId);
        if (!line) {
          issues.push({ path: `lines.${index}.orderLineId`, message: 'This line is not on the order.' });
          return;
        }
        const total = (received.get(line.id) ?? line.receivedQuantity) + entry.quantity;
        if (total > line.quantity + EPSILON) {
          issues.push({ path: `lines.${index}.quantity`, message: `Only ${line.quantity - line.receivedQuantity} ${line.saleUnit} still to come on this line.` });
          return;
        }
        received.set(line.id, total);
      });
      if (issues.length) throw new ValidationError(issues, 'Some received quantities are not valid.');
      for (const entry of input.lines) {
        const line = lines.find((candidate) => candidate.id === entry.orderLineId) as OrderLineEntity;
        if (line.partId) {
          await this.stock.book(manager, shopId, actorId, line.partId, {
            // Stock is counted in sale units (feet, pieces, packs), like the order line.
            delta: entry.quantity,
            reason: `Received on order ${orderId.slice(0, 8)}`,
          });
        }
      }
      for (const [lineId, quantity] of received) await lineRepo.update({ id: lineId }, { receivedQuantity: quantity });
      await manager.getRepository(OrderReceiptEntity).insert({
        shopId,
        orderId,
        idempotencyKey: idempotencyKey ?? null,
        linesHash,
        lines: input.lines,
        createdBy: actorId,
      });
      const complete = lines.every((line) => (received.get(line.id) ?? line.receivedQuantity) >= line.quantity - EPSILON);
      await repo.update({ id: orderId }, { status: complete ? 'received' : 'partially-received' });
    });
    this.catalogue.invalidate(shopId);
    return this.get(shopId, orderId);
  }

  /**
   * A receipt already booked under this idempotency key (the same lines: a retry or double click),
   * or, without a key, the same lines booked in the last few seconds. A key reused for other lines
   * is a client mistake and answers 409.
   */
  private async isRepeatedReceipt(manager: EntityManager, orderId: string, linesHash: string, idempotencyKey?: string): Promise<boolean> {
    const receipts = manager.getRepository(OrderReceiptEntity);
    if (idempotencyKey) {
      const earlier = await receipts.findOneBy({ orderId, idempotencyKey });
      if (!earlier) return false;
      if (earlier.linesHash !== linesHash) {
        throw new ConflictError('This Idempotency-Key was already used for a different receipt of this order. Send a new key for a new receipt.');
      }
      return true;
    }
    return receipts.existsBy({ orderId, linesHash, createdAt: MoreThan(new Date(Date.now() - UNKEYED_REPEAT_WINDOW_MS)) });
  }

  private async supplierRefs(shopId: string): Promise<Map<string, OrderSupplierDto>> {
    const rows = await this.suppliers.findBy({ shopId });
    return new Map(rows.map((row) => [row.id, supplierRef(row)]));
  }
}
