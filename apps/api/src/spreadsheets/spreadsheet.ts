import ExcelJS from 'exceljs';
import type { Response } from 'express';

/** One column of a table sheet: the header names its unit, e.g. "Cut length (in)". */
export interface SheetColumn {
  key: string;
  header: string;
  width: number;
  /** Excel number format for the column's cells, e.g. MONEY_FORMAT. */
  numFmt?: string;
}

export const MONEY_FORMAT = '#,##0.00';
export const INCH_FORMAT = '0.000';
export const MM_FORMAT = '0';
export const QUANTITY_FORMAT = '0.###';

export const XLSX_CONTENT_TYPE = 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet';

export function newWorkbook(): ExcelJS.Workbook {
  const workbook = new ExcelJS.Workbook();
  workbook.creator = 'Linesmith';
  workbook.created = new Date();
  return workbook;
}

/**
 * A sheet with a bold header row frozen in place, set column widths and number formats. Title
 * lines, when given, sit above the header (and stay frozen with it).
 */
export function addTableSheet(workbook: ExcelJS.Workbook, name: string, columns: SheetColumn[], titleLines: string[] = []): ExcelJS.Worksheet {
  const sheet = workbook.addWorksheet(name);
  for (const line of titleLines) sheet.addRow([line]).font = { bold: true };
  if (titleLines.length) sheet.addRow([]);
  const headerRow = sheet.addRow(columns.map((column) => column.header));
  headerRow.font = { bold: true };
  headerRow.fill = { type: 'pattern', pattern: 'solid', fgColor: { argb: 'FFE8EEF4' } };
  headerRow.alignment = { vertical: 'middle', wrapText: true };
  columns.forEach((column, index) => {
    const sheetColumn = sheet.getColumn(index + 1);
    sheetColumn.key = column.key;
    sheetColumn.width = column.width;
    if (column.numFmt) sheetColumn.numFmt = column.numFmt;
  });
  sheet.views = [{ state: 'frozen', ySplit: headerRow.number, xSplit: 0 }];
  return sheet;
}

/** The column letter of a key (for formulas such as `=C5*E5`). */
export function columnLetter(sheet: ExcelJS.Worksheet, key: string): string {
  return sheet.getColumn(key).letter;
}

/** Cents as currency units, the way spreadsheets show money. */
export function centsToMoney(cents: number): number {
  return Math.round(cents) / 100;
}

export async function workbookBuffer(workbook: ExcelJS.Workbook): Promise<Buffer> {
  return Buffer.from(await workbook.xlsx.writeBuffer());
}

/** A file name safe in headers and on every file system: letters, digits, dot, dash, underscore. */
export function safeFileName(name: string): string {
  return name.replace(/[^\w.-]+/g, '-').replace(/-+/g, '-').toLowerCase();
}

/** Sends a workbook as a download. */
export function sendWorkbook(response: Response, fileName: string, body: Buffer): void {
  response.setHeader('Content-Type', XLSX_CONTENT_TYPE);
  response.setHeader('Content-Disposition', `attachment; filename="${safeFileName(fileName)}"`);
  response.setHeader('Content-Length', String(body.length));
  response.end(body);
}
