import type { Part } from '@linesmith/catalog';
import { formatCutLength, formatInches, type CircuitDocument, type CircuitEvaluation } from '@linesmith/routing';
import type ExcelJS from 'exceljs';
import {
  addTableSheet,
  centsToMoney,
  columnLetter,
  INCH_FORMAT,
  MM_FORMAT,
  MONEY_FORMAT,
  newWorkbook,
  QUANTITY_FORMAT,
} from './spreadsheet.js';

export const CUT_LIST_SHEET = 'Cut list';
export const PARTS_SHEET = 'Parts';

export interface CutListSource {
  title: string;
  /** e.g. "Revision 3" or "Draft (not approved)". */
  basis: string;
  document: CircuitDocument;
  evaluation: CircuitEvaluation;
  parts: ReadonlyMap<string, Part>;
}

const INCHES_PER_FOOT = 12;

function portName(doc: CircuitDocument, ref: { unitId: string; portId: string }): string {
  const unit = doc.units.find((u) => u.id === ref.unitId);
  const port = unit?.ports.find((p) => p.id === ref.portId);
  return [unit?.label || unit?.kind || '?', port?.label || port?.role || ''].filter(Boolean).join(' ');
}

function stackText(ids: readonly string[], parts: ReadonlyMap<string, Part>): string {
  return ids.map((id) => parts.get(id)?.description ?? `unknown part ${id}`).join(' + ');
}

function round(value: number, places: number): number {
  const factor = 10 ** places;
  return Math.round(value * factor) / factor;
}

function addCutListSheet(workbook: ExcelJS.Workbook, source: CutListSource): void {
  const { document: doc, evaluation, parts } = source;
  const sheet = addTableSheet(
    workbook,
    CUT_LIST_SHEET,
    [
      { key: 'line', header: 'Line', width: 36 },
      { key: 'hose', header: 'Hose', width: 32 },
      { key: 'dash', header: 'Dash size', width: 10 },
      { key: 'cutIn', header: 'Cut length (in)', width: 14, numFmt: INCH_FORMAT },
      { key: 'cutFraction', header: 'Cut length (in, fraction)', width: 16 },
      { key: 'cutMm', header: 'Cut length (mm)', width: 14, numFmt: MM_FORMAT },
      { key: 'fromStack', header: 'End stack at start', width: 40 },
      { key: 'toStack', header: 'End stack at end', width: 40 },
      { key: 'supports', header: 'Supports (count)', width: 12 },
      { key: 'supportsAt', header: 'Support positions (in from start)', width: 24 },
      { key: 'sleeveIn', header: 'Sleeve length (in)', width: 14, numFmt: INCH_FORMAT },
    ],
    [source.title, source.basis, 'Cut long, never short. Local codes, sanctioning-body rules and makers’ instructions come first.'],
  );
  evaluation.lines.forEach((report, index) => {
    const line = doc.lines.find((l) => l.id === report.lineId);
    if (!line) return;
    const hose = report.hosePartId ? parts.get(report.hosePartId) : undefined;
    const cut = report.cutLengthIn;
    sheet.addRow({
      line: `${index + 1}: ${portName(doc, line.from)} → ${portName(doc, line.to)}`,
      hose: hose?.description ?? (report.hosePartId ? `unknown part ${report.hosePartId}` : 'no hose picked'),
      dash: hose?.kind === 'hose' ? `-${hose.attributes.dash}` : '',
      cutIn: cut ?? null,
      // Both rounded up by the routing library's one cut-length rule (cut long, never short).
      cutFraction: cut === null ? '' : formatCutLength(cut, 'in'),
      cutMm: cut === null ? null : Number.parseInt(formatCutLength(cut, 'mm'), 10),
      fromStack: stackText(line.endStacks.from, parts),
      toStack: stackText(line.endStacks.to, parts),
      supports: report.supports.atIn.length,
      supportsAt: report.supports.atIn.map((s) => formatInches(s.atIn)).join(', '),
      sleeveIn: report.sleeves.placed.length ? round(report.sleeves.placed.reduce((sum, s) => sum + s.lengthIn, 0), 3) : null,
    });
  });
}

/**
 * The bill of materials with quantities in the units parts are sold by: hose and sleeve in feet,
 * the rest each. Line totals and the total are formulas, so edits in the sheet recalculate.
 */
function addPartsSheet(workbook: ExcelJS.Workbook, source: CutListSource): void {
  const sheet = addTableSheet(workbook, PARTS_SHEET, [
    { key: 'number', header: 'Supplier part number', width: 20 },
    { key: 'description', header: 'Description', width: 44 },
    { key: 'kind', header: 'Kind', width: 10 },
    { key: 'quantity', header: 'Quantity', width: 10, numFmt: QUANTITY_FORMAT },
    { key: 'unit', header: 'Unit', width: 8 },
    { key: 'unitPrice', header: 'Unit price ($ per unit)', width: 14, numFmt: MONEY_FORMAT },
    { key: 'total', header: 'Line total ($)', width: 14, numFmt: MONEY_FORMAT },
  ]);
  const qty = columnLetter(sheet, 'quantity');
  const price = columnLetter(sheet, 'unitPrice');
  const total = columnLetter(sheet, 'total');
  const firstRow = sheet.rowCount + 1;
  for (const row of source.evaluation.bom.rows) {
    const part = row.partId ? source.parts.get(row.partId) : undefined;
    const inFeet = row.unit === 'in';
    const quantity = round(inFeet ? row.quantity / INCHES_PER_FOOT : row.quantity, 3);
    let unitPriceCents: number | null = null;
    if (part && row.priceCents !== null) {
      unitPriceCents = part.saleUnit.type === 'pack' ? part.priceCents / part.saleUnit.size : part.priceCents;
    }
    const added = sheet.addRow({
      number: row.supplierPartNumber,
      description: row.description,
      kind: row.kind,
      quantity,
      unit: inFeet ? 'ft' : 'each',
      unitPrice: unitPriceCents === null ? null : round(centsToMoney(unitPriceCents), 4),
    });
    const n = added.number;
    added.getCell('total').value = {
      formula: `${qty}${n}*${price}${n}`,
      result: unitPriceCents === null ? 0 : round(quantity * centsToMoney(unitPriceCents), 4),
    };
  }
  const lastRow = sheet.rowCount;
  const totalRow = sheet.addRow({ description: 'Total (before tax)' });
  totalRow.font = { bold: true };
  totalRow.getCell('total').value = {
    formula: lastRow >= firstRow ? `SUM(${total}${firstRow}:${total}${lastRow})` : '0',
    result: centsToMoney(source.evaluation.bom.subtotalCents),
  };
  if (source.evaluation.bom.unpricedRows > 0) {
    sheet.addRow({ description: `${source.evaluation.bom.unpricedRows} row(s) have no price: pick a catalogue part for them.` });
  }
}

export function cutListWorkbook(source: CutListSource): ExcelJS.Workbook {
  const workbook = newWorkbook();
  addCutListSheet(workbook, source);
  addPartsSheet(workbook, source);
  return workbook;
}
