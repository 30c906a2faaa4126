import type ExcelJS from 'exceljs';
import { addTableSheet, centsToMoney, columnLetter, MONEY_FORMAT, newWorkbook, QUANTITY_FORMAT } from '../spreadsheets/spreadsheet.js';
import type { OrderDto } from './dto/order.schemas.js';

export const ORDER_SHEET = 'Order';

export interface OrderSheetSource {
  order: OrderDto;
  shopName: string;
  supplierName: string;
  accountNumber: string;
  /** The date printed on the sheet, already in the shop's time zone. */
  dateText: string;
}

/** One supplier's order as a spreadsheet: line totals, subtotal, tax and total are formulas. */
export function orderSheetWorkbook(source: OrderSheetSource): ExcelJS.Workbook {
  const { order } = source;
  const workbook = newWorkbook();
  const sheet = addTableSheet(
    workbook,
    ORDER_SHEET,
    [
      { key: 'number', header: 'Supplier part number', width: 20 },
      { key: 'description', header: 'Description', width: 48 },
      { key: 'quantity', header: 'Quantity', width: 10, numFmt: QUANTITY_FORMAT },
      { key: 'unit', header: 'Unit', width: 12 },
      { key: 'unitPrice', header: 'Unit price ($ per unit)', width: 14, numFmt: MONEY_FORMAT },
      { key: 'total', header: 'Line total ($)', width: 14, numFmt: MONEY_FORMAT },
    ],
    [
      `Order from ${source.shopName} to ${source.supplierName}`,
      `Account number: ${source.accountNumber || '(none on file)'} · Date: ${source.dateText} · Order ${order.id.slice(0, 8)}`,
    ],
  );
  const qty = columnLetter(sheet, 'quantity');
  const price = columnLetter(sheet, 'unitPrice');
  const total = columnLetter(sheet, 'total');
  const firstRow = sheet.rowCount + 1;
  for (const line of order.lines) {
    const row = sheet.addRow({
      number: line.supplierPartNumber,
      description: line.description,
      quantity: line.quantity,
      unit: line.saleUnit,
      unitPrice: centsToMoney(line.unitPriceCents),
    });
    row.getCell('total').value = { formula: `${qty}${row.number}*${price}${row.number}`, result: centsToMoney(line.lineTotalCents) };
  }
  const lastRow = sheet.rowCount;
  const subtotal = sheet.addRow({ description: 'Subtotal' });
  subtotal.getCell('total').value = {
    formula: lastRow >= firstRow ? `SUM(${total}${firstRow}:${total}${lastRow})` : '0',
    result: centsToMoney(order.subtotalCents),
  };
  const tax = sheet.addRow({ description: `Tax (${order.taxRatePercent} %)`, unitPrice: null });
  tax.getCell('total').value = {
    formula: `ROUND(${total}${subtotal.number}*${order.taxRatePercent}/100,2)`,
    result: centsToMoney(order.taxCents),
  };
  const grand = sheet.addRow({ description: 'Total' });
  grand.getCell('total').value = { formula: `${total}${subtotal.number}+${total}${tax.number}`, result: centsToMoney(order.totalCents) };
  for (const row of [subtotal, tax, grand]) row.font = { bold: true };
  return workbook;
}
