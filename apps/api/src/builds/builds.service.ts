import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { Repository } from 'typeorm';
import { CircuitEntity } from '../circuits/circuit.entity.js';
import type { CircuitStatus } from '../circuits/circuit-status.js';
import { ConflictError, NotFoundError } from '../common/errors/app-error.js';
import type { Page } from '../users/users.service.js';
import { BuildEntity } from './build.entity.js';
import { emptyCircuitCounts, toBuildDto } from './build.mapper.js';
import type { CreateBuildInput, ListBuildsQuery, UpdateBuildInput } from './dto/build-input.schemas.js';
import type { BuildDto, CircuitCountsDto } from './dto/build.dto.js';

export function escapeLike(text: string): string {
  return text.replace(/[\\%_]/g, (char) => `\\${char}`);
}

/** Every text a user may search a build by: the vehicle and the customer. */
const SEARCHABLE = `concat_ws(' ', build.vehicle_year, build.vehicle_make, build.vehicle_model, build.vehicle_engine,
  build.vehicle_transmission, build.customer_name, build.customer_phone, build.customer_email)`;

const SORT_EXPRESSION: Record<ListBuildsQuery['sort'], string> = {
  updatedAt: 'build.updated_at',
  createdAt: 'build.created_at',
  customer: 'lower(build.customer_name)',
};

type BuildFields = Partial<
  Pick<
    BuildEntity,
    | 'vehicleYear'
    | 'vehicleMake'
    | 'vehicleModel'
    | 'vehicleEngine'
    | 'vehicleTransmission'
    | 'customerName'
    | 'customerPhone'
    | 'customerEmail'
    | 'notes'
    | 'status'
  >
>;

function fieldsOf(input: Omit<UpdateBuildInput, 'version'>): BuildFields {
  const fields: BuildFields = {
    vehicleYear: input.vehicle?.year,
    vehicleMake: input.vehicle?.make,
    vehicleModel: input.vehicle?.model,
    vehicleEngine: input.vehicle?.engine,
    vehicleTransmission: input.vehicle?.transmission,
    customerName: input.customer?.name,
    customerPhone: input.customer?.phone,
    customerEmail: input.customer?.email,
    notes: input.notes,
    status: input.status,
  };
  return Object.fromEntries(Object.entries(fields).filter(([, value]) => value !== undefined)) as BuildFields;
}

/** Builds of one shop. Every method takes the caller's shopId; ids of another shop answer 404. */
@Injectable()
export class BuildsService {
  constructor(
    @InjectRepository(BuildEntity) private readonly builds: Repository<BuildEntity>,
    @InjectRepository(CircuitEntity) private readonly circuits: Repository<CircuitEntity>,
  ) {}

  async list(shopId: string, query: ListBuildsQuery): Promise<Page<BuildDto>> {
    const select = this.builds
      .createQueryBuilder('build')
      .leftJoinAndSelect('build.createdBy', 'createdBy')
      .where('build.shop_id = :shopId', { shopId });
    if (query.status) select.andWhere('build.status IN (:...statuses)', { statuses: query.status });
    // Every word must appear somewhere in the vehicle or customer text: "blazer 1976" finds the 1976 Blazer.
    (query.search ?? '')
      .split(/\s+/)
      .filter(Boolean)
      .forEach((term, i) => select.andWhere(`${SEARCHABLE} ILIKE :term${i}`, { [`term${i}`]: `%${escapeLike(term)}%` }));
    const direction = (query.direction ?? (query.sort === 'customer' ? 'asc' : 'desc')).toUpperCase() as 'ASC' | 'DESC';
    select
      .orderBy(SORT_EXPRESSION[query.sort], direction)
      .addOrderBy('build.id', 'ASC')
      .offset((query.page - 1) * query.pageSize)
      .limit(query.pageSize);
    const [rows, total] = await select.getManyAndCount();
    const counts = await this.circuitCounts(
      shopId,
      rows.map((row) => row.id),
    );
    return {
      items: rows.map((row) => toBuildDto(row, counts.get(row.id))),
      total,
      page: query.page,
      pageSize: query.pageSize,
    };
  }

  async getOwn(shopId: string, buildId: string): Promise<BuildEntity> {
    const build = await this.builds.findOneBy({ id: buildId, shopId });
    if (!build) throw new NotFoundError('The build');
    return build;
  }

  async get(shopId: string, buildId: string): Promise<BuildDto> {
    const build = await this.builds.findOne({ where: { id: buildId, shopId }, relations: { createdBy: true } });
    if (!build) throw new NotFoundError('The build');
    return toBuildDto(build, (await this.circuitCounts(shopId, [build.id])).get(build.id));
  }

  async create(shopId: string, userId: string, input: CreateBuildInput): Promise<BuildDto> {
    const build = await this.builds.save(
      this.builds.create({
        shopId,
        createdById: userId,
        vehicleYear: '',
        vehicleMake: '',
        vehicleModel: '',
        vehicleEngine: '',
        vehicleTransmission: '',
        customerName: '',
        customerPhone: '',
        customerEmail: '',
        ...fieldsOf(input),
      }),
    );
    return this.get(shopId, build.id);
  }

  /** Applies an edit made against `input.version`; a stale version answers 409 with the current build. */
  async update(shopId: string, buildId: string, input: UpdateBuildInput): Promise<BuildDto> {
    const build = await this.getOwn(shopId, buildId);
    if (build.version !== input.version) throw await this.staleVersion(shopId, buildId);
    const { version, ...changes } = input;
    const fields = fieldsOf(changes);
    if (Object.keys(fields).length > 0) {
      const result = await this.builds.update({ id: buildId, shopId, version }, fields);
      if (!result.affected) throw await this.staleVersion(shopId, buildId);
    }
    return this.get(shopId, buildId);
  }

  /** Circuits per status for each of the given builds (builds without circuits are absent). */
  private async circuitCounts(shopId: string, buildIds: string[]): Promise<Map<string, CircuitCountsDto>> {
    const counts = new Map<string, CircuitCountsDto>();
    if (buildIds.length === 0) return counts;
    const rows = await this.circuits
      .createQueryBuilder('circuit')
      .select('circuit.build_id', 'buildId')
      .addSelect('circuit.status', 'status')
      .addSelect('count(*)::int', 'count')
      .where('circuit.shop_id = :shopId AND circuit.build_id IN (:...buildIds)', { shopId, buildIds })
      .groupBy('circuit.build_id')
      .addGroupBy('circuit.status')
      .getRawMany<{ buildId: string; status: CircuitStatus; count: number }>();
    for (const row of rows) {
      const entry = counts.get(row.buildId) ?? emptyCircuitCounts();
      entry.byStatus[row.status] += row.count;
      entry.total += row.count;
      counts.set(row.buildId, entry);
    }
    return counts;
  }

  private async staleVersion(shopId: string, buildId: string): Promise<ConflictError> {
    return new ConflictError('This build was changed by someone else. Review the current values and try again.', {
      current: await this.get(shopId, buildId),
    });
  }
}
