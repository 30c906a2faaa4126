import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource, EntityManager } from 'typeorm';
import { ValidationError } from '../common/errors/app-error.js';
import { PartEntity } from '../parts/part.entity.js';
import { ShopCatalogueService } from '../parts/shop-catalogue.service.js';
import { SuppliersService } from '../suppliers/suppliers.service.js';
import { checkPriceList, type ImportCounts, type PriceChange } from './check-price-list.js';
import { guessMapping, resolveMapping } from './column-mapping.js';
import type { ColumnMapping, MappingField, PriceListForm } from './dto/price-list.schemas.js';
import { PriceListRowsError, type ImportIssue } from './price-list-errors.js';
import { readPriceList, type PriceListReading, type PriceListSheet, type UploadedFile } from './read-price-list.js';

export interface PriceListPreview {
  /** How the file was read ("Read as Windows-1252, separated by semicolons."), and for a CSV the choices. */
  readAs: PriceListReading;
  headers: string[];
  mapping: Partial<Record<MappingField, string | null>>;
  /** True when the mapping was guessed from the header row (none was sent). */
  guessed: boolean;
  rows: PriceChange[];
  report: ImportIssue[];
  counts: ImportCounts;
}

const NO_COUNTS: ImportCounts = { new: 0, updated: 0, unchanged: 0, errors: 0 };

/** Supplier price lists (.xlsx or .csv): a dry run with a row-by-row report, then an all-or-nothing commit. */
@Injectable()
export class PriceListsService {
  constructor(
    private readonly suppliers: SuppliersService,
    private readonly catalogue: ShopCatalogueService,
    @InjectDataSource() private readonly dataSource: DataSource,
  ) {}

  async preview(shopId: string, file: UploadedFile | undefined, form: PriceListForm): Promise<PriceListPreview> {
    const sheet = await this.open(shopId, file, form);
    const guessed = !form.mapping;
    const mapping: Partial<Record<MappingField, string | null>> = form.mapping ?? guessMapping(sheet.headers);
    if (!mapping.partNumber || !mapping.price) {
      return { readAs: sheet.readAs, headers: sheet.headers, mapping, guessed, rows: [], report: [], counts: NO_COUNTS };
    }
    const check = await this.check(shopId, sheet, mapping as ColumnMapping, form.supplierId);
    return { readAs: sheet.readAs, headers: sheet.headers, mapping, guessed, rows: check.changes, report: check.report, counts: check.counts };
  }

  /**
   * Writes the changed prices, descriptions and sale units in one transaction. Any row problem,
   * found before or while writing, answers 400 with the report and leaves the catalogue untouched.
   */
  async commit(shopId: string, file: UploadedFile | undefined, form: PriceListForm): Promise<{ counts: ImportCounts }> {
    if (!form.mapping) throw new ValidationError([{ path: 'mapping', message: 'Choose which column holds each field before importing.' }]);
    const sheet = await this.open(shopId, file, form);
    const check = await this.check(shopId, sheet, form.mapping, form.supplierId);
    if (check.report.length) throw new PriceListRowsError(check.report, check.counts);
    try {
      await this.dataSource.transaction(async (manager) => {
        for (const change of check.changes) {
          if (change.status === 'updated') await this.writeRow(manager, shopId, change);
        }
      });
    } finally {
      this.catalogue.invalidate(shopId);
    }
    return { counts: check.counts };
  }

  /** One row's update, guarded by the version the dry run saw; a failure names the row. */
  private async writeRow(manager: EntityManager, shopId: string, change: PriceChange): Promise<void> {
    const fail = (message: string) => new PriceListRowsError([{ row: change.row, column: '', message }], { errors: 1 });
    let affected: number | undefined;
    try {
      const result = await manager
        .getRepository(PartEntity)
        .update(
          { id: change.partId, shopId, version: change.partVersion },
          { priceCents: change.priceCents, description: change.description, saleUnit: change.saleUnit },
        );
      affected = result.affected;
    } catch {
      throw fail(`Part ${change.supplierPartNumber} could not be saved; nothing was imported.`);
    }
    if (!affected) throw fail(`Part ${change.supplierPartNumber} was changed by someone else meanwhile; preview again. Nothing was imported.`);
  }

  private async open(shopId: string, file: UploadedFile | undefined, form: PriceListForm): Promise<PriceListSheet> {
    if (!file) throw new ValidationError([{ path: 'file', message: 'Choose a price list file (.xlsx or .csv).' }]);
    if (!(await this.suppliers.existsInShop(shopId, form.supplierId))) {
      throw new ValidationError([{ path: 'supplierId', message: 'Choose one of your suppliers.' }]);
    }
    return readPriceList(file, { encoding: form.encoding, delimiter: form.delimiter });
  }

  private async check(shopId: string, sheet: PriceListSheet, mapping: ColumnMapping, supplierId: string) {
    const columns = resolveMapping(sheet.headers, mapping);
    const parts = (await this.catalogue.partsOf(shopId)).filter((part) => part.supplierId === supplierId);
    return checkPriceList(sheet, columns, sheet.headers, parts);
  }
}
