import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { circuitKinds, type CircuitSettings } from '@linesmith/routing';
import type { Repository } from 'typeorm';
import { BuildsService } from '../builds/builds.service.js';
import { ConflictError, NotFoundError } from '../common/errors/app-error.js';
import { CircuitEntity } from './circuit.entity.js';
import { emptyCircuitDocument } from './circuit-document.js';
import { toCircuitDto } from './circuit.mapper.js';
import type { CreateCircuitInput, UpdateCircuitInput } from './dto/circuit-input.schemas.js';
import type { CircuitDto } from './dto/circuit.dto.js';

function settingsOf(circuit: Pick<CircuitEntity, 'fluid' | 'maxPressurePsi' | 'maxTempF'>): CircuitSettings {
  return { fluid: circuit.fluid, maxPressurePsi: circuit.maxPressurePsi, maxTempF: circuit.maxTempF };
}

function sameSettings(a: CircuitSettings, b: CircuitSettings): boolean {
  return a.fluid === b.fluid && a.maxPressurePsi === b.maxPressurePsi && a.maxTempF === b.maxTempF;
}

/** Circuits of one shop's builds. Ids of another shop answer 404. */
@Injectable()
export class CircuitsService {
  constructor(
    @InjectRepository(CircuitEntity) private readonly circuits: Repository<CircuitEntity>,
    private readonly builds: BuildsService,
  ) {}

  async listForBuild(shopId: string, buildId: string): Promise<CircuitDto[]> {
    await this.builds.getOwn(shopId, buildId);
    const rows = await this.circuits.find({ where: { shopId, buildId }, order: { createdAt: 'ASC', id: 'ASC' } });
    return rows.map(toCircuitDto);
  }

  async getOwn(shopId: string, circuitId: string): Promise<CircuitEntity> {
    const circuit = await this.circuits.findOneBy({ id: circuitId, shopId });
    if (!circuit) throw new NotFoundError('The circuit');
    return circuit;
  }

  async get(shopId: string, circuitId: string): Promise<CircuitDto> {
    return toCircuitDto(await this.getOwn(shopId, circuitId));
  }

  /** A new circuit in draft, its settings taken from the input or the kind's preset, with an empty sketch. */
  async create(shopId: string, buildId: string, input: CreateCircuitInput): Promise<CircuitDto> {
    await this.builds.getOwn(shopId, buildId);
    const preset = circuitKinds[input.kind];
    const settings: CircuitSettings = {
      fluid: input.fluid ?? preset.fluid,
      maxPressurePsi: input.maxPressurePsi ?? preset.maxPressurePsi,
      maxTempF: input.maxTempF ?? preset.maxTempF,
    };
    const circuit = await this.circuits.save(
      this.circuits.create({
        shopId,
        buildId,
        name: input.name ?? preset.label,
        kind: input.kind,
        ...settings,
        status: 'draft',
        draft: emptyCircuitDocument(settings),
        draftVersion: 1,
      }),
    );
    return toCircuitDto(circuit);
  }

  /**
   * Applies an edit made against `input.version`. Changed settings are written into the draft's
   * `circuit` block in the same UPDATE (merged in the database, so a sketch saved meanwhile is
   * kept) and move the draft version on, so an editor holding the old draft must reload.
   */
  async update(shopId: string, circuitId: string, input: UpdateCircuitInput): Promise<CircuitDto> {
    const circuit = await this.getOwn(shopId, circuitId);
    if (circuit.version !== input.version) throw this.staleVersion(circuit);
    const settings: CircuitSettings = {
      fluid: input.fluid ?? circuit.fluid,
      maxPressurePsi: input.maxPressurePsi ?? circuit.maxPressurePsi,
      maxTempF: input.maxTempF ?? circuit.maxTempF,
    };
    const settingsChanged = !sameSettings(settings, settingsOf(circuit));
    const nameOrKindChanged =
      (input.name !== undefined && input.name !== circuit.name) || (input.kind !== undefined && input.kind !== circuit.kind);
    if (!settingsChanged && !nameOrKindChanged) return toCircuitDto(circuit);

    const result = await this.circuits
      .createQueryBuilder()
      .update(CircuitEntity)
      .set({
        name: input.name ?? circuit.name,
        kind: input.kind ?? circuit.kind,
        ...settings,
        ...(settingsChanged
          ? {
              draft: () => `jsonb_set("draft", '{circuit}', ("draft" -> 'circuit') || CAST(:settings AS jsonb))`,
              draftVersion: () => '"draft_version" + 1',
            }
          : {}),
      })
      .where('id = :id AND shop_id = :shopId AND version = :version', { id: circuitId, shopId, version: input.version })
      .setParameter('settings', JSON.stringify(settings))
      .execute();
    if (!result.affected) throw this.staleVersion(await this.getOwn(shopId, circuitId));
    return this.get(shopId, circuitId);
  }

  /** Only a circuit still in draft can be deleted; its saved versions go with it. */
  async remove(shopId: string, circuitId: string): Promise<void> {
    const result = await this.circuits.delete({ id: circuitId, shopId, status: 'draft' });
    if (result.affected) return;
    const circuit = await this.getOwn(shopId, circuitId);
    throw new ConflictError(`Only a draft circuit can be deleted; this one is ${circuit.status}.`, {
      current: toCircuitDto(circuit),
    });
  }

  private staleVersion(current: CircuitEntity): ConflictError {
    return new ConflictError('This circuit was changed by someone else. Review the current values and try again.', {
      current: toCircuitDto(current),
    });
  }
}
