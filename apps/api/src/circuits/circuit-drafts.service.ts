import { Injectable } from '@nestjs/common';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import type { CircuitDocument } from '@linesmith/routing';
import type { DataSource, EntityManager, Repository } from 'typeorm';
import { z } from 'zod';
import { ConflictError, NotFoundError, ValidationError } from '../common/errors/app-error.js';
import { UploadEntity } from '../uploads/upload.entity.js';
import { CircuitEntity } from './circuit.entity.js';
import { parseClientDocument, readStoredDocument } from './circuit-document.js';
import type { DraftDto } from './dto/circuit.dto.js';

/**
 * Compare-and-set in one statement: the write lands only on the version the client edited. The
 * settings columns follow the document's `circuit` block; `version` moves only when they change.
 */
const SAVE_DRAFT_SQL = `
  UPDATE "circuits" SET
    "draft" = CAST($1 AS jsonb),
    "draft_version" = "draft_version" + 1,
    "version" = "version" + CASE
      WHEN ("fluid", "max_pressure_psi", "max_temp_f") IS DISTINCT FROM ($2::text, $3::numeric, $4::numeric) THEN 1 ELSE 0 END,
    "fluid" = $2,
    "max_pressure_psi" = $3,
    "max_temp_f" = $4,
    "updated_at" = now()
  WHERE "id" = $5 AND "shop_id" = $6 AND "draft_version" = $7
  RETURNING "draft_version"`;

/** pg answers UPDATE … RETURNING through TypeORM as `[rows, affected]`. */
function returnedRows(result: unknown): Array<{ draft_version: number }> {
  if (Array.isArray(result) && Array.isArray(result[0])) return result[0] as Array<{ draft_version: number }>;
  return (result as Array<{ draft_version: number }>) ?? [];
}

/** The working sketch of a circuit: read, and saved without ever overwriting someone else's save. */
@Injectable()
export class CircuitDraftsService {
  constructor(
    @InjectRepository(CircuitEntity) private readonly circuits: Repository<CircuitEntity>,
    @InjectDataSource() private readonly dataSource: DataSource,
  ) {}

  async get(shopId: string, circuitId: string): Promise<DraftDto> {
    const circuit = await this.circuits
      .createQueryBuilder('circuit')
      .addSelect('circuit.draft')
      .where('circuit.id = :circuitId AND circuit.shop_id = :shopId', { circuitId, shopId })
      .getOne();
    if (!circuit) throw new NotFoundError('The circuit');
    return { document: readStoredDocument(circuit.draft), draftVersion: circuit.draftVersion };
  }

  /**
   * Saves `raw` as the draft if the stored draft is still at `expectedVersion`; otherwise answers
   * 409 with the current draft so the client can merge or reload.
   */
  async save(shopId: string, circuitId: string, expectedVersion: number, raw: unknown): Promise<{ draftVersion: number }> {
    const document = parseClientDocument(raw);
    const circuit = await this.circuits.findOneBy({ id: circuitId, shopId });
    if (!circuit) throw new NotFoundError('The circuit');

    const { fluid, maxPressurePsi, maxTempF } = document.circuit;
    // The background photo stays share-locked until the draft naming it is written, so a photo
    // delete (which locks it for update) either waits and then sees this draft, or wins and this
    // save finds no photo.
    const saved = await this.dataSource.transaction(async (tx) => {
      await this.assertBackgroundBelongs(tx, shopId, circuit.buildId, document);
      const result: unknown = await tx.query(SAVE_DRAFT_SQL, [
        JSON.stringify(document),
        fluid,
        maxPressurePsi,
        maxTempF,
        circuitId,
        shopId,
        expectedVersion,
      ]);
      return returnedRows(result)[0];
    });
    if (saved) return { draftVersion: saved.draft_version };
    throw new ConflictError('Someone saved this sketch after you opened it. Review their version before saving again.', {
      current: await this.get(shopId, circuitId),
    });
  }

  /** A sketch background must be a photo of the same build; it is share-locked in `tx` until the save commits. */
  private async assertBackgroundBelongs(tx: EntityManager, shopId: string, buildId: string, document: CircuitDocument): Promise<void> {
    const uploadId = document.background?.uploadId;
    if (!uploadId) return;
    const found =
      z.uuid().safeParse(uploadId).success &&
      (await tx
        .getRepository(UploadEntity)
        .createQueryBuilder('upload')
        .select('upload.id')
        .where('upload.id = :uploadId AND upload.shop_id = :shopId AND upload.build_id = :buildId AND upload.kind = :kind', {
          uploadId,
          shopId,
          buildId,
          kind: 'photo',
        })
        .setLock('pessimistic_read')
        .getOne()) !== null;
    if (!found) {
      throw new ValidationError([{ path: 'background.uploadId', message: 'The background must be a photo uploaded to this build.' }]);
    }
  }
}
