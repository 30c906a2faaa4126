// Order-sheet export vs bare exceljs: the API's order-sheet workbook builder (title lines, frozen
// styled header, number formats, a formula per line total, subtotal/tax/total formulas) on a
// 2,000-line order, written to an .xlsx buffer, against exceljs writing the same rows and columns
// with no styling. Goal: builder ≤ 1.5 × bare. Both run alternately in one process.
import ExcelJS from 'exceljs';
import { performance } from 'node:perf_hooks';
import { median, row } from './lib/stats.mjs';

const ROWS = 2000;
const RUNS = 7;
const RATIO_GOAL = 1.5;

/** An invented order of `ROWS` lines in the shape of the API's OrderDto. */
function bigOrder() {
  const lines = Array.from({ length: ROWS }, (_, i) => {
    const quantity = 1 + (i % 12);
    const unitPriceCents = 250 + ((i * 37) % 4000);
    return {
      id: `line-${i}`,
      partId: null,
      description: `-${6 + 2 * (i % 3)} part ${i + 1} for the bench order`,
      supplierPartNumber: `BN-${String(i).padStart(5, '0')}`,
      saleUnit: i % 4 ? 'each' : 'foot',
      quantity,
      unitPriceCents,
      lineTotalCents: quantity * unitPriceCents,
      receivedQuantity: 0,
    };
  });
  const subtotalCents = lines.reduce((sum, line) => sum + line.lineTotalCents, 0);
  const taxCents = Math.round(subtotalCents * 0.06);
  const now = new Date().toISOString();
  return {
    id: '00000000-0000-4000-8000-000000000001',
    supplierId: null,
    supplierName: 'Bench supplier',
    status: 'draft',
    circuitIds: [],
    taxRatePercent: 6,
    subtotalCents,
    taxCents,
    totalCents: subtotalCents + taxCents,
    sentAt: null,
    version: 1,
    createdAt: now,
    updatedAt: now,
    lines,
  };
}

function bareWorkbook(order) {
  const workbook = new ExcelJS.Workbook();
  const sheet = workbook.addWorksheet('Order');
  sheet.addRow(['Supplier part number', 'Description', 'Quantity', 'Unit', 'Unit price ($ per unit)', 'Line total ($)']);
  for (const line of order.lines) {
    sheet.addRow([line.supplierPartNumber, line.description, line.quantity, line.saleUnit, line.unitPriceCents / 100, line.lineTotalCents / 100]);
  }
  return workbook;
}

async function timed(build) {
  const start = performance.now();
  const buffer = await build().xlsx.writeBuffer();
  return { ms: performance.now() - start, bytes: buffer.byteLength };
}

export async function benchOrderSheetExport() {
  // The built API (scripts/bench.sh builds it first): the function production runs.
  const { orderSheetWorkbook } = await import('../apps/api/dist/orders/order-sheet.workbook.js');
  const order = bigOrder();
  const source = { order, shopName: 'Bench shop', supplierName: 'Bench supplier', accountNumber: 'BN-1', dateText: '2026-01-15' };
  const builder = () => orderSheetWorkbook(source);
  const bare = () => bareWorkbook(order);
  await timed(builder); // warm-up
  await timed(bare);
  const builderMs = [];
  const bareMs = [];
  for (let i = 0; i < RUNS; i += 1) {
    builderMs.push((await timed(builder)).ms);
    bareMs.push((await timed(bare)).ms);
  }
  const [b, x] = [median(builderMs), median(bareMs)];
  return [
    row(`export: order-sheet builder, ${ROWS} lines to .xlsx (${RUNS} runs)`, b, 'ms'),
    row(`export: bare exceljs, same ${ROWS} rows and columns, no styling`, x, 'ms'),
    row('export: builder / bare', b / x, '×', RATIO_GOAL),
  ];
}
